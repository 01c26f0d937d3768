/** Money in integer minor units (cents) shown with its currency, as on every page: `US$12,345.60`, `€1,200.00`. */
export { formatMoney, minorDigits } from '../../../shared/format';

/** `pct` % of `amount_minor`, rounded to a whole minor unit (half away from zero). */
export function percentOf(amount_minor: number, pct: number): number {
  const exact = (amount_minor * pct) / 100;
  return Math.sign(exact) * Math.round(Math.abs(exact));
}
