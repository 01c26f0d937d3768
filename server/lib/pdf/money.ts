/** Money in integer minor units (cents) shown with its currency, e.g. `$12,345.60`, `€1,200.00`. */

const formatters = new Map<string, Intl.NumberFormat>();

function formatter(currency: string): Intl.NumberFormat {
  let f = formatters.get(currency);
  if (!f) {
    f = new Intl.NumberFormat('en-US', { style: 'currency', currency, currencyDisplay: 'symbol' });
    formatters.set(currency, f);
  }
  return f;
}

/** Digits after the decimal point of `currency` (2 for USD, EUR, GBP, CAD; 0 for JPY). */
export function minorDigits(currency: string): number {
  return formatter(currency).resolvedOptions().maximumFractionDigits ?? 2;
}

/** `amount_minor` (an integer of the currency's minor unit) as text with the currency's symbol. */
export function formatMoney(amount_minor: number, currency: string): string {
  return formatter(currency).format(amount_minor / 10 ** minorDigits(currency));
}

/** `pct` % of `amount_minor`, rounded to a whole minor unit (half away from zero). */
export function percentOf(amount_minor: number, pct: number): number {
  const exact = (amount_minor * pct) / 100;
  return Math.sign(exact) * Math.round(Math.abs(exact));
}
