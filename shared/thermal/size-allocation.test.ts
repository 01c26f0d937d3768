/**
 * Design engine v2 (issue 10): fluid allocation, shells in series, limits on both sides, distinct
 * alternatives. Duties are the (invented demo duties); check values name their source.
 */
import { describe, expect, it } from 'vitest';
import { rate } from './rate';
import { size } from './size';
import { distinctKey } from './size-pick';
import { bafflePlan, baffleSpacingWindow, maxUnsupportedSpan } from './geometry/baffles';

const oilDuty = {
  process: { fluid: 'oil-vg46' as const, pressure_Pa: 500000, massFlow_kg_s: 1.2, inletTemp_C: 62, outletTemp_C: 47 },
  boundary: { kind: 'coolant' as const, fluid: 'water' as const, pressure_Pa: 350000, massFlow_kg_s: 2, inletTemp_C: 27 },
  constraints: { maxTubeLength_m: 6, maxPressureDrop_Pa: 70000, maxShellPressureDrop_Pa: 70000 },
};
const waterDuty = {
  process: { fluid: 'water' as const, pressure_Pa: 300000, massFlow_kg_s: 2, inletTemp_C: 75, outletTemp_C: 40 },
  boundary: { kind: 'coolant' as const, fluid: 'water' as const, pressure_Pa: 300000, massFlow_kg_s: 3, inletTemp_C: 25 },
  constraints: { maxTubeLength_m: 6, maxPressureDrop_Pa: 70000 },
};

describe('fluid allocation (issue 10)', () => {
  it('the hydraulic-oil cooler puts the oil on the shell side, U 150–400 W/m²K (common practice), both ΔP within 70 kPa', () => {
    const r = size(oilDuty);
    const d = r.recommended;
    expect(d.processSide).toBe('shell');
    expect(d.rating.shellFluid).toBe('process');
    expect(d.rating.overallU_W_m2K).toBeGreaterThanOrEqual(150);
    expect(d.rating.overallU_W_m2K).toBeLessThanOrEqual(400);
    expect(d.rating.pressureDrop.total_Pa).toBeLessThanOrEqual(70000);
    expect(d.rating.shellPressureDrop_Pa).toBeLessThanOrEqual(70000);
    expect(d.rating.outletTemp_C).toBeLessThanOrEqual(47);
    expect(d.allocationReason).toMatch(/oil on the shell side/i);
    expect(d.recommendedReason).toMatch(/in the tubes/);
    // the same oil in the tubes is laminar there: the best such design has a far lower U
    const inTubes = r.candidates.find((c) => c.processSide === 'tubes');
    if (inTubes) {
      expect(inTubes.rating.regime).toBe('laminar');
      expect(inTubes.rating.overallU_W_m2K!).toBeLessThan(d.rating.overallU_W_m2K!);
    }
  });

  it('compressed air in an aftercooler stays in the tubes (common practice)', () => {
    const r = size({
      process: { fluid: 'air-moist', pressure_Pa: 800000, massFlow_kg_s: 0.3, inletTemp_C: 110, outletTemp_C: 35, intake: { temp_C: 25, relativeHumidity: 0.6, pressure_Pa: 101325 } },
      boundary: { kind: 'coolant', fluid: 'water', pressure_Pa: 300000, massFlow_kg_s: 1.5, inletTemp_C: 25 },
      constraints: { maxTubeLength_m: 4, maxPressureDrop_Pa: 30000, maxShellPressureDrop_Pa: 70000 },
    });
    expect(r.candidates.every((d) => d.processSide === 'tubes')).toBe(true);
    expect(r.recommended.allocationReason).toMatch(/stays in the tubes/);
  });

  it('glycol against water may go either way: both allocations are searched; a forced side is kept', () => {
    const duty = {
      process: { fluid: 'ethylene-glycol-30' as const, pressure_Pa: 400000, massFlow_kg_s: 3, inletTemp_C: 55, outletTemp_C: 40 },
      boundary: { kind: 'coolant' as const, fluid: 'water' as const, pressure_Pa: 300000, massFlow_kg_s: 5, inletTemp_C: 26 },
      constraints: { maxTubeLength_m: 4, maxPressureDrop_Pa: 70000 },
    };
    const either = size(duty);
    expect(new Set(either.candidates.map((d) => d.processSide))).toEqual(new Set(['tubes', 'shell']));
    for (const side of ['tubes', 'shell'] as const) {
      const forced = size({ ...duty, constraints: { ...duty.constraints, processSide: side } });
      expect(forced.candidates.every((d) => d.processSide === side)).toBe(true);
    }
  });
});

describe('limits on both sides and shells in series (issue 10)', () => {
  it('with no shell-side limit given, the shell drop keeps to the tube-side limit (70 kPa)', () => {
    const r = size(waterDuty);
    for (const d of r.candidates) {
      expect(d.rating.shellPressureDrop_Pa).toBeLessThanOrEqual(70000);
      expect(d.rating.pressureDrop.total_Pa).toBeLessThanOrEqual(70000);
      // L/D_s of one shell within 3–15 (common practice)
      expect(d.tubeLength_m / d.shellInnerDiameter_m!).toBeLessThanOrEqual(15 + 1e-9);
      expect(d.tubeLength_m / d.shellInnerDiameter_m!).toBeGreaterThanOrEqual(3 - 1e-9);
    }
  });

  it('the temperature-cross duty with a 3 m limit gets a design (shells in series or one pass), both ΔP ≤ 70 kPa', () => {
    const r = size({ ...waterDuty, constraints: { ...waterDuty.constraints, maxTubeLength_m: 3 } });
    const d = r.recommended;
    expect(d.tubeLength_m).toBeLessThanOrEqual(3);
    expect((d.shellsInSeries ?? 1) > 1 || d.tubePasses === 1).toBe(true);
    expect(d.rating.pressureDrop.total_Pa).toBeLessThanOrEqual(70000);
    expect(d.rating.shellPressureDrop_Pa).toBeLessThanOrEqual(70000);
    expect(d.rating.lmtdCorrectionF).toBeGreaterThanOrEqual(0.75);
    expect(d.rating.outletTemp_C).toBeLessThanOrEqual(40);
    // area counts every shell
    expect(d.area_m2).toBeCloseTo((d.shellsInSeries ?? 1) * d.tubeCount * Math.PI * d.tubeOuterDiameter_m * d.tubeLength_m, 6);
  });

  it('candidates are distinct, at most 12, the recommended first with its reason; every design says its allocation', () => {
    for (const duty of [oilDuty, waterDuty]) {
      const r = size(duty);
      const keys = r.candidates.map(distinctKey);
      expect(new Set(keys).size).toBe(keys.length);
      expect(r.candidates.length).toBeLessThanOrEqual(12);
      expect(r.candidates[0]).toBe(r.recommended);
      expect(r.recommended.recommendedReason).toBeTruthy();
      for (const d of r.candidates) {
        expect(d.allocationReason).toBeTruthy();
        expect(d.baffleCut).toBeGreaterThanOrEqual(0.2);
        expect(d.baffleCut).toBeLessThanOrEqual(0.35);
        expect(d.baffleCount).toBeGreaterThanOrEqual(1);
        expect(d.baffleSpacing_m).toBeGreaterThanOrEqual(Math.max(0.2 * d.shellInnerDiameter_m!, 0.0508) - 1e-4);
        expect(d.baffleSpacing_m).toBeLessThanOrEqual(d.shellInnerDiameter_m! + 1e-9);
      }
    }
  });
});

describe('findings and exclusions (issue 10)', () => {
  it('a shell L/D outside 3–15 (common practice) is excluded and counted in the explanation', () => {
    try {
      size({ ...waterDuty, constraints: { ...waterDuty.constraints, maxTubeLength_m: 0.6 } });
      expect.unreachable();
    } catch (e) {
      expect((e as Error).message).toMatch(/× shell-aspect/);
    }
  });

  it('a shell holding under 85 % of what its tubesheet takes is a finding (common practice)', () => {
    const r = rate({
      process: { fluid: 'water', pressure_Pa: 300000, massFlow_kg_s: 2, inletTemp_C: 75 },
      boundary: { kind: 'coolant', fluid: 'water', pressure_Pa: 300000, massFlow_kg_s: 3, inletTemp_C: 25, shellInnerDiameter_m: 0.3048 },
      geometry: { tubeOuterDiameter_m: 0.01905, tubeWall_m: 0.001245, tubeCount: 40, tubeLength_m: 3, tubePasses: 2 },
    });
    expect(r.shellFill).toBeLessThan(0.85);
    expect(r.warnings.map((w) => w.code)).toContain('shell-partly-filled');
  });
});

describe('rating with the process on either side (issue 10)', () => {
  const base = {
    process: { fluid: 'oil-vg46' as const, pressure_Pa: 500000, massFlow_kg_s: 1.2, inletTemp_C: 62 },
    boundary: { kind: 'coolant' as const, fluid: 'water' as const, pressure_Pa: 350000, massFlow_kg_s: 2, inletTemp_C: 27, shellInnerDiameter_m: 0.2545, baffleSpacing_m: 0.06, baffleCut: 0.25 },
    geometry: { tubeOuterDiameter_m: 0.015875, tubeWall_m: 0.001245, tubeCount: 68, tubeLength_m: 3, tubePasses: 4 },
  };

  it('shell vs tubes: different results, each energy-balanced within 0.5 %', () => {
    const tubes = rate({ ...base, geometry: { ...base.geometry, processSide: 'tubes' } });
    const shell = rate({ ...base, geometry: { ...base.geometry, processSide: 'shell' } });
    expect(tubes.tubeFluid).toBe('process');
    expect(shell.tubeFluid).toBe('coolant');
    expect(shell.overallU_W_m2K!).toBeGreaterThan(1.5 * tubes.overallU_W_m2K!);
    for (const r of [tubes, shell]) {
      const coolantDuty = 2 * 4180 * (r.coolantOutletTemp_C! - 27); // water cp ≈ 4180 J/kgK near 30 °C (memory)
      expect(Math.abs(coolantDuty / r.duty_W - 1)).toBeLessThan(0.005);
    }
  });

  it('old-shaped requests (no new fields) rate with the process in the tubes, one shell, Bell–Delaware beside Kern', () => {
    const r = rate(base);
    expect(r.processSide).toBe('tubes');
    expect(r.shellsInSeries).toBe(1);
    expect(r.shellMethod).toBe('bell-delaware');
    expect(r.shellCorrections).toBeDefined();
    expect(r.shellHtcKern_W_m2K).toBeGreaterThan(0);
    expect(r.shellPressureDropBreakdown!.total_Pa).toBeCloseTo(r.shellPressureDrop_Pa!, 6);
  });

  it('a forced Kern rating uses Kern for h and ΔP', () => {
    const r = rate({ ...base, shellMethod: 'kern' });
    expect(r.shellMethod).toBe('kern');
    expect(r.shellHtc_W_m2K).toBeCloseTo(r.shellHtcKern_W_m2K!, 9);
    expect(r.shellPressureDrop_Pa).toBeCloseTo(r.shellPressureDropKern_Pa!, 6);
  });

  it('two shells in series: twice the area, about twice the pressure drops (the oil leaves colder, so more), a higher duty', () => {
    const one = rate(base);
    const two = rate({ ...base, geometry: { ...base.geometry, shellsInSeries: 2 } });
    expect(two.area_m2).toBeCloseTo(2 * one.area_m2, 9);
    expect(two.pressureDrop.total_Pa).toBeGreaterThan(1.9 * one.pressureDrop.total_Pa);
    expect(two.shellPressureDrop_Pa!).toBeGreaterThan(1.9 * one.shellPressureDrop_Pa!);
    expect(two.duty_W).toBeGreaterThan(one.duty_W);
  });

  it('a wall boundary keeps the process in the tubes (422 naming geometry.processSide)', () => {
    try {
      rate({ ...base, boundary: { kind: 'wall', wallTemp_C: 20 }, geometry: { ...base.geometry, processSide: 'shell' } });
      expect.unreachable();
    } catch (e) {
      expect((e as { field?: string }).field).toBe('geometry.processSide');
    }
  });
});

describe('baffles (issue 10)', () => {
  it('TEMA RCB-4.52 span: 3/4 in tube, steel 60 in, copper alloy 52 in (memory)', () => {
    expect(maxUnsupportedSpan(0.01905, 'carbon-steel')).toBeCloseTo(60 * 0.0254, 6);
    expect(maxUnsupportedSpan(0.01905, 'copper')).toBeCloseTo(52 * 0.0254, 6);
  });
  it('spacing window: max(0.2 D_s, 50.8 mm) (TEMA, memory) to min(span, D_s) (common practice)', () => {
    expect(baffleSpacingWindow(0.2, 0.01905, 'carbon-steel')).toEqual({ min: 0.0508, max: 0.2 });
    expect(baffleSpacingWindow(1.5, 0.01905, 'copper').max).toBeCloseTo(52 * 0.0254, 6);
  });
  it('a plan fills the tube length: inlet + central spaces + outlet = L, ends at least the nozzle room', () => {
    const p = bafflePlan(3, 0.1, 0.3);
    expect(p.inlet + p.outlet + (p.count - 1) * p.central).toBeCloseTo(3, 9);
    expect(p.inlet).toBeGreaterThanOrEqual(0.3 * 0.3 + 0.1 - 1e-9);
  });
});

describe('ranking preferences (common practice, domain brief 2.8)', () => {
  /** An invented case-drain cooler: ISO VG 68 cooled by 30 % ethylene glycol, 3 m limit. */
  const caseDrain = {
    process: { fluid: 'oil-vg68' as const, pressure_Pa: 400000, massFlow_kg_s: 0.8, inletTemp_C: 65, outletTemp_C: 50 },
    boundary: { kind: 'coolant' as const, fluid: 'ethylene-glycol-30' as const, pressure_Pa: 350000, massFlow_kg_s: 1.6, inletTemp_C: 30 },
    constraints: { maxTubeLength_m: 3, maxPressureDrop_Pa: 70000, maxShellPressureDrop_Pa: 70000 },
  };

  it('a viscous oil that would be laminar in the tubes goes on the shell side even when the tube-side design is a little cheaper', () => {
    const r = size(caseDrain);
    expect(r.recommended.processSide).toBe('shell');
    expect(r.recommended.rating.shellFluid).toBe('process');
    // the oil-in-tubes alternative exists, laminar, at a lower U
    const inTubes = r.candidates.filter((c) => c.processSide === 'tubes');
    expect(inTubes.length).toBeGreaterThan(0);
    for (const c of inTubes) expect(c.rating.overallU_W_m2K!).toBeLessThan(r.recommended.rating.overallU_W_m2K!);
    // forced into the tubes it is still designed (a preference, not a limit)
    const forced = size({ ...caseDrain, constraints: { ...caseDrain.constraints, processSide: 'tubes' as const } });
    expect(forced.recommended.processSide).toBe('tubes');
    expect(forced.recommended.rating.regime).toBe('laminar');
  });

  it('baffle spacing: the recommended design is not leaky (J_l ≥ 0.5) where a wider spacing in the TEMA window allows it', () => {
    for (const duty of [oilDuty, waterDuty]) {
      const d = size(duty).recommended;
      const j = d.rating.shellCorrections!;
      expect(j.Jl).toBeGreaterThanOrEqual(0.5);
      const w = baffleSpacingWindow(d.shellInnerDiameter_m!, d.tubeOuterDiameter_m, d.tubeMaterial);
      expect(d.baffleSpacing_m!).toBeGreaterThanOrEqual(w.min - 1e-9);
      expect(d.baffleSpacing_m!).toBeLessThanOrEqual(w.max + 1e-9);
    }
  });
});
