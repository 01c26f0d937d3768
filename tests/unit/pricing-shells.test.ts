/**
 * Shells in series and baffles in the bill and the price (issue 10): the small copper cooler of
 * pricing.test.ts (unit price 552 976 ¢ from the invented demo book, by hand there) built as two
 * identical shells in series, recomputed BY HAND line by line; baffle counts from the spacings;
 * the sizing cost function counting the same; an old stored design (no v2 fields) unchanged.
 */
import { describe, expect, it } from 'vitest';
import { billOfMaterials } from '../../server/features/pricing/bom';
import { demoPriceBook } from '../../server/features/pricing/demo-price-book';
import { bafflesPerShell, shellsOf } from '../../server/features/pricing/design-fields';
import { costFromPriceBook, priceDesign } from '../../server/features/pricing/price';
import { smallCooler } from './pricing-fixture';

const ONE_SHELL_UNIT = 552_976;
const twoShells = { ...smallCooler, shellsInSeries: 2 };
const price = (d: Parameters<typeof priceDesign>[0]) => priceDesign(d, demoPriceBook, 1, { quantity: 1 });

describe('two identical shells in series, by hand', () => {
  const p = price(twoShells);
  const line = (key: string) => p.lines.find((l) => l.key === key);
  const check = (key: string, quantity: number, rate: number, amount: number) =>
    expect([line(key)?.quantity, line(key)?.rate_minor, line(key)?.amount_minor]).toEqual([quantity, rate, amount]);

  it('doubles the tubes, the tubesheets (2 per shell) and every per-shell item', () => {
    // 2 × 20 × (1.0 + 0.05) = 42.00 m × 1190 = 49 980
    check('tubes', 42, 1190, 49_980);
    // 4 × 12.51045 kg (one tubesheet, pricing.test.ts) = 50.0418 → 50.04 kg × 180 = 9007.2 → 9007
    check('tubesheets', 50.04, 180, 9007);
    expect(line('tubesheets')?.description).toContain('4 (2 per shell)');
    // 2 × 3 baffles × 0.70257 kg = 4.2154 → 4.22 kg × 180 = 759.6 → 760
    check('baffles', 4.22, 180, 760);
    check('shell', 1.9, 7200, 13_680); // 2 × 0.95 m
    check('heads', 2, 62_000, 124_000); // a pair per shell
    check('nozzles-tube', 4, 14_000, 56_000);
    check('nozzles-shell', 4, 14_000, 56_000);
    check('tie-rods', 7.6, 450, 3420); // 2 × 4 × 0.95 m
    check('gaskets', 2, 8500, 17_000);
    check('bolting', 2, 12_000, 24_000);
    // 2 × 0.58376 = 1.16752 → 1.17 m² × 1800 = 2106
    check('paint', 1.17, 1800, 2106);
  });

  it('adds one interconnection line per connection, priced from the nozzle table, and says so', () => {
    const spools = p.lines.filter((l) => l.key.startsWith('interconnection-'));
    expect(spools.map((l) => l.key)).toEqual(['interconnection-1-2-tube', 'interconnection-1-2-shell']);
    // each spool: two flanged ends at the NPS 2 class 150 nozzle rate (the nozzles' own size): 2 × 14 000
    check('interconnection-1-2-tube', 2, 14_000, 28_000);
    check('interconnection-1-2-shell', 2, 14_000, 28_000);
    for (const s of spools) {
      expect(s.description).toMatch(/nozzle table/);
      expect(s.source).toBe('price book v1 · nozzles · up to NPS 2 class 150');
    }
  });

  it('counts the labour per shell (tube ends, baffles, fit-up, hydrotest of each shell) and the spools', () => {
    check('labour-tube-ends', 6.4, 9500, 60_800); // 2 shells × 2 × 20 ends × 0.08 h
    check('labour-baffles', 3, 9500, 28_500); // 2 × 3 × 0.5 h
    check('labour-nozzles', 12, 9500, 114_000); // 2 × 4 × 1.5 h
    check('labour-interconnections', 6, 9500, 57_000); // 2 spools × 2 ends × 1.5 h
    check('labour-fit-up', 12, 9500, 114_000);
    check('labour-hydrotest', 6, 9500, 57_000);
    check('labour-paint', 4, 9500, 38_000);
  });

  it('totals: the price rises to two shells plus the spools', () => {
    // material 49 980 + 9007 + 760 + 13 680 + 124 000 + 56 000 + 56 000 + 28 000 + 28 000 + 3420
    //   + 17 000 + 24 000 + 2106 = 411 953; labour 49.4 h = 469 300; sum 881 253
    // overhead 18 % = 158 625.54 → 158 626; margin 22 % × 1 039 879 = 228 773.38 → 228 773
    check('overhead', 18, 881_253, 158_626);
    check('margin', 22, 1_039_879, 228_773);
    expect(p.unit_minor).toBe(1_268_652);
    // two single shells (2 × 552 976) + the spools (56 000 material + 57 000 labour) × 1.18 × 1.22,
    // within the cents each line rounds
    expect(Math.abs(p.unit_minor - (2 * ONE_SHELL_UNIT + 113_000 * 1.18 * 1.22))).toBeLessThan(30);
    expect(p.lines.reduce((s, l) => s + l.amount_minor, 0)).toBe(p.unit_minor);
  });

  it('four shells: three connections a side, six spool lines', () => {
    const four = price({ ...smallCooler, shellsInSeries: 4 });
    expect(four.lines.filter((l) => l.key.startsWith('interconnection-'))).toHaveLength(6);
    expect(four.lines.find((l) => l.key === 'tubesheets')?.description).toContain('8 (2 per shell)');
    expect(four.unit_minor).toBeGreaterThan(2 * p.unit_minor);
  });

  it('the sizing cost function agrees with the itemised price for 1, 2 and 4 shells', () => {
    const costOf = costFromPriceBook(demoPriceBook);
    expect(Math.abs(costOf(smallCooler) - ONE_SHELL_UNIT)).toBeLessThan(50);
    expect(Math.abs(costOf(twoShells) - p.unit_minor)).toBeLessThan(100);
    const four = { ...smallCooler, shellsInSeries: 4 };
    expect(Math.abs(costOf(four) / price(four).unit_minor - 1)).toBeLessThan(1e-4);
    expect(costOf(twoShells)).toBeGreaterThan(2 * costOf(smallCooler));
  });
});

describe('baffles follow the spacing', () => {
  it('counts round(L/B) − 1 without end spacings (the rule every stored design was priced with)', () => {
    expect(bafflesPerShell(smallCooler)).toBe(3); // 1.0 / 0.25 = 4 crossings
    expect(bafflesPerShell({ ...smallCooler, baffleSpacing_m: 0.125 })).toBe(7);
    expect(bafflesPerShell({ ...smallCooler, baffleSpacing_m: undefined })).toBe(0); // a bundle in a bath
  });
  it('with inlet/outlet spacings: N_b = ⌊(L − L_bi − L_bo)/L_bc⌋ + 1 (Taborek, HEDH §3.3, memory)', () => {
    // ⌊(1.0 − 0.3 − 0.3) / 0.25⌋ + 1 = ⌊1.6⌋ + 1 = 2
    expect(bafflesPerShell({ ...smallCooler, inletBaffleSpacing_m: 0.3, outletBaffleSpacing_m: 0.3 })).toBe(2);
  });
  it('takes the design’s own per-shell count when it carries one', () => {
    expect(bafflesPerShell({ ...smallCooler, baffleCount: 9 })).toBe(9);
  });
  it('closer baffles cost more in the bill, the price and the cost function', () => {
    const close = { ...smallCooler, baffleSpacing_m: 0.125 };
    const bom = billOfMaterials(close, demoPriceBook);
    expect(bom.find((b) => b.key === 'labour-baffles')?.quantity).toBe(3.5); // 7 × 0.5 h
    // 7 × 0.70257 kg = 4.918 → 4.92 kg
    expect(bom.find((b) => b.key === 'baffles')?.quantity).toBe(4.92);
    expect(price(close).unit_minor).toBeGreaterThan(ONE_SHELL_UNIT);
    const costOf = costFromPriceBook(demoPriceBook);
    expect(costOf(close)).toBeGreaterThan(costOf(smallCooler));
    expect(Math.abs(costOf(close) - price(close).unit_minor)).toBeLessThan(50);
  });
});

describe('an old stored design (no v2 fields)', () => {
  it('reads as one shell, process in the tubes, and prices exactly as before', () => {
    expect(shellsOf(smallCooler)).toBe(1);
    const p = price(smallCooler);
    expect(p.unit_minor).toBe(ONE_SHELL_UNIT);
    expect(p.lines.some((l) => l.key.startsWith('interconnection-') || l.key === 'labour-interconnections')).toBe(false);
  });
  it('a nonsense shell count is read as the nearest of 1–4, never 0', () => {
    expect(shellsOf({ shellsInSeries: 0 })).toBe(1);
    expect(shellsOf({ shellsInSeries: 9 })).toBe(4);
  });
});
