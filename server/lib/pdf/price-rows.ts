/**
 * Price lines for a customer document. Lines of the groups material, labour, overhead and margin
 * are per unit and add up to `unit_minor`; discount and surcharge lines apply to the whole order
 * (the price book's quantity breaks and expedite surcharge), so
 * total = unit × quantity + adjustments. Sources and override reasons are internal and not shown.
 */
import type { Price, PriceLine } from '../../../shared/schemas/price-book';
import { priceLineText } from '../../../shared/price-words';
import { formatNumber } from './quantities';
import { formatMoney, percentOf } from './money';
import type { Row } from './table';

export type PriceDetail = 'summary' | 'detailed';

/** per-order lines: the book's discount and surcharge, and the lines sales added (freight, crating…) */
const isAdjustment = (l: PriceLine) => l.group === 'discount' || l.group === 'surcharge' || l.group === 'extra';

/** Rows `[description, quantity, unit, rate, amount]` of the price table. */
export function priceRows(price: Price, detail: PriceDetail, unitDescription: string): Row[] {
  const money = (m: number) => formatMoney(m, price.currency);
  const rows: Row[] = [];
  if (detail === 'detailed') {
    for (const l of price.lines.filter((x) => !isAdjustment(x))) {
      rows.push({ cells: [priceLineText(l.description), formatNumber(l.quantity, 4), l.unit, money(l.rate_minor), money(l.amount_minor)] });
    }
    rows.push({ cells: ['Price per unit', '', '', '', money(price.unit_minor)], emphasis: true });
  }
  rows.push({ cells: [unitDescription, String(price.quantity), 'unit', money(price.unit_minor), money(price.unit_minor * price.quantity)] });
  for (const l of price.lines.filter(isAdjustment)) {
    rows.push({ cells: [l.description, '', '', '', money(l.amount_minor)] });
  }
  rows.push({ cells: [`Total (${price.currency})`, '', '', '', money(price.total_minor)], emphasis: true });
  return rows;
}

/** `[label, amount]` pairs of the payment split. */
export function paymentRows(price: Price, depositPct: number): string[][] {
  const deposit = percentOf(price.total_minor, depositPct);
  return [
    [`Deposit on acceptance (${formatNumber(depositPct, 3)} % of the total)`, formatMoney(deposit, price.currency)],
    ['Balance', formatMoney(price.total_minor - deposit, price.currency)],
  ];
}
