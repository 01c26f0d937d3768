import { describe, expect, it } from 'vitest';
import { sizeRequestSchema } from '../../schemas/thermal';
import { evaluateDesign } from '../evaluate';
import { hardFindings, hardFindingsMessage, softFindings, tubesheetHolds } from './hard-findings';

// an invented hydraulic-oil cooler (ISO VG 46 cooled by plant water), as in the quote API tests
const duty = sizeRequestSchema.parse({
  process: { fluid: 'oil-vg46', pressure_Pa: 500000, massFlow_kg_s: 1.2, inletTemp_C: 62, outletTemp_C: 47 },
  boundary: { kind: 'coolant', fluid: 'water', pressure_Pa: 350000, massFlow_kg_s: 2.0, inletTemp_C: 27 },
  constraints: { maxTubeLength_m: 3.5, maxPressureDrop_Pa: 70000, maxShellPressureDrop_Pa: 70000 },
});
// NPS 10 STD shell, 3/4 in BWG 16 carbon-steel tubes on a 30° pitch of 1.25 OD, 2 passes
const geometry = {
  tubeCount: 72, tubeLength_m: 2.8, tubeOuterDiameter_m: 0.01905, tubeWall_m: 0.001651, tubeMaterial: 'carbon-steel',
  tubePasses: 2, layout: 30 as const, shellInnerDiameter_m: 0.25446, processSide: 'shell' as const,
};
const shop = { minTubeLength_m: 1.0, maxShellInnerDiameter_m: 1.5 };

describe('hard findings: what makes a design unbuildable as it stands', () => {
  it('a bundle that fits its tubesheet, long enough and inside the largest shell has none', () => {
    const d = evaluateDesign(duty, geometry);
    expect(hardFindings(d, shop)).toEqual([]);
  });

  it('more tubes than the laid-out tubesheet holds is hard, with the count it holds', () => {
    const holds = tubesheetHolds({ ...geometry, rating: { warnings: [] } })!;
    expect(holds).toBeGreaterThan(72);
    const d = evaluateDesign(duty, { ...geometry, tubeCount: holds + 2 });
    const found = hardFindings(d, shop);
    expect(found.map((f) => f.code)).toEqual(['tubes-do-not-fit']);
    expect(found[0]!.message).toContain(`holds ${holds}`);
    expect(found[0]!.message).toContain(`Use at most ${holds} tubes`);
    // the rating's own shell-too-small note is not listed again among the soft ones
    expect(softFindings(d).map((w) => w.code)).not.toContain('shell-too-small');
    expect(hardFindingsMessage(found)).toMatch(/^Cannot be built as it stands: \d+ tubes do not fit/);
  });

  it('a bundle shorter than the shortest the shop builds, or a shell larger than the largest, is hard with the shop limits only', () => {
    const d = evaluateDesign(duty, { ...geometry, tubeLength_m: 0.8 });
    expect(hardFindings(d)).toEqual([]);
    expect(hardFindings(d, shop).map((f) => f.code)).toEqual(['below-shop-minimum-length']);
    expect(hardFindings(d, shop)[0]!.message).toBe('The tube length 0.8 m is below the shortest bundle this shop builds, 1.0 m.');
    expect(hardFindings(evaluateDesign(duty, geometry), { minTubeLength_m: 1, maxShellInnerDiameter_m: 0.2 }).map((f) => f.code)).toEqual(['beyond-shop-largest-shell']);
  });

  it('a thin wall, a failed vibration screen and a nozzle too large are hard; the other warnings stay soft', () => {
    const d = evaluateDesign(duty, geometry);
    const rating = {
      ...d.rating,
      warnings: [...d.rating.warnings, { code: 'tube-wall-thin', message: 'The tube wall 0.50 mm is too thin.' }, { code: 'shell-velocity-low', message: 'slow' }],
      vibration: { ...d.rating.vibration!, ok: false },
      nozzlesOk: false,
    };
    expect(hardFindings({ ...d, rating }).map((f) => f.code)).toEqual(['tube-wall-thin', 'vibration', 'nozzle-too-large']);
    expect(softFindings({ rating }).map((w) => w.code)).toContain('shell-velocity-low');
    expect(softFindings({ rating }).map((w) => w.code)).not.toContain('tube-wall-thin');
  });
});
