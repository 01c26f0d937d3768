/**
 * Issue 11 on the build sheet and the offer rows: an old stored design reads BEM, class C, with one
 * nozzle line per side as before; a design carrying sized nozzles and a construction lists each
 * nozzle (size, bore, velocity, ρv², impingement plate) and the TEMA designation, its bill follows.
 */
import { describe, expect, it } from 'vitest';
import type { Design, DesignNozzle } from '../../shared/schemas/thermal';
import { constructionPairs, designReasons } from '../../server/lib/pdf/design-rows';
import { buildSheetFixture, glycolDesign } from './build-sheet-pdf.fixture';

const nozzles: DesignNozzle[] = [
  { side: 'tube', role: 'inlet', label: 'NPS 4', innerDiameter_m: 0.10226, velocity_m_s: 0.57, rhoV2: 350, impingementPlate: false },
  { side: 'tube', role: 'outlet', label: 'NPS 4', innerDiameter_m: 0.10226, velocity_m_s: 0.56, rhoV2: 340, impingementPlate: false },
  { side: 'shell', role: 'inlet', label: 'NPS 4', innerDiameter_m: 0.10226, velocity_m_s: 1.83, rhoV2: 3340, impingementPlate: true },
  { side: 'shell', role: 'outlet', label: 'NPS 4', innerDiameter_m: 0.10226, velocity_m_s: 1.84, rhoV2: 3350, impingementPlate: false },
];

describe('construction and nozzles on the build sheet and the offer', () => {
  it('an old stored design: BEM class C, one nozzle line per side, no plate', () => {
    const s = buildSheetFixture();
    expect(s.design.construction).toBe('BEM');
    expect(s.design.temaClass).toBe('C');
    expect(s.nozzles).toHaveLength(2);
    expect(s.inspection.some((l) => /Impingement plate/.test(l))).toBe(false);
    expect(constructionPairs(glycolDesign(), 'SI')).toEqual([]);
  });

  it('a design with sized nozzles and a U-tube bundle: four nozzle lines, the plate, one tubesheet, U-bends', () => {
    const d: Design = { ...glycolDesign(), nozzles, construction: 'BEU', temaClass: 'C', constructionReason: 'U-tubes (BEU): the shell side carries cooling water.' };
    const s = buildSheetFixture(d);
    expect(s.design.construction).toBe('BEU');
    expect(s.nozzles).toHaveLength(4);
    const inlet = s.nozzles.find((n) => n.side === 'shell' && n.role === 'inlet')!;
    expect(inlet).toMatchObject({ nps: 4, innerDiameter_mm: 102.3, rhoV2: 3340, impingementPlate: true, perShell: 1 });
    expect(s.inspection.some((l) => /Impingement plate fitted under the shell inlet/.test(l))).toBe(true);
    const keys = s.billOfMaterials.map((b) => b.key);
    expect(keys).toContain('impingement-plate');
    expect(keys).toContain('u-bends');
    expect(s.billOfMaterials.find((b) => b.key === 'tubesheets')!.description).toMatch(/U-tube bundle: one tubesheet/);
    const pairs = Object.fromEntries(constructionPairs(d, 'SI'));
    expect(pairs['Construction (TEMA)']).toBe('BEU (U-tube bundle), class C (general commercial service)');
    expect(pairs['Shell-side nozzles']).toMatch(/inlet NPS 4 .*impingement plate/);
    expect(designReasons(d).at(-1)).toBe('Why this construction: U-tubes (BEU): the shell side carries cooling water.');
  });
});
