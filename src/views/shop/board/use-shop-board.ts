/**
 * The shop board's state: the released orders by step (one `GET /api/orders?status=` per lane, the
 * server ordering by need-by), each order's detail for its tubes and the step it was held at, the
 * number shipped, and the moves. After a move the board reloads, so it shows what the server holds.
 */
import { computed, reactive, ref } from 'vue';
import { orderSteps, type Order, type OrderStatus } from '@shared/schemas/orders';
import { errorMessage, isApiError, type FieldErrors } from '../../../api/http';
import { advanceOrder, fetchOrder, fetchOrders, type AdvanceOrderInput, type OrderSummary } from '../../../api/orders';

/** The lanes of the board, in shop order: released up to ready to ship, then on hold. */
export const BOARD_STEPS = ['released', 'cutting', 'tubing', 'shell-and-heads', 'hydrotest', 'ready-to-ship'] as const satisfies readonly OrderStatus[];
export type BoardLane = (typeof BOARD_STEPS)[number] | 'on-hold';
const LANES: BoardLane[] = [...BOARD_STEPS, 'on-hold'];

export const nextStep = (status: OrderStatus): OrderStatus | undefined => {
  const at = orderSteps.indexOf(status as (typeof orderSteps)[number]);
  return at < 0 ? undefined : orderSteps[at + 1];
};

/** The step an order on hold left (and resumes at). */
export const heldFrom = (order: Order): OrderStatus | undefined => order.heldFrom ?? undefined;

export type MoveRefusal = { message: string; fields: FieldErrors };

export function useShopBoard() {
  const lanes = reactive(Object.fromEntries(LANES.map((l) => [l, [] as OrderSummary[]])) as Record<BoardLane, OrderSummary[]>);
  const details = reactive(new Map<string, Order>());
  const shipped = ref<OrderSummary[]>([]);
  const shippedTotal = ref(0);
  const loading = ref(false);
  const failure = ref<string | null>(null);
  const latestFirst = ref(false);
  /** the order being moved, and the last error of each card */
  const moving = ref<string | null>(null);
  const errors = reactive<Record<string, string>>({});

  let ticket = 0;
  /** Resolves once the lanes are in; the details (tubes, held-at step) follow without holding the board. */
  async function load(): Promise<void> {
    const mine = ++ticket;
    loading.value = true;
    failure.value = null;
    try {
      const [lists, done] = await Promise.all([
        Promise.all(LANES.map((status) => fetchOrders({ status, sort: 'needBy', pageSize: 100 }))),
        fetchOrders({ status: 'shipped', sort: '-updated', pageSize: 20 }),
      ]);
      if (mine !== ticket) return; // a newer load is on its way
      LANES.forEach((lane, i) => (lanes[lane] = lists[i]!.items));
      shipped.value = done.items;
      shippedTotal.value = done.total;
      void loadDetails(mine, lists.flatMap((l) => l.items.map((o) => o.id)));
    } catch (error) {
      if (mine === ticket) failure.value = errorMessage(error);
    } finally {
      if (mine === ticket) loading.value = false;
    }
  }

  async function loadDetails(mine: number, ids: string[]): Promise<void> {
    const orders = await Promise.all(ids.map((id) => fetchOrder(id).catch(() => null)));
    if (mine !== ticket) return;
    for (const o of orders) if (o) details.set(o.id, o);
  }

  // Need-by order within each lane; orders without a date go last either way.
  const sorted = computed(() => {
    const key = (o: OrderSummary) => o.needBy ?? (latestFirst.value ? '' : '9999');
    const out = {} as Record<BoardLane, OrderSummary[]>;
    for (const lane of LANES) {
      out[lane] = [...lanes[lane]].sort((a, b) => (latestFirst.value ? key(b).localeCompare(key(a)) : key(a).localeCompare(key(b))));
    }
    return out;
  });

  /** Sends one move; resolves to the server's refusal (message and fields), or null once moved and reloaded. */
  async function move(order: OrderSummary, input: AdvanceOrderInput, onCard = true): Promise<MoveRefusal | null> {
    moving.value = order.id;
    delete errors[order.id];
    try {
      await advanceOrder(order.id, input);
      await load();
      return null;
    } catch (error) {
      const message = errorMessage(error);
      if (onCard) errors[order.id] = message;
      return { message, fields: isApiError(error) ? error.fields : {} };
    } finally {
      moving.value = null;
    }
  }

  return { lanes: sorted, details, shipped, shippedTotal, loading, failure, latestFirst, moving, errors, load, move };
}
