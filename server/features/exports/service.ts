/**
 * The list exports (issue 12): every quote or order the viewer may see under the list's own filters,
 * page by page through the same list services as the pages (so the same scoping: a customer gets
 * only its own organisation's records, and the customer's figures).
 */
import { minorDigits } from '../../../shared/format';
import type { CsvValue } from '../../../shared/csv';
import type { SessionUser } from '../../../shared/schemas/auth';
import { ORDER_STATUS_LABEL, type ListOrdersQuery } from '../../../shared/schemas/orders';
import type { ListQuotesQuery } from '../../../shared/schemas/quotes';
import { QUOTE_STATUS_CUSTOMER_LABEL, QUOTE_STATUS_LABEL } from '../../../shared/status-words';
import { isStaff } from '../../lib/auth/guards';
import { csvMoney } from '../../lib/csv';
import type { OrderDeps } from '../orders/deps';
import { listOrders } from '../orders/service';
import { listQuotes } from '../quotes/service';

/** Rows per database page; at most MAX_PAGES pages (50,000 rows) go into one file. */
const PAGE = 100;
const MAX_PAGES = 500;

const day = (iso: string | null) => (iso ? iso.slice(0, 10) : '');

export function quoteCsvHeader(viewer: SessionUser): string[] {
  const head = ['Number', 'Status', 'Customer', 'Reference', 'Design', 'Quantity', 'Total', 'Currency', 'Need by', 'Valid until', 'Submitted by'];
  return isStaff(viewer) ? [...head, 'Assignee', 'Created', 'Updated'] : [...head, 'Created', 'Updated'];
}

export async function* quoteCsvRows(deps: OrderDeps, viewer: SessionUser, query: Omit<ListQuotesQuery, 'page' | 'pageSize'>): AsyncGenerator<CsvValue[][]> {
  const staff = isStaff(viewer);
  const words = staff ? QUOTE_STATUS_LABEL : QUOTE_STATUS_CUSTOMER_LABEL;
  for (let page = 1; page <= MAX_PAGES; page++) {
    const { items, total } = await listQuotes(deps, viewer, { ...query, page, pageSize: PAGE });
    yield items.map((q) => [
      q.number, words[q.status] ?? q.status, q.organizationName, q.reference, q.designSummary, q.quantity,
      csvMoney(q.priceTotal_minor, minorDigits(q.currency)), q.currency, day(q.needBy), day(q.validUntil), q.submittedBy.name,
      ...(staff ? [q.assignee?.name ?? ''] : []), day(q.createdAt), day(q.updatedAt),
    ]);
    if (page * PAGE >= total) return;
  }
}

export const ORDER_CSV_HEADER = ['Number', 'Status', 'Customer', 'Quote', 'PO', 'Need by', 'Total', 'Currency', 'Ordered', 'Updated'];

export async function* orderCsvRows(deps: OrderDeps, viewer: SessionUser, query: Omit<ListOrdersQuery, 'page' | 'pageSize'>): AsyncGenerator<CsvValue[][]> {
  for (let page = 1; page <= MAX_PAGES; page++) {
    const { items, total } = await listOrders(deps, viewer, { ...query, page, pageSize: PAGE });
    yield items.map((o) => [
      o.number, ORDER_STATUS_LABEL[o.status] ?? o.status, o.organizationName, o.quoteNumber, o.poNumber, day(o.needBy),
      csvMoney(o.total_minor, minorDigits(o.currency)), o.currency, day(o.createdAt), day(o.updatedAt),
    ]);
    if (page * PAGE >= total) return;
  }
}
