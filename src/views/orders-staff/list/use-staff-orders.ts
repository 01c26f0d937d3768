/**
 * The staff order list's state: status, search, sort and page are sent to `GET /api/orders` (the
 * server filters, sorts and pages); a new filter goes back to page 1, typing waits for a pause.
 */
import { reactive, ref, watch } from 'vue';
import type { OrderStatus } from '@shared/schemas/orders';
import { errorMessage } from '../../../api/http';
import { fetchOrders, type OrderSort, type OrderSummary } from '../../../api/orders';

export function useStaffOrders() {
  const filters = reactive({ status: null as OrderStatus | null, q: '', sort: '-updated' as OrderSort, page: 1, pageSize: 20 });
  const items = ref<OrderSummary[]>([]);
  const total = ref(0);
  const loading = ref(false);
  const failure = ref<string | null>(null);
  let ticket = 0;

  async function load(): Promise<void> {
    const mine = ++ticket;
    loading.value = true;
    failure.value = null;
    try {
      const list = await fetchOrders({
        status: filters.status ?? undefined,
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
    () => [filters.status, filters.sort, filters.pageSize],
    () => {
      filters.page = 1;
      void load();
    },
  );
  watch(() => filters.page, () => void load());

  return { filters, items, total, loading, failure, load };
}
