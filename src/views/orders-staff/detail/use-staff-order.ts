/** One order for the staff page: loaded by id, changed by release or cancel, errors kept per action. */
import { ref } from 'vue';
import type { Order } from '@shared/schemas/orders';
import { errorMessage } from '../../../api/http';
import { fetchOrder } from '../../../api/orders';

export function useStaffOrder(id: () => string) {
  const order = ref<Order | null>(null);
  const loading = ref(false);
  const loadError = ref<string | null>(null);
  const busy = ref<string | null>(null);

  async function load(): Promise<void> {
    loading.value = true;
    loadError.value = null;
    try {
      order.value = await fetchOrder(id());
    } catch (error) {
      loadError.value = errorMessage(error);
    } finally {
      loading.value = false;
    }
  }

  /** Runs one change; the order it returns replaces ours. Resolves to the error message, or null. */
  async function change(kind: string, send: (orderId: string) => Promise<Order>): Promise<string | null> {
    busy.value = kind;
    try {
      order.value = await send(id());
      return null;
    } catch (error) {
      return errorMessage(error);
    } finally {
      busy.value = null;
    }
  }

  return { order, loading, loadError, busy, load, change };
}
