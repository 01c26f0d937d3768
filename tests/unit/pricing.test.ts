/**
 * One bill of materials and its price recomputed BY HAND from the demo price book (whose figures
 * are invented, see demo-price-book.ts): every line and the total. The arithmetic is written out
 * beside each check; rounding is half up to a cent per line, quantities to 0.01.
 *
 * The design: 20 copper tubes 3/4 in BWG 16, 1.0 m long, in an NPS 6 STD shell (ID 168.3 −
 * 2 × 7.11 = 154.08 mm, wall 7.11 mm), baffles every 0.25 m, no rating (nozzles by shell size).
 */
import { describe, expect, it } from 'vitest';
import { billOfMaterials } from '../../server/features/pricing/bom';
import { demoPriceBook } from '../../server/features/pricing/demo-price-book';
import { priceDesign } from '../../server/features/pricing/price';
import { priceBookSchema } from '../../shared/schemas/price-book';
import { PIPE_SHELLS, TUBE_MATERIALS, TUBE_SIZES } from '../../shared/thermal/geometry';
import { nps6 as shell, smallCooler } from './pricing-fixture';

describe('the demo price book', () => {
  it('parses and covers every catalogue tube, material and pipe shell', () => {
    expect(() => priceBookSchema.parse(demoPriceBook)).not.toThrow();
    const walls = TUBE_SIZES.reduce((n, s) => n + s.walls.length, 0);
    expect(demoPriceBook.tubes).toHaveLength(TUBE_MATERIALS.length * walls);
    expect(demoPriceBook.shellPipe.map((p) => p.label)).toEqual(PIPE_SHELLS.map((s) => s.label));
  });
});

describe('bill of materials and price of the small copper cooler, by hand', () => {
  const price = priceDesign(smallCooler, demoPriceBook, 1, { quantity: 1 });
  const line = (key: string) => price.lines.find((l) => l.key === key)!;
  const check = (key: string, quantity: number, rate: number, amount: number) =>
    expect([line(key).quantity, line(key).rate_minor, line(key).amount_minor]).toEqual([quantity, rate, amount]);

  it('has the shell the test assumes', () => {
    expect(shell.innerDiameter_m).toBeCloseTo(0.15408, 6);
  });

  it('prices the materials', () => {
    // tube row: ID = 19.05 − 2 × 1.651 = 15.748 mm; π/4 (19.05² − 15.748²) = 90.2446 mm²;
    // × 8940 kg/m³ = 0.806787 kg/m; × 1400 ¢/kg = 1129.50 ¢ + 60 ¢ premium = 1189.50 → 1190 ¢/m
    // 20 × (1.0 + 0.05) = 21.00 m × 1190 = 24 990
    check('tubes', 21, 1190, 24_990);
    expect(line('tubes').source).toBe('price book v1 · tubes · copper 3/4 in BWG 16');
    // t = max(25 mm, 0.08 × 154.08 = 12.3 mm) = 25 mm; blank ⌀ 1.2 × 0.15408 + 0.1 = 0.284896 m;
    // 2 × π/4 × 0.284896² × 0.025 × 7850 = 2 × 0.0637474 × 196.25 = 25.0209 → 25.02 kg × 180 = 4503.6 → 4504
    check('tubesheets', 25.02, 180, 4504);
    // round(1.0 / 0.25) − 1 = 3 baffles, 6 mm (ID ≤ 0.4 m): 3 × 0.8 × π/4 × 0.15408² × 0.006 × 7850
    // = 3 × 0.8 × 0.0186458 × 47.1 = 2.1077 → 2.11 kg × 180 = 379.8 → 380
    check('baffles', 2.11, 180, 380);
    // between the tubesheets 1.0 − 2 × 0.025 = 0.95 m × 7200 = 6840
    check('shell', 0.95, 7200, 6840);
    // smallest heads entry ≥ 0.15408 m: 0.16 m → 62 000 a pair
    check('heads', 1, 62_000, 62_000);
    // NPS ≥ 6.066 in / 4 = 1.52 → NPS 2 class 150 at 14 000, two a side
    check('nozzles-tube', 2, 14_000, 28_000);
    check('nozzles-shell', 2, 14_000, 28_000);
    // 4 tie rods (ID 6.07 in < 15.5 in) × 0.95 m = 3.80 m × 450 = 1710
    check('tie-rods', 3.8, 450, 1710);
    check('gaskets', 1, 8500, 8500);
    check('bolting', 1, 12_000, 12_000);
    // π × (0.15408 + 2 × 0.00711) × (0.95 + 0.15408) = π × 0.1683 × 1.10408 = 0.58376 → 0.58 m² × 1800 = 1044
    check('paint', 0.58, 1800, 1044);
  });

  it('prices the labour at the shop rate of 9500 ¢/h', () => {
    check('labour-tube-ends', 3.2, 9500, 30_400); // 2 × 20 ends × 0.08 h
    check('labour-baffles', 1.5, 9500, 14_250); // 3 × 0.5 h
    check('labour-nozzles', 6, 9500, 57_000); // 4 × 1.5 h
    check('labour-fit-up', 6, 9500, 57_000);
    check('labour-hydrotest', 3, 9500, 28_500);
    check('labour-paint', 2, 9500, 19_000);
  });

  it('adds overhead and margin and totals', () => {
    // material 24 990 + 4504 + 380 + 6840 + 62 000 + 28 000 + 28 000 + 1710 + 8500 + 12 000 + 1044 = 177 968
    // labour 21.7 h × 9500 = 206 150; material + labour = 384 118
    // overhead 18 % × 384 118 = 69 141.24 → 69 141
    check('overhead', 18, 384_118, 69_141);
    // margin 22 % × (384 118 + 69 141 = 453 259) = 99 716.98 → 99 717
    check('margin', 22, 453_259, 99_717);
    // unit 453 259 + 99 717 = 552 976 (USD 5 529.76); one unit, no break, no expedite
    expect(price.unit_minor).toBe(552_976);
    expect(price.total_minor).toBe(552_976);
    expect(price.lines).toHaveLength(19);
    expect(price.lines.reduce((s, l) => s + l.amount_minor, 0)).toBe(552_976);
    expect(price).toMatchObject({ currency: 'USD', quantity: 1, priceBookVersion: 1 });
  });

  it('the bill matches the price lines item for item', () => {
    const bom = billOfMaterials(smallCooler, demoPriceBook);
    expect(bom.map((i) => [i.key, i.quantity])).toEqual(price.lines.slice(0, 17).map((l) => [l.key, l.quantity]));
  });
});
