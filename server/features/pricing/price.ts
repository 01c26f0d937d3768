/**
 * Prices a design from a price book: one line per BOM item (material at the book's rate, labour at
 * the shop rate), overhead % of (material + labour), margin % of (material + labour + overhead):
 * these lines are PER UNIT and sum to `unit_minor`. Then, per ORDER, on the subtotal unit × quantity:
 * a quantity-break discount line (negative) and an expedite surcharge line when the need-by date is
 * inside the standard lead time; then the lines a sales engineer added (freight, crating, inspection),
 * per order. `total_minor` = subtotal + discount + surcharge + added lines.
 *
 * Rounding: every line amount is rounded half up to a whole minor unit (cent) on its own
 * (quantity × rate, or % × base); sums are of the rounded line amounts, so the lines always add up.
 * Line quantities (m, kg, m², h) are rounded to 0.01 first (bom.ts) and priced as shown.
 */
import type { Price, PriceBook, PriceLine } from '../../../shared/schemas/price-book';
import { FREE_LINE_LABEL, OVERRIDE_CAP_MINOR, type FreeLine } from '../../../shared/schemas/quotes';
import { badRequest } from '../../lib/errors';
import { billOfMaterials, type BomInput, type FlangeClass } from './bom';
import { roundMinor } from './bom-rules';
import { indexBook, rateOf, type BookIndex } from './book-index';
import { PricingError } from './errors';

export { costFromPriceBook } from './cost';
export { PricingError } from './errors';

export interface PriceOverride {
  key: string;
  amount_minor: number;
  reason: string;
  by: string;
}

export interface PriceOptions {
  quantity: number;
  /** ISO date (`2026-09-30`) the customer needs the unit by */
  needBy?: string;
  /** default: now */
  today?: Date;
  overrides?: PriceOverride[];
  flangeClass?: FlangeClass;
  /** lines a sales engineer added (freight, crating, inspection…): per order, added to the total as given */
  freeLines?: (FreeLine & { by: string })[];
}

/** An added line as a price line: "Freight: DAP Rotterdam", one per order, its reason kept internal. */
export function freeLineToPriceLine(l: FreeLine & { by: string }, i: number): PriceLine {
  return {
    key: `extra-${i + 1}`,
    group: 'extra',
    description: l.description ? `${FREE_LINE_LABEL[l.kind]}: ${l.description}` : FREE_LINE_LABEL[l.kind],
    quantity: 1,
    unit: 'order',
    rate_minor: l.amount_minor,
    amount_minor: l.amount_minor,
    source: `added by ${l.by}`,
    added: { kind: l.kind, ...(l.description ? { description: l.description } : {}), reason: l.reason, by: l.by },
  };
}

/**
 * Bounds of a price override (ours): within ±90 % of the computed line, so an override can neither
 * zero a line nor flip its sign, and at most 10^10 minor units (100 million in the currency) a line,
 * so a quote of 500 units of ~50 lines stays near 10^14, far inside the safe-integer range (9·10^15).
 */
export const OVERRIDE_BAND = 0.9;
export { OVERRIDE_CAP_MINOR };

/** The override's allowed range for a computed line amount (integers, both ends included). */
export function overrideRange(computedMinor: number): { min: number; max: number } {
  const a = computedMinor * (1 - OVERRIDE_BAND);
  const b = computedMinor * (1 + OVERRIDE_BAND);
  return { min: Math.max(-OVERRIDE_CAP_MINOR, Math.ceil(Math.min(a, b))), max: Math.min(OVERRIDE_CAP_MINOR, Math.floor(Math.max(a, b))) };
}

function checkOverride(line: Omit<PriceLine, 'override'>, amountMinor: number) {
  const { min, max } = overrideRange(line.amount_minor);
  if (amountMinor >= min && amountMinor <= max) return;
  const why =
    line.amount_minor === 0
      ? 'its computed amount is 0, so it cannot be overridden'
      : Math.abs(amountMinor) > OVERRIDE_CAP_MINOR
        ? `an override may be at most ${OVERRIDE_CAP_MINOR} minor units`
        : `an override must stay within ±${OVERRIDE_BAND * 100} % of the computed ${line.amount_minor}: from ${min} to ${max}`;
  throw new PricingError('override-out-of-range', `Price override of "${line.description}" (${line.key}) is ${amountMinor} minor units; ${why}.`);
}

const indexes = new WeakMap<PriceBook, BookIndex>();

/** The book's index, built once per book object. */
export function bookIndex(book: PriceBook): BookIndex {
  let ix = indexes.get(book);
  if (!ix) indexes.set(book, (ix = indexBook(book)));
  return ix;
}

const DAY_MS = 86_400_000;

/** The date (UTC midnight) a unit ordered `today` is ready at the standard lead time. */
export function standardReadyDate(book: PriceBook, today = new Date()): Date {
  const midnight = Date.UTC(today.getUTCFullYear(), today.getUTCMonth(), today.getUTCDate());
  return new Date(midnight + book.standardLeadTimeWeeks * 7 * DAY_MS);
}

/** True when `needBy` falls before the standard-lead-time date. */
export function needsExpedite(book: PriceBook, needBy: string, today = new Date()): boolean {
  const t = Date.parse(needBy);
  if (Number.isNaN(t)) throw badRequest(`needBy: not a date: ${needBy}`, { needBy: 'must be an ISO date' });
  return t < standardReadyDate(book, today).getTime();
}

export function priceDesign(design: BomInput, book: PriceBook, bookVersion: number, opts: PriceOptions): Price {
  const ix = bookIndex(book);
  const src = (entry: string) => `price book v${bookVersion} · ${entry}`;
  const overrides = new Map((opts.overrides ?? []).map((o) => [o.key, o]));
  const lines: PriceLine[] = [];
  /** adds the line, applying an override (which keeps the computed amount); returns the effective amount */
  const add = (line: Omit<PriceLine, 'override'>): number => {
    const o = overrides.get(line.key);
    overrides.delete(line.key);
    if (o) checkOverride(line, o.amount_minor);
    lines.push(o ? { ...line, amount_minor: o.amount_minor, override: { computed_minor: line.amount_minor, reason: o.reason, by: o.by } } : line);
    return lines[lines.length - 1]!.amount_minor;
  };
  const pct = (key: string, group: PriceLine['group'], description: string, percent: number, base: number, entry: string, sign = 1) =>
    add({ key, group, description, quantity: percent, unit: '%', rate_minor: base, amount_minor: sign * roundMinor((base * percent) / 100), source: src(entry) });

  let material = 0;
  let labour = 0;
  for (const item of billOfMaterials(design, book, { flangeClass: opts.flangeClass })) {
    const { rate_minor, entry } = rateOf(ix, item.ref);
    const amount = add({
      key: item.key, group: item.group, description: item.description, quantity: item.quantity, unit: item.unit,
      rate_minor, amount_minor: roundMinor(item.quantity * rate_minor), source: src(entry),
    });
    if (item.group === 'material') material += amount;
    else labour += amount;
  }
  const overhead = pct('overhead', 'overhead', `Overhead ${book.overhead_pct} % of material + labour`, book.overhead_pct, material + labour, `overhead ${book.overhead_pct} %`);
  const base = material + labour + overhead;
  const margin = pct('margin', 'margin', `Margin ${book.margin_pct} % of material + labour + overhead`, book.margin_pct, base, `margin ${book.margin_pct} %`);
  const unit = base + margin;

  const quantity = opts.quantity;
  const subtotal = unit * quantity;
  let total = subtotal;
  const brk = book.quantityBreaks.filter((b) => b.minQuantity <= quantity).sort((a, b) => b.minQuantity - a.minQuantity)[0];
  if (brk) {
    total += pct('quantity-discount', 'discount', `Quantity discount ${brk.discount_pct} % on ${quantity} units (from ${brk.minQuantity})`,
      brk.discount_pct, subtotal, `quantity break ${brk.minQuantity}+ · ${brk.discount_pct} %`, -1);
  }
  if (opts.needBy && needsExpedite(book, opts.needBy, opts.today)) {
    total += pct('expedite', 'surcharge', `Expedite ${book.expedite_pct} %: need-by ${opts.needBy} is inside the ${book.standardLeadTimeWeeks}-week lead time`,
      book.expedite_pct, subtotal, `expedite ${book.expedite_pct} %`);
  }
  (opts.freeLines ?? []).forEach((l, i) => {
    const line = freeLineToPriceLine(l, i);
    lines.push(line);
    total += line.amount_minor;
  });
  const unknown = [...overrides.keys()];
  if (unknown.length) throw new PricingError('unknown-price-line', `No price line to override: ${unknown.join(', ')}.`);
  return { currency: book.currency, lines, unit_minor: unit, quantity, total_minor: total, priceBookVersion: bookVersion };
}
