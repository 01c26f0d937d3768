import type { PriceBook } from '@shared/schemas/price-book';
import { request } from './http';

export type StoredPriceBook = { version: number; createdAt: string; priceBook: PriceBook };

/** `GET /api/admin/price-book` (admin): the active version. */
export function fetchPriceBook(): Promise<StoredPriceBook> {
  return request<StoredPriceBook>('/admin/price-book');
}

/** `PUT /api/admin/price-book` (admin): saves a new version; quotes keep the version they used. */
export function savePriceBook(priceBook: PriceBook, note?: string): Promise<StoredPriceBook> {
  return request<StoredPriceBook>('/admin/price-book', { method: 'PUT', body: { priceBook, note } });
}
