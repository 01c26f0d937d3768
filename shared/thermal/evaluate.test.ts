import { describe, expect, it } from 'vitest';
import { sizeRequestSchema } from '../schemas/thermal';
import { evaluateDesign, requiredLengthOf } from './evaluate';
import { sizeParsed } from './size';

// Invented duties (no external source): a glycol loop cooled by tower water, and a wall-cooled water line.
const coolantDuty = sizeRequestSchema.parse({
  process: { fluid: 'ethylene-glycol-30', pressure_Pa: 400000, massFlow_kg_s: 3, inletTemp_C: 55, outletTemp_C: 40 },
  boundary: { kind: 'coolant', fluid: 'water', pressure_Pa: 300000, massFlow_kg_s: 5, inletTemp_C: 26 },
  constraints: { maxTubeLength_m: 4, maxPressureDrop_Pa: 70000, maxShellPressureDrop_Pa: 70000 },
});
const wallDuty = sizeRequestSchema.parse({
  process: { fluid: 'water', pressure_Pa: 300000, massFlow_kg_s: 0.8, inletTemp_C: 70, outletTemp_C: 35 },
  boundary: { kind: 'wall', wallTemp_C: 15 },
  constraints: { maxTubeLength_m: 4, maxPressureDrop_Pa: 70000 },
});

describe('evaluateDesign: a hand-chosen geometry against the duty', () => {
  for (const [name, duty] of [['coolant', coolantDuty], ['wall', wallDuty]] as const) {
    it(`agrees with the sizing search on its own recommended design (${name})`, () => {
      const { recommended: r } = sizeParsed(duty);
      const e = evaluateDesign(duty, {
        tubeCount: r.tubeCount, tubeLength_m: r.tubeLength_m, tubeOuterDiameter_m: r.tubeOuterDiameter_m, tubeWall_m: r.tubeWall_m,
        tubeMaterial: r.tubeMaterial, tubePasses: r.tubePasses, layout: r.layout!, shellInnerDiameter_m: r.shellInnerDiameter_m!,
        baffleSpacing_m: r.baffleSpacing_m, tubePitch_m: r.tubePitch_m, processSide: r.processSide, shellsInSeries: r.shellsInSeries, baffleCut: r.baffleCut,
      });
      expect(e.rating.outletTemp_C).toBeCloseTo(r.rating.outletTemp_C, 3);
      // the bisection's required length matches the search's closed form within 1 %
      expect(Math.abs(e.requiredLength_m / r.requiredLength_m - 1)).toBeLessThan(0.01);
      expect(e.overSurface_pct).toBeGreaterThanOrEqual(-0.5);
      expect(e.tubeWallLabel).toBe(r.tubeWallLabel);
    });
  }

  it('rating at the required length reaches the target within 0.05 K; shorter tubes fall short and say so', () => {
    const g = { tubeCount: 60, tubeLength_m: 2, tubeOuterDiameter_m: 0.01905, tubeWall_m: 0.001245, tubeMaterial: 'copper', tubePasses: 2, layout: 30 as const, shellInnerDiameter_m: 0.254 };
    const need = requiredLengthOf(wallDuty, g);
    const atNeed = evaluateDesign(wallDuty, { ...g, tubeLength_m: need });
    expect(Math.abs(atNeed.rating.outletTemp_C - 35)).toBeLessThan(0.05);
    const short = evaluateDesign(wallDuty, { ...g, tubeLength_m: need * 0.7 });
    expect(short.overSurface_pct).toBeCloseTo(-30, 2);
    expect(short.rating.outletTemp_C).toBeGreaterThan(35);
    expect(short.rating.warnings.map((w) => w.code)).toContain('short-of-target');
  });

  it('refuses a tube count that the passes cannot share', () => {
    expect(() =>
      evaluateDesign(wallDuty, { tubeCount: 61, tubeLength_m: 2, tubeOuterDiameter_m: 0.01905, tubeWall_m: 0.001245, tubeMaterial: 'copper', tubePasses: 2, layout: 30, shellInnerDiameter_m: 0.254 }),
    ).toThrow(/evenly/);
  });
});
