/**
 * Orders: accepting an offer (the deposit payment), then the order's life from deposit to shipment.
 * Shapes from `@shared/schemas/orders` and `@shared/schemas/build-sheet`; money in integer minor units.
 * Every order endpoint lives here, for the customer pages and the staff pages alike.
 */
import type { BuildSheet } from '@shared/schemas/build-sheet';
import type { AcceptQuoteInput, AcceptResult, AdvanceOrderInput, HydrotestState, ListOrdersQuery, Order, OrderStatus, RecordHydrotestInput } from '@shared/schemas/orders';
import { request } from './http';

/** One row of `GET /api/orders`. */
export type OrderSummary = Pick<
  Order,
  'id' | 'number' | 'quoteId' | 'quoteNumber' | 'organizationName' | 'status' | 'poNumber' | 'needBy' | 'total_minor' | 'currency' | 'createdAt' | 'updatedAt'
>;
export type OrderList = { items: OrderSummary[]; total: number; page: number; pageSize: number };
export type OrderSort = ListOrdersQuery['sort'];

export type { AdvanceOrderInput };

/**
 * `POST /api/quotes/:id/accept` (customer): records PO, billing contact and delivery address and
 * returns the deposit payment. Called again on an accepted, unpaid quote it returns the same payment
 * (the retry after a declined card). 409 `offer-expired` / `wrong-status`; 400 with field errors.
 */
export function acceptQuote(quoteId: string, input: AcceptQuoteInput): Promise<AcceptResult> {
  return request<AcceptResult>(`/quotes/${quoteId}/accept`, { method: 'POST', body: input });
}

/** `GET /api/orders`: customers get their organisation's, staff get all. */
export function fetchOrders(query: Partial<ListOrdersQuery> = {}): Promise<OrderList> {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) if (value !== undefined && value !== '') params.set(key, String(value));
  const qs = params.toString();
  return request<OrderList>(`/orders${qs ? `?${qs}` : ''}`);
}

export function fetchOrder(id: string): Promise<Order> {
  return request<Order>(`/orders/${id}`);
}

/** `POST /api/orders/:id/release` (sales, admin): a paid order goes to the shop. 409 `wrong-status`. */
export function releaseOrder(id: string, note?: string): Promise<Order> {
  return request<Order>(`/orders/${id}/release`, { method: 'POST', body: note ? { note } : {} });
}

/**
 * `POST /api/orders/:id/advance` (shop, admin). 409 `wrong-step` / `wrong-status` / `stale-status`,
 * `hydrotest-not-passed` (fields: the sides not passed yet); 400 on hold without `reason` or `customerWording`.
 */
export function advanceOrder(id: string, input: AdvanceOrderInput): Promise<Order> {
  return request<Order>(`/orders/${id}/advance`, { method: 'POST', body: input });
}

/** `GET /api/orders/:id/hydrotest` (staff): each side's required pressure and latest test. */
export function fetchHydrotest(id: string): Promise<HydrotestState> {
  return request<HydrotestState>(`/orders/${id}/hydrotest`);
}

/**
 * `POST /api/orders/:id/hydrotest` (shop, admin), at the hydrotest step: records one or both sides.
 * 400 naming `tube.pressure_Pa` / `shell.pressure_Pa` for a pass below the side's test pressure.
 */
export function recordHydrotest(id: string, input: RecordHydrotestInput): Promise<HydrotestState> {
  return request<HydrotestState>(`/orders/${id}/hydrotest`, { method: 'POST', body: input });
}

/**
 * `POST /api/orders/:id/cancel`: the buyer or sales while deposit-paid or released, an admin later.
 * The deposit is refunded through Stripe (less the cancellation fee once released).
 */
export function cancelOrder(id: string, reason: string, from: OrderStatus): Promise<Order> {
  // `from`: the status the user saw; if the order moved on meanwhile the server answers 409
  return request<Order>(`/orders/${id}/cancel`, { method: 'POST', body: { reason, from } });
}

/** `GET /api/orders/:id/build-sheet` (sales, shop, admin). */
export function fetchBuildSheet(id: string): Promise<BuildSheet> {
  return request<BuildSheet>(`/orders/${id}/build-sheet`);
}

/** Links (not fetches): the browser opens them with the session cookie. Staff only. */
export const buildSheetPdfUrl = (id: string) => `/api/orders/${id}/build-sheet.pdf`;
export const drillingCsvUrl = (id: string) => `/api/orders/${id}/drilling.csv`;

/** Steps a customer may still cancel at (an admin may cancel later too). */
export const CANCELLABLE_BY_BUYER: readonly OrderStatus[] = ['deposit-paid', 'released'];
