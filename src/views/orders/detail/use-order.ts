/**
 * One order as its buyer sees it. Another organisation's order answers 404, shown as "not found".
 * Cancelling returns the order as it now stands (the refund itself arrives by the payment webhook).
 */
import { ref } from 'vue';
import type { Order } from '@shared/schemas/orders';
import { errorMessage, isApiError } from '../../../api/http';
import { cancelOrder, fetchOrder } from '../../../api/orders';

export function useOrder() {
  const order = ref<Order | null>(null);
  const loading = ref(false);
  const notFound = ref(false);
  const failure = ref<string | null>(null);
  let latest = 0;

  async function load(id: string): Promise<void> {
    const mine = ++latest;
    loading.value = true;
    failure.value = null;
    try {
      const answer = await fetchOrder(id);
      if (mine !== latest) return;
      order.value = answer;
      notFound.value = false;
    } catch (error) {
      if (mine !== latest) return;
      order.value = null;
      notFound.value = isApiError(error) && (error.status === 404 || error.status === 400);
      if (!notFound.value) failure.value = errorMessage(error);
    } finally {
      if (mine === latest) loading.value = false;
    }
  }

  /** Throws the server's refusal for the dialog to show. */
  async function cancel(reason: string): Promise<void> {
    if (!order.value) return;
    order.value = await cancelOrder(order.value.id, reason, order.value.status);
  }

  return { order, loading, notFound, failure, load, cancel };
}
