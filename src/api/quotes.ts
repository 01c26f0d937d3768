/**
 * The quote workflow: a customer's request, the sales engineer's review, the offer.
 * Shapes from `@shared/schemas/quotes`; money in integer minor units.
 */
import type { Price } from '@shared/schemas/price-book';
import type {
  Attachment,
  CreateQuoteInput,
  DesignEdit,
  ListQuotesQuery,
  PatchQuoteInput,
  QuoteDetail,
  QuoteSummary,
} from '@shared/schemas/quotes';
import type { Design } from '@shared/schemas/thermal';
import type { ShopLimits } from '@shared/thermal/shop-limits';
import { request } from './http';

export type QuoteList = { items: QuoteSummary[]; total: number; page: number; pageSize: number };
export type QuoteChange = { duty?: CreateQuoteInput['duty']; design?: DesignEdit; priceOverrides?: { key: string; amount_minor: number; reason: string }[]; quantity?: number };

/**
 * `POST /api/quotes` (customer): sized and priced at once; the budget offer awaiting review.
 * `idempotencyKey` (one per request form, the same on every retry) makes a retry after a lost answer
 * return the quote the first attempt stored instead of a second one.
 */
export function createQuote(input: CreateQuoteInput, idempotencyKey?: string): Promise<QuoteDetail> {
  return request<QuoteDetail>('/quotes', { method: 'POST', body: input, ...(idempotencyKey ? { headers: { 'Idempotency-Key': idempotencyKey } } : {}) });
}

/** `GET /api/quotes`: customers get their organisation's, staff get all. */
export function fetchQuotes(query: Partial<ListQuotesQuery> = {}): Promise<QuoteList> {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) if (value !== undefined && value !== '') params.set(key, String(value));
  const qs = params.toString();
  return request<QuoteList>(`/quotes${qs ? `?${qs}` : ''}`);
}

export function fetchQuote(id: string, revision?: number): Promise<QuoteDetail> {
  return request<QuoteDetail>(`/quotes/${id}${revision ? `?revision=${revision}` : ''}`);
}

/** `PATCH /api/quotes/:id` (sales): a new draft revision; 409 `stale-version` when someone saved first. */
export function updateQuote(id: string, input: PatchQuoteInput): Promise<QuoteDetail> {
  return request<QuoteDetail>(`/quotes/${id}`, { method: 'PATCH', body: input });
}

/** `POST /api/quotes/:id/preview` (sales): the design and price a change would give, nothing saved. */
export function previewQuoteChange(id: string, change: QuoteChange): Promise<{ design: Design; price: Price; alternatives: Omit<Design, 'rating'>[] }> {
  return request(`/quotes/${id}/preview`, { method: 'POST', body: change });
}

/** `GET /api/quotes/shop-limits` (sales, admin): the active price book's shortest bundle and largest shell. */
export function fetchShopLimits(): Promise<ShopLimits> {
  return request<ShopLimits>('/quotes/shop-limits');
}

export function assignQuoteToMe(id: string, version: number): Promise<QuoteDetail> {
  return request<QuoteDetail>(`/quotes/${id}/assign`, { method: 'POST', body: { version } });
}

export function approveQuote(id: string, version: number, message?: string): Promise<QuoteDetail> {
  return request<QuoteDetail>(`/quotes/${id}/approve`, { method: 'POST', body: { version, message } });
}

export function askQuestions(id: string, version: number, message: string): Promise<QuoteDetail> {
  return request<QuoteDetail>(`/quotes/${id}/questions`, { method: 'POST', body: { version, message } });
}

export function declineQuote(id: string, version: number, message: string): Promise<QuoteDetail> {
  return request<QuoteDetail>(`/quotes/${id}/decline`, { method: 'POST', body: { version, message } });
}

/** `POST /api/quotes/:id/request-change` (customer): a message; it reopens engineering review. */
export function requestQuoteChange(id: string, message: string): Promise<QuoteDetail> {
  return request<QuoteDetail>(`/quotes/${id}/request-change`, { method: 'POST', body: { message } });
}

/** `POST /api/quotes/:id/attachments` (multipart field `file`): PDF, PNG, JPEG, CSV or XLSX up to 20 MB. */
export function uploadAttachment(id: string, file: File): Promise<Attachment> {
  const form = new FormData();
  form.append('file', file);
  return request<Attachment>(`/quotes/${id}/attachments`, { method: 'POST', body: form });
}

/** Links (not fetches): the browser opens them with the session cookie. */
export const offerPdfUrl = (id: string, opts: { revision?: number; units?: 'SI' | 'US' } = {}) => {
  const params = new URLSearchParams();
  if (opts.revision) params.set('revision', String(opts.revision));
  if (opts.units) params.set('units', opts.units);
  const qs = params.toString();
  return `/api/quotes/${id}/offer.pdf${qs ? `?${qs}` : ''}`;
};
export const attachmentUrl = (quoteId: string, attachmentId: string) => `/api/quotes/${quoteId}/attachments/${attachmentId}`;
