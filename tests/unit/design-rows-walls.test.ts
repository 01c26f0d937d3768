/**
 * The offer's design rows (issue 11): each side's design pressure and temperature, and the walls the
 * pressure needs beside the walls the design has. A design stored before issue 11 has no required
 * walls: only the design point is shown.
 */
import { describe, expect, it } from 'vitest';
import { designPairs, wallPairs } from '../../server/lib/pdf/design-rows';
import { sizeRequestSchema } from '../../shared/schemas/thermal';
import { evaluateDesign } from '../../shared/thermal/evaluate';
import { glycolDesign, glycolDuty } from './build-sheet-pdf.fixture';

const ATM = 101_325;

describe('offer design rows: design pressure and the walls for it', () => {
  it('a stored design without required walls shows the default design point of each side', () => {
    // glycol 4 bar(g) in the tubes: 4 + 1 = 5 bar(g); water 3 bar(g) on the shell side: 4 bar(g); 80 + 25 = 105 °C
    expect(wallPairs(glycolDesign(), 'SI', glycolDuty)).toEqual([
      ['Design pressure and temp.', 'tube side 5 bar(g) at 105 °C (default: operating + margin); shell side 4 bar(g) at 105 °C (default: operating + margin)'],
    ]);
  });

  it('a design evaluated now shows a stated design point and the walls needed against the walls it has', () => {
    const duty = sizeRequestSchema.parse({ ...glycolDuty, process: { ...glycolDuty.process, design: { pressure_Pa: 10e5 + ATM, temp_C: 120 } } });
    const g = glycolDesign();
    const e = evaluateDesign(duty, { ...g, layout: g.layout!, shellInnerDiameter_m: g.shellInnerDiameter_m! });
    const pairs = designPairs(e, 'SI', duty);
    expect(pairs).toContainEqual(['Design pressure and temp.', 'tube side 10 bar(g) at 120 °C; shell side 4 bar(g) at 105 °C (default: operating + margin)']);
    // 3/4 in BWG 20 carbon steel: the minimum gauge BWG 16 (1.65 mm, common practice) governs; the hard finding says so
    expect(pairs.find(([k]) => k === 'Walls needed (UG-27)')?.[1]).toMatch(/^tube 1\.65 mm \(wall 0\.889 mm\); shell .* \(wall 9\.27 mm\)$/);
    expect(e.rating.warnings.map((w) => w.code)).toContain('tube-wall-thin');
  });
});
