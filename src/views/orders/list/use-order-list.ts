/**
 * "My orders": one page of the organisation's orders as the server sorted and cut it. Page, page size
 * and sort live in the address, so going back from an order returns to the same page of the table.
 */
import { reactive, ref, watch } from 'vue';
import { useRoute, useRouter, type LocationQuery } from 'vue-router';
import { listOrdersQuerySchema } from '@shared/schemas/orders';
import { errorMessage } from '../../../api/http';
import { fetchOrders, type OrderSort, type OrderSummary } from '../../../api/orders';

const sorts = listOrdersQuerySchema.shape.sort.unwrap().options;
export const PAGE_SIZES = [10, 20, 50];

function fromAddress(q: LocationQuery) {
  const one = (v: LocationQuery[string]) => (Array.isArray(v) ? v[0] : v) ?? undefined;
  const sort = one(q.sort);
  const page = Number(one(q.page));
  const pageSize = Number(one(q.pageSize));
  return {
    sort: sorts.includes(sort as OrderSort) ? (sort as OrderSort) : ('-created' as OrderSort),
    page: Number.isInteger(page) && page > 0 ? page : 1,
    pageSize: PAGE_SIZES.includes(pageSize) ? pageSize : 20,
  };
}

export function useOrderList() {
  const route = useRoute();
  const router = useRouter();
  const query = reactive(fromAddress(route.query));
  const items = ref<OrderSummary[]>([]);
  const total = ref(0);
  const loading = ref(false);
  const failure = ref<string | null>(null);
  let latest = 0;

  async function load(): Promise<void> {
    const mine = ++latest;
    loading.value = true;
    failure.value = null;
    try {
      const answer = await fetchOrders({ ...query });
      if (mine !== latest) return;
      items.value = answer.items;
      total.value = answer.total;
    } catch (error) {
      if (mine === latest) failure.value = errorMessage(error);
    } finally {
      if (mine === latest) loading.value = false;
    }
  }

  watch(
    () => ({ ...query }),
    (q) => {
      void router.replace({ query: { ...route.query, page: String(q.page), pageSize: String(q.pageSize), sort: q.sort } });
      void load();
    },
  );

  return {
    query,
    items,
    total,
    loading,
    failure,
    load,
    setSort(sort: OrderSort) {
      Object.assign(query, { sort, page: 1 });
    },
    setPageSize(size: number) {
      Object.assign(query, { pageSize: size, page: 1 });
    },
  };
}
