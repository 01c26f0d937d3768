/**
 * The review queue's state: filters, sort and page live here and are sent to `GET /api/quotes`
 * (the server paginates, sorts and filters); a new filter goes back to page 1.
 */
import { reactive, ref, watch } from 'vue';
import type { ListQuotesQuery, QuoteStatus, QuoteSummary } from '@shared/schemas/quotes';
import { errorMessage } from '../api/http';
import { assignQuoteToMe, fetchQuotes } from '../api/quotes';

export type AssigneeFilter = 'all' | 'me' | 'none';

export function useReviewQueue() {
  const filters = reactive({
    status: 'in-review' as QuoteStatus | null,
    assignee: 'all' as AssigneeFilter,
    q: '',
    sort: '-updated' as ListQuotesQuery['sort'],
    page: 1,
    pageSize: 20,
  });
  const items = ref<QuoteSummary[]>([]);
  const total = ref(0);
  const loading = ref(false);
  const failure = ref<string | null>(null);
  let ticket = 0;

  async function load(): Promise<void> {
    const mine = ++ticket;
    loading.value = true;
    failure.value = null;
    try {
      const list = await fetchQuotes({
        status: filters.status ?? undefined,
        assignee: filters.assignee === 'all' ? undefined : filters.assignee,
        q: filters.q.trim() || undefined,
        sort: filters.sort,
        page: filters.page,
        pageSize: filters.pageSize,
      });
      if (mine !== ticket) return; // an older answer arriving late
      items.value = list.items;
      total.value = list.total;
    } catch (error) {
      if (mine === ticket) failure.value = errorMessage(error);
    } finally {
      if (mine === ticket) loading.value = false;
    }
  }

  // Typing in the search box waits for a pause; other filters reload at once.
  let timer: ReturnType<typeof setTimeout> | undefined;
  watch(
    () => filters.q,
    () => {
      clearTimeout(timer);
      timer = setTimeout(() => {
        filters.page = 1;
        void load();
      }, 300);
    },
  );
  watch(
    () => [filters.status, filters.assignee, filters.sort, filters.pageSize],
    () => {
      filters.page = 1;
      void load();
    },
  );
  watch(() => filters.page, () => void load());

  async function assign(row: QuoteSummary): Promise<void> {
    try {
      await assignQuoteToMe(row.id, row.version);
    } catch (error) {
      failure.value = errorMessage(error);
    }
    await load();
  }

  return { filters, items, total, loading, failure, load, assign };
}

const HOUR = 3_600_000;

/**
 * How long a quote has waited against the response target: "31 h of 48 h", late once past
 * `responseDueAt`. Only a quote waiting on the fabricator (in review) runs against the target.
 */
export function ageAgainstTarget(q: Pick<QuoteSummary, 'createdAt' | 'responseDueAt' | 'status'>, now = Date.now()) {
  const created = Date.parse(q.createdAt);
  const due = Date.parse(q.responseDueAt);
  const age = Math.max(0, Math.floor((now - created) / HOUR));
  const target = Math.round((due - created) / HOUR);
  const waiting = q.status === 'in-review';
  const ageText = age >= 72 ? `${Math.floor(age / 24)} d` : `${age} h`;
  return { text: waiting ? `${ageText} of ${target} h` : ageText, late: waiting && now > due, waiting };
}
