/**
 * The staff order list's state: status, search, sort and page are sent to `GET /api/orders` (the
 * server filters, sorts and pages); a new filter goes back to page 1, typing waits for a pause.
 */
import { reactive } from 'vue';
import type { OrderStatus } from '@shared/schemas/orders';
import { fetchOrders, type OrderSort } from '../../../api/orders';
import { usePagedList } from '../../../composables/use-paged-list';

export function useStaffOrders() {
  const filters = reactive({ status: null as OrderStatus | null, q: '', sort: '-updated' as OrderSort, page: 1, pageSize: 20 });
  const list = usePagedList(filters, (f) =>
    fetchOrders({ status: f.status ?? undefined, q: f.q.trim() || undefined, sort: f.sort, page: f.page, pageSize: f.pageSize }),
  );
  return { filters, ...list };
}
