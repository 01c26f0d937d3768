/**
 * Issue 11 in the bill and the price: the sized nozzles set the nozzle lines, a shell inlet above
 * TEMA's ρv² rule adds an impingement plate, and the construction (BEM / BEU / AES) changes the
 * tubesheets, U-bends, floating head and their labour. Figures from the demo price book (invented).
 */
import { describe, expect, it } from 'vitest';
import { billOfMaterials } from '../../server/features/pricing/bom';
import { demoPriceBook } from '../../server/features/pricing/demo-price-book';
import { costFromPriceBook, priceDesign } from '../../server/features/pricing/price';
import type { DesignNozzle } from '../../shared/schemas/thermal';
import { smallCooler } from './pricing-fixture';

const nozzle = (side: 'tube' | 'shell', role: 'inlet' | 'outlet', nps: number, plate = false): DesignNozzle =>
  ({ side, role, label: `NPS ${nps}`, innerDiameter_m: 0.05, velocity_m_s: 2, rhoV2: plate ? 4410 : 1000, impingementPlate: plate });
const nozzles = [nozzle('tube', 'inlet', 2), nozzle('tube', 'outlet', 2), nozzle('shell', 'inlet', 3, true), nozzle('shell', 'outlet', 3)];
const item = (items: ReturnType<typeof billOfMaterials>, key: string) => items.find((i) => i.key === key);

describe('bill of materials: nozzles and construction (issue 11)', () => {
  it('an old design (no nozzles, no construction) is billed as before: BEM, nozzles by shell size, no plate', () => {
    const items = billOfMaterials(smallCooler);
    expect(item(items, 'nozzles-tube')!.description).toMatch(/by shell size/);
    expect(item(items, 'impingement-plate')).toBeUndefined();
    expect(item(items, 'u-bends')).toBeUndefined();
    expect(item(items, 'floating-head')).toBeUndefined();
    expect(item(items, 'labour-tube-ends')!.quantity).toBeCloseTo(2 * 20 * 0.08, 9);
  });

  it('sized nozzles set the nozzle lines; a shell inlet above the rule adds an impingement plate line', () => {
    const items = billOfMaterials({ ...smallCooler, nozzles });
    expect(item(items, 'nozzles-tube')!.ref).toEqual({ kind: 'nozzle', nps: 2, rating: '150' });
    expect(item(items, 'nozzles-shell')!.ref).toEqual({ kind: 'nozzle', nps: 3, rating: '150' });
    expect(item(items, 'nozzles-shell')!.description).toMatch(/by sized nozzles/);
    const plate = item(items, 'impingement-plate')!;
    expect(plate.quantity).toBe(1);
    expect(plate.ref).toEqual({ kind: 'sundry', item: 'impingementPlate_minor' });
    const price = priceDesign({ ...smallCooler, nozzles }, demoPriceBook, 1, { quantity: 1 });
    const line = price.lines.find((l) => l.key === 'impingement-plate')!;
    expect(line.amount_minor).toBe(24_000);
    // two shells in series: one plate per shell
    expect(item(billOfMaterials({ ...smallCooler, nozzles, shellsInSeries: 2 }), 'impingement-plate')!.quantity).toBe(2);
  });

  it('U-tubes (BEU): one tubesheet, n tube ends, n/2 U-bends priced from the book', () => {
    const bem = billOfMaterials({ ...smallCooler, construction: 'BEM' });
    const beu = billOfMaterials({ ...smallCooler, construction: 'BEU' });
    expect(item(beu, 'tubesheets')!.quantity).toBeCloseTo(item(bem, 'tubesheets')!.quantity / 2, 1);
    expect(item(beu, 'u-bends')!.quantity).toBe(10);
    expect(item(beu, 'labour-tube-ends')!.quantity).toBeCloseTo(20 * 0.08, 9);
    const price = priceDesign({ ...smallCooler, construction: 'BEU' }, demoPriceBook, 1, { quantity: 1 });
    expect(price.lines.find((l) => l.key === 'u-bends')!.amount_minor).toBe(10 * 650);
  });

  it('floating head (AES): a second pair of heads, gasket and bolting sets and a second fit-up; dearer than BEM', () => {
    const aes = billOfMaterials({ ...smallCooler, construction: 'AES' });
    expect(item(aes, 'floating-head')!.ref).toEqual({ kind: 'heads', shellDiameter_m: smallCooler.shellInnerDiameter_m });
    expect(item(aes, 'gaskets-floating-head')!.quantity).toBe(1);
    expect(item(aes, 'bolting-floating-head')!.quantity).toBe(1);
    expect(item(aes, 'labour-floating-head')!.quantity).toBe(demoPriceBook.labourHours.fitUp);
    const total = (construction: 'BEM' | 'BEU' | 'AES') => priceDesign({ ...smallCooler, construction }, demoPriceBook, 1, { quantity: 1 }).lines.reduce((s, l) => s + l.amount_minor, 0);
    expect(total('AES')).toBeGreaterThan(total('BEM'));
  });

  it('a book saved before issue 11 prices the plate at the demo figure and says so', () => {
    const { impingementPlate_minor: _p, uBendPerTube_minor: _u, ...old } = demoPriceBook.sundries;
    const book = { ...demoPriceBook, sundries: old };
    const line = priceDesign({ ...smallCooler, nozzles }, book, 3, { quantity: 1 }).lines.find((l) => l.key === 'impingement-plate')!;
    expect(line.amount_minor).toBe(24_000);
    expect(line.source).toMatch(/demo book's figure/);
  });
});

describe('the search cost function follows the nozzles and the construction (issue 11)', () => {
  const costOf = costFromPriceBook(demoPriceBook);
  const unit = (d: Parameters<typeof priceDesign>[0]) => priceDesign(d, demoPriceBook, 1, { quantity: 1 }).unit_minor;
  for (const [name, d] of [
    ['sized nozzles with a plate', { ...smallCooler, nozzles }],
    ['U-tubes', { ...smallCooler, construction: 'BEU' as const }],
    ['floating head', { ...smallCooler, construction: 'AES' as const }],
    ['floating head, two shells, sized nozzles', { ...smallCooler, construction: 'AES' as const, nozzles, shellsInSeries: 2 }],
  ] as const) {
    it(`agrees with the itemised unit price to within rounding: ${name}`, () => {
      expect(Math.abs(costOf(d) - unit(d))).toBeLessThan(60);
    });
  }
  it('an old design (no construction) costs as before, BEM', () => {
    expect(costOf({ ...smallCooler, construction: 'BEM' })).toBe(costOf(smallCooler));
  });
});
