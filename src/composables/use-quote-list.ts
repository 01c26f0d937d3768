/**
 * "My quotes": one page of the organisation's quotes from the server, which pages, sorts, filters by
 * status and searches. The query lives in the address (`?status=approved&page=2`) so going back from a
 * quote returns to the same page of the table; the search waits for a pause in typing.
 */
import { reactive, ref, watch } from 'vue';
import { onBeforeRouteLeave, useRoute, useRouter, type LocationQuery } from 'vue-router';
import { listQuotesQuerySchema, quoteStatuses, type ListQuotesQuery, type QuoteStatus, type QuoteSummary } from '@shared/schemas/quotes';
import { errorMessage } from '../api/http';
import { fetchQuotes } from '../api/quotes';

export type QuoteSort = ListQuotesQuery['sort'];
const SEARCH_DELAY_MS = 300;
const sorts = listQuotesQuerySchema.shape.sort.unwrap().options;

function first(value: LocationQuery[string]): string | undefined {
  const v = Array.isArray(value) ? value[0] : value;
  return typeof v === 'string' && v !== '' ? v : undefined;
}

function fromAddress(q: LocationQuery) {
  const status = first(q.status);
  const sort = first(q.sort);
  const page = Number(first(q.page));
  const pageSize = Number(first(q.pageSize));
  return {
    status: quoteStatuses.includes(status as QuoteStatus) ? (status as QuoteStatus) : null,
    q: first(q.q) ?? '',
    sort: sorts.includes(sort as QuoteSort) ? (sort as QuoteSort) : ('-updated' as QuoteSort),
    page: Number.isInteger(page) && page > 0 ? page : 1,
    pageSize: [10, 20, 50].includes(pageSize) ? pageSize : 20,
  };
}

export function useQuoteList() {
  const route = useRoute();
  const router = useRouter();
  const query = reactive(fromAddress(route.query));
  const items = ref<QuoteSummary[]>([]);
  const total = ref(0);
  const loading = ref(false);
  const failure = ref<string | null>(null);
  let latest = 0;
  let timer: ReturnType<typeof setTimeout> | undefined;
  let leaving = false;

  async function load(): Promise<void> {
    const mine = ++latest;
    loading.value = true;
    failure.value = null;
    try {
      const answer = await fetchQuotes({ ...query, status: query.status ?? undefined, q: query.q.trim() || undefined });
      if (mine !== latest) return; // a newer query was sent meanwhile
      items.value = answer.items;
      total.value = answer.total;
    } catch (error) {
      if (mine === latest) failure.value = errorMessage(error);
    } finally {
      if (mine === latest) loading.value = false;
    }
  }

  function remember(): void {
    if (leaving) return; // a late search must not pull the person back from the quote they opened
    const address: Record<string, string> = {};
    if (query.status) address.status = query.status;
    if (query.q.trim()) address.q = query.q.trim();
    if (query.sort !== '-updated') address.sort = query.sort;
    if (query.page > 1) address.page = String(query.page);
    if (query.pageSize !== 20) address.pageSize = String(query.pageSize);
    void router.replace({ query: address });
  }

  watch(
    () => [query.status, query.sort, query.page, query.pageSize],
    () => {
      remember();
      void load();
    },
  );
  watch(
    () => query.q,
    () => {
      clearTimeout(timer);
      timer = setTimeout(() => {
        query.page = 1;
        remember();
        void load();
      }, SEARCH_DELAY_MS);
    },
  );

  onBeforeRouteLeave(() => {
    leaving = true;
    clearTimeout(timer);
  });

  /** A new filter or sort starts again at page 1. */
  function setStatus(status: QuoteStatus | null): void {
    query.status = status;
    query.page = 1;
  }
  function setSort(sort: QuoteSort): void {
    query.sort = sort;
    query.page = 1;
  }
  function setPageSize(size: number): void {
    query.pageSize = size;
    query.page = 1;
  }

  return { query, items, total, loading, failure, load, setStatus, setSort, setPageSize };
}
