import { describe, expect, it } from 'vitest';
import { sizeRequestSchema } from '../../schemas/thermal';
import { evaluateDesign } from '../evaluate';
import { sizeParsed } from '../size';
import { chooseConstruction, FIXED_TUBESHEET_MAX_DT_K, tubeMetalTemp } from './construction';

// Invented duties (no external source).
const rating = (processOut: number, coolantOut: number, hTube = 2000, hShell = 2000) => ({ outletTemp_C: processOut, coolantOutletTemp_C: coolantOut, htc_W_m2K: hTube, shellHtc_W_m2K: hShell });

describe('construction', () => {
  it('tube metal temperature is the film-weighted mean (by hand)', () => {
    // (1000·60 + 3000·30) / 4000 = 37.5 °C
    expect(tubeMetalTemp(1000, 60, 3000, 30)).toBeCloseTo(37.5, 9);
  });

  it('fixed tubesheets (BEM) for a small ΔT with a clean shell fluid', () => {
    // glycol loop (shell) cooling oil (tubes): oil 60→50 (mean 55), glycol 35→45 (mean 40); tubes (2000·55 + 2000·40)/4000 = 47.5, ΔT 7.5 K
    const c = chooseConstruction({ processSide: 'tubes', tubePasses: 2, rating: rating(50, 45) }, { processFluid: 'oil-vg46', coolantFluid: 'ethylene-glycol-30', processInlet_C: 60, coolantInlet_C: 35 });
    expect(c.construction).toBe('BEM');
    expect(c.metalTempDifference_K).toBeCloseTo(7.5, 6);
    expect(c.temaClass).toBe('C');
    expect(c.reason).toMatch(/Fixed tubesheets/);
  });

  it('a hot clean duty with ΔT above the limit gets U-tubes (clean tube side, even passes) or a floating head (one pass)', () => {
    // oil 150→90 in the tubes (mean 120), glycol 30→50 on the shell (mean 40); tubes at 80, ΔT 40 K > 30
    const d = { processSide: 'tubes' as const, tubePasses: 2, rating: rating(90, 50) };
    const st = { processFluid: 'oil-vg46', coolantFluid: 'ethylene-glycol-30', processInlet_C: 150, coolantInlet_C: 30 };
    const u = chooseConstruction(d, st);
    expect(u.metalTempDifference_K).toBeGreaterThan(FIXED_TUBESHEET_MAX_DT_K);
    expect(u.construction).toBe('BEU');
    expect(u.reason).toMatch(/differ too much in temperature/);
    expect(chooseConstruction({ ...d, tubePasses: 1 }, st).construction).toBe('AES');
  });

  it('cooling water on the shell side needs a removable bundle even at a small ΔT; water in the tubes too needs a floating head', () => {
    const u = chooseConstruction({ processSide: 'tubes', tubePasses: 2, rating: rating(50, 35) }, { processFluid: 'oil-vg46', coolantFluid: 'water', processInlet_C: 60, coolantInlet_C: 30 });
    expect(u.construction).toBe('BEU');
    expect(u.reason).toMatch(/cooling water/);
    // water both sides: shell dirty and tubes dirty → straight tubes, floating head
    const f = chooseConstruction({ processSide: 'tubes', tubePasses: 2, rating: rating(40, 35) }, { processFluid: 'water', coolantFluid: 'water', processInlet_C: 50, coolantInlet_C: 30 });
    expect(f.construction).toBe('AES');
    expect(f.reason).toMatch(/straight tubes/);
  });

  it('a sized design carries its construction, class and reason; a duty may ask for class R', () => {
    const duty = sizeRequestSchema.parse({
      process: { fluid: 'oil-vg46', pressure_Pa: 400000, massFlow_kg_s: 2, inletTemp_C: 60, outletTemp_C: 45 },
      boundary: { kind: 'coolant', fluid: 'ethylene-glycol-30', pressure_Pa: 300000, massFlow_kg_s: 3, inletTemp_C: 30 },
      constraints: { maxTubeLength_m: 4, maxPressureDrop_Pa: 100000, temaClass: 'R' },
    });
    const r = sizeParsed(duty).recommended;
    expect(['BEM', 'BEU', 'AES']).toContain(r.construction);
    expect(r.temaClass).toBe('R');
    expect(r.constructionReason).toBeTruthy();
    expect(r.nozzles).toHaveLength(4);
  });
});

describe('nozzles in the rating and the search', () => {
  const duty = sizeRequestSchema.parse({
    process: { fluid: 'ethylene-glycol-30', pressure_Pa: 400000, massFlow_kg_s: 3, inletTemp_C: 55, outletTemp_C: 40 },
    boundary: { kind: 'coolant', fluid: 'water', pressure_Pa: 300000, massFlow_kg_s: 5, inletTemp_C: 26 },
    constraints: { maxTubeLength_m: 4, maxPressureDrop_Pa: 70000, maxShellPressureDrop_Pa: 70000 },
  });

  it('nozzle losses appear in both breakdowns and count toward the limits', () => {
    const { candidates } = sizeParsed(duty);
    for (const d of candidates) {
      const r = d.rating;
      const b = r.shellPressureDropBreakdown!;
      expect(b.nozzles_Pa).toBeGreaterThan(0);
      expect(b.total_Pa).toBeCloseTo(b.crossflow_Pa + b.window_Pa + b.ends_Pa + b.nozzles_Pa!, 6);
      expect(r.shellPressureDrop_Pa).toBeCloseTo(b.total_Pa, 6);
      expect(r.shellPressureDrop_Pa!).toBeLessThanOrEqual(70000);
      expect(r.pressureDrop.nozzles_Pa).toBeGreaterThan(0);
      expect(r.pressureDrop.total_Pa).toBeCloseTo(r.pressureDrop.friction_Pa + r.pressureDrop.returns_Pa + r.pressureDrop.nozzles_Pa, 6);
      expect(r.pressureDrop.total_Pa).toBeLessThanOrEqual(70000);
      expect(d.nozzles!.map((n) => `${n.side}-${n.role}`).sort()).toEqual(['shell-inlet', 'shell-outlet', 'tube-inlet', 'tube-outlet']);
      expect(d.nozzles!.every((n) => n.innerDiameter_m <= 0.5 * d.shellInnerDiameter_m! + 1e-9)).toBe(true);
    }
  });

  it('a hand-set design whose nozzles would be wider than half its shell keeps its geometry with nozzle-too-large', () => {
    const heavy = { ...duty, boundary: { ...duty.boundary, massFlow_kg_s: 40 } } as typeof duty;
    const e = evaluateDesign(heavy, { tubeCount: 20, tubeLength_m: 2, tubeOuterDiameter_m: 0.01905, tubeWall_m: 0.001245, tubeMaterial: 'copper', tubePasses: 2, layout: 30, shellInnerDiameter_m: 0.154 });
    expect(e.tubeCount).toBe(20);
    const w = e.rating.warnings.find((x) => x.code === 'nozzle-too-large');
    expect(w?.message).toMatch(/wider than half the 154 mm shell/);
    const inlet = e.nozzles!.find((n) => n.side === 'shell' && n.role === 'inlet')!;
    expect(inlet.impingementPlate).toBe(true);
  });
});

describe('the search and the nozzle limit', () => {
  it('excludes designs whose nozzles would be wider than half the shell and says so', () => {
    // 60 kg/s of water needs 0.0602 m³/s / 3 m/s → 160 mm → NPS 8 (202.7 mm bore); the largest shell allowed
    // is NPS 12 (304.8 mm ID, half 152 mm): every design within the other limits is excluded for its nozzles
    const duty = sizeRequestSchema.parse({
      process: { fluid: 'oil-vg46', pressure_Pa: 500000, massFlow_kg_s: 2, inletTemp_C: 70, outletTemp_C: 60 },
      boundary: { kind: 'coolant', fluid: 'water', pressure_Pa: 400000, massFlow_kg_s: 60, inletTemp_C: 25 },
      constraints: { maxTubeLength_m: 12, maxPressureDrop_Pa: 3e6, maxShellPressureDrop_Pa: 3e6, maxShellInnerDiameter_m: 0.31, processSide: 'tubes' },
    });
    expect(() => sizeParsed(duty)).toThrow(/× nozzle/);
  });
});
