/**
 * One way to write numbers, money, dates and counts, for the pages, the PDFs, the e-mails and the
 * CSV exports alike: digit grouping ("171,100"), a few significant digits, "US$17,388.84",
 * "4 Dec 2026", "4 Dec 2026, 14:05", "1 order" / "2 orders".
 */

const numberFormats = new Map<string, Intl.NumberFormat>();

function numberFormat(key: string, options: Intl.NumberFormatOptions): Intl.NumberFormat {
  let f = numberFormats.get(key);
  if (!f) numberFormats.set(key, (f = new Intl.NumberFormat('en-GB', options)));
  return f;
}

/** `value` with grouping and `digits` significant digits: 171,100 · 0.931 · 2,778 (never "-0"). */
export function formatNumber(value: number, digits = 3): string {
  if (!Number.isFinite(value)) return '—';
  const rounded = Number(value.toPrecision(digits));
  if (rounded === 0) return '0'; // never "-0"
  // as many decimals as the significant digits need (0.000123 keeps its 3), at most 20
  const decimals = Math.min(20, Math.max(0, digits - 1 - Math.floor(Math.log10(Math.abs(rounded)))));
  const text = numberFormat(`g${decimals}`, { maximumFractionDigits: decimals }).format(rounded);
  return /^-0(\.0*)?$/.test(text) ? '0' : text;
}

/** `value` with grouping and at most `decimals` decimals: 1,234.5 · 40 (temperatures, percentages). */
export function formatFixed(value: number, decimals = 1): string {
  if (!Number.isFinite(value)) return '—';
  const text = numberFormat(`f${decimals}`, { maximumFractionDigits: decimals }).format(value);
  return /^-0(\.0*)?$/.test(text) ? '0' : text;
}

/** A whole count with grouping: 3,520. */
export function formatCount(n: number): string {
  return numberFormat('c', { maximumFractionDigits: 0 }).format(n);
}

/** "1 order", "2 orders", "1,200 tubes"; `many` for irregular plurals ("1 pass", "2 passes"). */
export function plural(n: number, one: string, many = `${one}s`): string {
  return `${formatCount(n)} ${n === 1 ? one : many}`;
}

/** Digits after the decimal point of `currency` (2 for USD, EUR, GBP; 0 for JPY). */
export function minorDigits(currency: string): number {
  return moneyFormat(currency).resolvedOptions().maximumFractionDigits ?? 2;
}

function moneyFormat(currency: string): Intl.NumberFormat {
  return numberFormat(`m${currency}`, { style: 'currency', currency });
}

/** Integer minor units in the currency's own decimals: 1738884 USD → "US$17,388.84", GBP → "£…". */
export function formatMoney(minor: number, currency: string): string {
  return moneyFormat(currency).format(minor / 10 ** minorDigits(currency) + 0);
}

export interface DateOptions {
  /** IANA zone; the reader's own when omitted (the server runs in UTC) */
  timeZone?: string;
}

const dateFormats = new Map<string, Intl.DateTimeFormat>();

function dateFormat(withTime: boolean, timeZone: string | undefined): Intl.DateTimeFormat {
  const key = `${withTime}|${timeZone ?? ''}`;
  let f = dateFormats.get(key);
  if (!f) {
    const options: Intl.DateTimeFormatOptions = { day: 'numeric', month: 'short', year: 'numeric', timeZone };
    if (withTime) Object.assign(options, { hour: '2-digit', minute: '2-digit', hourCycle: 'h23' });
    dateFormats.set(key, (f = new Intl.DateTimeFormat('en-GB', options)));
  }
  return f;
}

const DATE_ONLY = /^\d{4}-\d{2}-\d{2}$/;

function toDate(value: string | Date): Date {
  if (value instanceof Date) return value;
  // a bare calendar day ("2027-03-31") is that day wherever the reader is, not shifted by a zone
  return DATE_ONLY.test(value) ? new Date(`${value}T12:00:00Z`) : new Date(value);
}

/** "4 Dec 2026"; "—" when there is none; the raw text when it is not a date. */
export function formatDate(value: string | Date | null | undefined, options: DateOptions = {}): string {
  if (!value) return '—';
  const date = toDate(value);
  if (Number.isNaN(date.getTime())) return String(value);
  const zone = typeof value === 'string' && DATE_ONLY.test(value) ? 'UTC' : options.timeZone;
  return dateFormat(false, zone).format(date);
}

/** "4 Dec 2026, 14:05" (24-hour clock); "—" when there is none; the raw text when it is not a date. */
export function formatDateTime(value: string | Date | null | undefined, options: DateOptions = {}): string {
  if (!value) return '—';
  const date = toDate(value);
  if (Number.isNaN(date.getTime())) return String(value);
  return dateFormat(true, options.timeZone).format(date);
}

/** "PO 4500123" for a bare purchase-order number; one already written "PO-88412" or "PO 88412" keeps its own prefix. */
export function poLabel(poNumber: string): string {
  const po = poNumber.trim();
  return /^p\.?\s?o\b|^po[-\s#:]?\d/i.test(po) ? po : `PO ${po}`;
}
