/**
 * Streams a CSV download: the first page is read before any byte is sent (so a bad query is still
 * a JSON 400), then the header and each page as it comes. UTF-8 with a byte-order mark, so
 * spreadsheets read "°C" and "€" right.
 */
import type { Response } from 'express';
import { csvLine, type CsvValue } from '../../shared/csv';

/** `name-2026-12-03.csv`: what the file is and the day it was taken. */
export function csvFilename(name: string, now = new Date()): string {
  return `${name}-${now.toISOString().slice(0, 10)}.csv`;
}

export async function sendCsv(res: Response, filename: string, header: readonly string[], pages: AsyncIterable<CsvValue[][]>): Promise<void> {
  const it = pages[Symbol.asyncIterator]();
  let next = await it.next();
  res.status(200);
  res.set({
    'Content-Type': 'text/csv; charset=utf-8',
    'Content-Disposition': `attachment; filename="${filename.replace(/[^\w.-]/g, '_')}"`,
    'Cache-Control': 'no-store',
    'X-Content-Type-Options': 'nosniff',
  });
  res.write(`\uFEFF${csvLine(header)}`);
  while (!next.done) {
    res.write(next.value.map(csvLine).join(''));
    next = await it.next();
  }
  res.end();
}

/** Money in minor units as a plain decimal for a spreadsheet: 1738884 → "17388.84". */
export function csvMoney(minor: number, digits = 2): string {
  return (minor / 10 ** digits).toFixed(digits);
}
