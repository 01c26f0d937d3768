/**
 * A list the server pages, sorts and filters: the filters live in one reactive object and are sent
 * with every load. A changed filter goes back to page 1; typing in the search box (`q`) waits for a
 * pause; an answer that arrives after a newer request was sent is dropped.
 */
import { ref, watch, type Ref } from 'vue';
import { errorMessage } from '../api/http';

export interface PagedFilters {
  q: string;
  page: number;
  pageSize: number;
}

export function usePagedList<F extends PagedFilters, T>(filters: F, fetchPage: (filters: F) => Promise<{ items: T[]; total: number }>) {
  const items = ref([]) as Ref<T[]>;
  const total = ref(0);
  const loading = ref(false);
  const failure = ref<string | null>(null);
  let ticket = 0;

  async function load(): Promise<void> {
    const mine = ++ticket;
    loading.value = true;
    failure.value = null;
    try {
      const list = await fetchPage(filters);
      if (mine !== ticket) return; // an older answer arriving late
      items.value = list.items;
      total.value = list.total;
    } catch (error) {
      if (mine === ticket) failure.value = errorMessage(error);
    } finally {
      if (mine === ticket) loading.value = false;
    }
  }

  const firstPage = () => {
    if (filters.page === 1) void load();
    else filters.page = 1; // the page watcher loads
  };
  let timer: ReturnType<typeof setTimeout> | undefined;
  watch(
    () => filters.q,
    () => {
      clearTimeout(timer);
      timer = setTimeout(firstPage, 300);
    },
  );
  // every filter but the search text and the page itself: read by key, so q and page are not tracked here
  const others = Object.keys(filters).filter((key) => key !== 'q' && key !== 'page') as (keyof F)[];
  watch(() => others.map((key) => filters[key]), firstPage);
  watch(() => filters.page, () => void load());

  return { items, total, loading, failure, load };
}
