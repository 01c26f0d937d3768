import type { PriceBook, PriceBookChange, PriceBookVersionSummary } from '@shared/schemas/price-book';
import { request } from './http';

export type StoredPriceBook = { version: number; createdAt: string; priceBook: PriceBook };
export type PriceBookDiff = { version: number; previousVersion: number | null; changes: PriceBookChange[] };

/** `GET /api/admin/price-book` (admin): the active version. */
export function fetchPriceBook(): Promise<StoredPriceBook> {
  return request<StoredPriceBook>('/admin/price-book');
}

/**
 * `PUT /api/admin/price-book` (admin): saves a new version; quotes keep the version they used.
 * `baseVersion` is the version the edit started from (409 `stale-version` when another admin saved since).
 */
export function savePriceBook(priceBook: PriceBook, baseVersion: number, note: string): Promise<StoredPriceBook> {
  return request<StoredPriceBook>('/admin/price-book', { method: 'PUT', body: { priceBook, baseVersion, note } });
}

/** `GET /api/admin/price-book/versions` (admin): saved versions, newest first. */
export async function fetchPriceBookVersions(): Promise<PriceBookVersionSummary[]> {
  return (await request<{ versions: PriceBookVersionSummary[] }>('/admin/price-book/versions')).versions;
}

/** `GET /api/admin/price-book/versions/:version/diff` (admin): what a version changed against the one before. */
export function fetchPriceBookDiff(version: number): Promise<PriceBookDiff> {
  return request<PriceBookDiff>(`/admin/price-book/versions/${version}/diff`);
}
