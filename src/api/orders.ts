/**
 * Orders: accepting an offer (the deposit payment), then the order's life from deposit to shipment.
 * Shapes from `@shared/schemas/orders` and `@shared/schemas/build-sheet`; money in integer minor units.
 * Every order endpoint lives here, for the customer pages and the staff pages alike.
 */
import type { BuildSheet } from '@shared/schemas/build-sheet';
import type { AcceptQuoteInput, AcceptResult, ListOrdersQuery, Order, OrderStatus } from '@shared/schemas/orders';
import { request } from './http';

/** One row of `GET /api/orders`. */
export type OrderSummary = Pick<
  Order,
  'id' | 'number' | 'quoteId' | 'quoteNumber' | 'organizationName' | 'status' | 'poNumber' | 'needBy' | 'total_minor' | 'currency' | 'createdAt' | 'updatedAt'
>;
export type OrderList = { items: OrderSummary[]; total: number; page: number; pageSize: number };
export type OrderSort = ListOrdersQuery['sort'];

export type AdvanceOrderInput = {
  /** the next step, or `on-hold`; an order on hold resumes at the step it left */
  to: OrderStatus;
  note?: string;
  /** the test pressure applied, Pa gauge: required (with `hydrotestPassed`) when leaving the hydrotest */
  hydrotestPressure_Pa?: number;
  hydrotestPassed?: boolean;
};

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
 * `POST /api/orders/:id/advance` (shop, admin). 409 `wrong-step` / `wrong-status` / `stale-status`;
 * 400 when leaving the hydrotest without its record; 422 `hydrotest-failed`.
 */
export function advanceOrder(id: string, input: AdvanceOrderInput): Promise<Order> {
  return request<Order>(`/orders/${id}/advance`, { method: 'POST', body: input });
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
