/**
 * Quantity breaks, expedite, overrides, the no-price error and the sizing cost function, on the
 * small copper cooler of pricing.test.ts (unit price 552 976 ¢ from the invented demo book).
 */
import { describe, expect, it } from 'vitest';
import { nozzleSizes } from '../../server/features/pricing/bom';
import { demoPriceBook } from '../../server/features/pricing/demo-price-book';
import { costFromPriceBook, priceDesign, PricingError } from '../../server/features/pricing/price';
import type { PriceBook } from '../../shared/schemas/price-book';
import type { RateResult } from '../../shared/schemas/thermal';
import { smallCooler } from './pricing-fixture';

const UNIT = 552_976;
const price = (opts: Parameters<typeof priceDesign>[3], book: PriceBook = demoPriceBook) => priceDesign(smallCooler, book, 1, opts);
const lineOf = (p: ReturnType<typeof price>, key: string) => p.lines.find((l) => l.key === key);

describe('quantity breaks (3+: 3 %, 5+: 5 %, 10+: 8 % in the demo book)', () => {
  it('gives no discount below the first break', () => {
    const p = price({ quantity: 2 });
    expect(lineOf(p, 'quantity-discount')).toBeUndefined();
    expect(p.total_minor).toBe(2 * UNIT);
  });
  it('takes the largest break reached', () => {
    // 5 × 552 976 = 2 764 880; 5 % = 138 244 → total 2 626 636
    const p = price({ quantity: 5 });
    expect(lineOf(p, 'quantity-discount')).toMatchObject({ group: 'discount', quantity: 5, rate_minor: 2_764_880, amount_minor: -138_244 });
    expect(p.total_minor).toBe(2_626_636);
    expect(p.unit_minor).toBe(UNIT);
    // 12 × 552 976 = 6 635 712; 8 % = 530 856.96 → 530 857
    expect(lineOf(price({ quantity: 12 }), 'quantity-discount')?.amount_minor).toBe(-530_857);
  });
});

describe('expedite (15 % when need-by is inside the 8-week lead time)', () => {
  const today = new Date('2026-01-05T10:00:00Z'); // + 8 weeks = 2026-03-02
  it('adds a surcharge for an earlier date', () => {
    // 15 % × 552 976 = 82 946.4 → 82 946; total 635 922
    const p = price({ quantity: 1, needBy: '2026-03-01', today });
    expect(lineOf(p, 'expedite')).toMatchObject({ group: 'surcharge', amount_minor: 82_946 });
    expect(p.total_minor).toBe(635_922);
  });
  it('adds nothing at or after the standard date, or without a date', () => {
    expect(lineOf(price({ quantity: 1, needBy: '2026-03-02', today }), 'expedite')).toBeUndefined();
    expect(lineOf(price({ quantity: 1, today }), 'expedite')).toBeUndefined();
  });
});

describe('overrides', () => {
  it('replace the amount, keep the computed value and the reason, and flow into overhead and margin', () => {
    const p = price({ quantity: 1, overrides: [{ key: 'heads', amount_minor: 55_000, reason: 'bonnets in stock', by: 'Sam Reyes' }] });
    expect(lineOf(p, 'heads')).toMatchObject({ amount_minor: 55_000, override: { computed_minor: 62_000, reason: 'bonnets in stock', by: 'Sam Reyes' } });
    // material 177 968 − 7000 = 170 968; + labour 206 150 = 377 118; overhead 18 % = 67 881.24 → 67 881;
    // margin 22 % × 444 999 = 97 899.78 → 97 900; unit 542 899
    expect(lineOf(p, 'overhead')?.amount_minor).toBe(67_881);
    expect(lineOf(p, 'margin')?.amount_minor).toBe(97_900);
    expect(p.unit_minor).toBe(542_899);
  });
  it('on the margin keeps the computed margin', () => {
    const p = price({ quantity: 1, overrides: [{ key: 'margin', amount_minor: 80_000, reason: 'strategic customer', by: 'Sam Reyes' }] });
    expect(lineOf(p, 'margin')?.override?.computed_minor).toBe(99_717);
    expect(p.unit_minor).toBe(UNIT - 99_717 + 80_000);
  });
  it('of a line that does not exist is refused', () => {
    expect(() => price({ quantity: 1, overrides: [{ key: 'gold-plating', amount_minor: 1, reason: 'why not', by: 'x' }] })).toThrow(/gold-plating/);
  });
});

describe('a design the book cannot price', () => {
  const without = (patch: Partial<PriceBook>): PriceBook => ({ ...demoPriceBook, ...patch });
  it('throws PricingError no-price naming the tube row', () => {
    const book = without({ tubes: demoPriceBook.tubes.filter((t) => !(t.material === 'copper' && t.od === '3/4 in')) });
    let err: unknown;
    try { price({ quantity: 1 }, book); } catch (e) { err = e; }
    expect(err).toBeInstanceOf(PricingError);
    expect(err).toMatchObject({ code: 'no-price', status: 422 });
    expect((err as Error).message).toContain('tubes · copper 3/4 in BWG 16');
  });
  it('names a missing shell pipe row', () => {
    const book = without({ shellPipe: demoPriceBook.shellPipe.filter((s) => s.label !== 'NPS 6 STD') });
    expect(() => price({ quantity: 1 }, book)).toThrow(/shell pipe · NPS 6 STD/);
  });
  it('ranks last in the sizing cost function instead of throwing', () => {
    const book = without({ tubes: demoPriceBook.tubes.filter((t) => t.material !== 'copper') });
    expect(costFromPriceBook(book)(smallCooler)).toBe(Infinity);
    expect(costFromPriceBook(demoPriceBook)({ ...smallCooler, tubeOuterDiameter_m: 0.0191 })).toBe(Infinity);
  });
});

describe('costFromPriceBook', () => {
  const costOf = costFromPriceBook(demoPriceBook);
  it('ranks the copper design above (dearer than) the same design in carbon steel', () => {
    const steel = { ...smallCooler, tubeMaterial: 'carbon-steel' };
    expect(costOf(smallCooler)).toBeGreaterThan(costOf(steel));
    expect([smallCooler, steel].sort((a, b) => costOf(a) - costOf(b))[0]).toBe(steel);
  });
  it('agrees with the itemised unit price to within rounding (invariant: same rules, same book)', () => {
    expect(Math.abs(costOf(smallCooler) - UNIT)).toBeLessThan(50);
    const rolled = { ...smallCooler, shellInnerDiameter_m: 0.7, shellLabel: undefined, tubeCount: 400, tubeLength_m: 3 };
    expect(Math.abs(costOf(rolled) / priceDesign(rolled, demoPriceBook, 1, { quantity: 1 }).unit_minor - 1)).toBeLessThan(1e-3);
  });
});

describe('nozzle sizes from a rating', () => {
  it('keeps a liquid at ≤ 3 m/s in the tube-side nozzle', () => {
    // 1.5 m/s × (20 / 2 tubes per pass) × π/4 × 0.015748² = 2.922e-3 m³/s;
    // bore √(4 × 2.922e-3 / (π × 3)) = 35.2 mm = 1.39 in → NPS 1.5 (by shell size it would be NPS 2)
    const rating = { velocity_m_s: 1.5 } as RateResult;
    expect(nozzleSizes({ ...smallCooler, tubePasses: 2, rating }, smallCooler.shellInnerDiameter_m)).toMatchObject({ tube: 1.5, shell: 2, basis: 'flow' });
  });
});
