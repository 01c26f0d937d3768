import { describe, expect, it } from 'vitest';
import { sizeRequestSchema } from '../../schemas/thermal';
import { evaluateDesign } from '../evaluate';
import { sizeParsed } from '../size';
import { tubeLayout } from './layout';
import { temaTieRods } from './tie-rods';

// An invented duty (no external source): a glycol loop cooled by tower water.
const duty = sizeRequestSchema.parse({
  process: { fluid: 'ethylene-glycol-30', pressure_Pa: 400000, massFlow_kg_s: 3, inletTemp_C: 55, outletTemp_C: 40 },
  boundary: { kind: 'coolant', fluid: 'water', pressure_Pa: 300000, massFlow_kg_s: 5, inletTemp_C: 26 },
  constraints: { maxTubeLength_m: 4, maxPressureDrop_Pa: 70000, maxShellPressureDrop_Pa: 70000 },
});

describe('the design carries its tie rods', () => {
  it('a sized design and a hand-set one state TEMA’s rods for their shell, as the layout placed them', () => {
    const { recommended: r } = sizeParsed(duty);
    expect(r.tieRods).toEqual(temaTieRods(r.shellInnerDiameter_m!));
    const lay = tubeLayout({ shellInnerDiameter_m: r.shellInnerDiameter_m!, tubeOuterDiameter_m: r.tubeOuterDiameter_m, tubePitch_m: r.tubePitch_m!, layout: r.layout!, tubePasses: r.tubePasses });
    expect(r.tieRods!.count).toBe(lay.tieRod.reduce((a, b) => a + b, 0));
    const e = evaluateDesign(duty, { tubeCount: 4, tubeLength_m: 2, tubeOuterDiameter_m: 0.0254, tubeWall_m: 0.00165, tubeMaterial: 'carbon-steel', tubePasses: 4, layout: 30, shellInnerDiameter_m: 0.1541 });
    expect(e.tieRods).toEqual({ count: 4, diameter_m: 0.375 * 0.0254 });
  }, 120_000);
});
