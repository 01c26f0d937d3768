/**
 * The review queue's state: filters, sort and page live here and are sent to `GET /api/quotes`
 * (the server paginates, sorts and filters); a new filter goes back to page 1.
 */
import { reactive } from 'vue';
import type { ListQuotesQuery, QuoteStatus, QuoteSummary } from '@shared/schemas/quotes';
import { errorMessage } from '../api/http';
import { assignQuoteToMe, fetchQuotes } from '../api/quotes';
import { usePagedList } from './use-paged-list';

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
  const list = usePagedList(filters, (f) =>
    fetchQuotes({
      status: f.status ?? undefined,
      assignee: f.assignee === 'all' ? undefined : f.assignee,
      q: f.q.trim() || undefined,
      sort: f.sort,
      page: f.page,
      pageSize: f.pageSize,
    }),
  );

  async function assign(row: QuoteSummary): Promise<void> {
    try {
      await assignQuoteToMe(row.id, row.version);
    } catch (error) {
      list.failure.value = errorMessage(error);
      return;
    }
    await list.load();
  }

  return { filters, ...list, assign };
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
