/** The bounds of a price override (ours: ±90 % of the computed line, a cap of 10^10 minor units). */
import { describe, expect, it } from 'vitest';
import { demoPriceBook } from '../../server/features/pricing/demo-price-book';
import { OVERRIDE_CAP_MINOR, overrideRange, priceDesign } from '../../server/features/pricing/price';
import { smallCooler } from './pricing-fixture';

describe('overrideRange', () => {
  it('keeps a positive line positive: 10 % to 190 % of it', () => {
    expect(overrideRange(62_000)).toEqual({ min: 6_200, max: 117_800 });
  });
  it('keeps a discount (negative) line negative', () => {
    expect(overrideRange(-10_000)).toEqual({ min: -19_000, max: -1_000 });
  });
  it('leaves a zero line only zero', () => {
    expect(overrideRange(0)).toEqual({ min: 0, max: 0 });
  });
  it('never passes the absolute cap', () => {
    expect(overrideRange(9e15).max).toBe(OVERRIDE_CAP_MINOR);
  });
});

describe('priceDesign with an out-of-range override', () => {
  const price = (amount_minor: number) =>
    priceDesign(smallCooler, demoPriceBook, 1, { quantity: 1, overrides: [{ key: 'heads', amount_minor, reason: 'test', by: 'x' }] });
  it.each([-1, 0, 6_199, 117_801, 9e15])('refuses %d for the heads line (computed 62 000), naming it', (amount) => {
    expect(() => price(amount)).toThrow(/\(heads\)/);
  });
  it('accepts the ends of the band', () => {
    expect(price(6_200).lines.find((l) => l.key === 'heads')?.amount_minor).toBe(6_200);
    expect(price(117_800).lines.find((l) => l.key === 'heads')?.amount_minor).toBe(117_800);
  });
});
