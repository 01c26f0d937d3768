import type { PriceBookTable, TubeImportPreview } from '@shared/price-book-csv';
import { request } from './http';

type Query = Record<string, string | number | null | undefined>;

/** `/api<path>.csv?…` with the list's filters and sort (never its page): the CSV download of that list. */
function csvHref(path: string, query: Query): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) {
    if (key === 'page' || key === 'pageSize' || value === null || value === undefined || String(value).trim() === '') continue;
    params.set(key, String(value).trim());
  }
  const qs = params.toString();
  return `/api${path}${qs ? `?${qs}` : ''}`;
}

/** `GET /api/quotes/export.csv`: the quotes the viewer may see under these filters. */
export const quotesCsvHref = (query: Query) => csvHref('/quotes/export.csv', query);

/** `GET /api/orders/export.csv`: the orders the viewer may see under these filters. */
export const ordersCsvHref = (query: Query) => csvHref('/orders/export.csv', query);

/** `GET /api/admin/price-book/tables/<table>.csv` (admin): one table of the active book. */
export const priceBookTableCsvHref = (table: PriceBookTable) => `/api/admin/price-book/tables/${table}.csv`;

/** `POST /api/admin/price-book/tubes/import-preview` (admin): the file's tube table against the active book; stores nothing. */
export function previewTubeImport(csv: string): Promise<TubeImportPreview & { baseVersion: number }> {
  return request('/admin/price-book/tubes/import-preview', { method: 'POST', body: { csv } });
}
