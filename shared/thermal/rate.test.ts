import { describe, expect, it } from 'vitest';
import { ThermalInputError } from './errors';
import { getFluid, humidityRatioFromIntake, saturationHumidityRatio } from './fluids';
import { rateRequestSchema } from '../schemas/thermal';
import { rate, rateParsed } from './rate';

const geometry = { tubeOuterDiameter_m: 0.01905, tubeWall_m: 0.001245, tubeCount: 40, tubeLength_m: 3, tubePasses: 1, roughness_m: 1.5e-6, tubeMaterial: 'copper' as const };
const processWater = { fluid: 'water' as const, pressure_Pa: 300000, massFlow_kg_s: 1.5, inletTemp_C: 85 };
const wallReq = { process: processWater, boundary: { kind: 'wall' as const, wallTemp_C: 20 }, geometry, correlation: 'auto' as const };
const coolant = { kind: 'coolant' as const, fluid: 'water' as const, pressure_Pa: 300000, massFlow_kg_s: 3, inletTemp_C: 20, foulingInside_m2K_W: 0.00018, foulingOutside_m2K_W: 0.00018 };
const coolReq = { process: processWater, boundary: coolant, geometry, correlation: 'auto' as const };

function finiteEverywhere(v: unknown): boolean {
  if (typeof v === 'number') return Number.isFinite(v);
  if (Array.isArray(v)) return v.every(finiteEverywhere);
  if (v && typeof v === 'object') return Object.values(v).every(finiteEverywhere);
  return true;
}

describe('rating invariants (issue 3)', () => {
  it('energy balance of both streams within 0.1 % (properties re-evaluated at each stream’s mean)', () => {
    for (const passes of [1, 2]) {
      const r = rate({ ...coolReq, geometry: { ...geometry, tubePasses: passes } });
      const w = getFluid('water');
      const hot = 1.5 * w.properties((85 + r.outletTemp_C) / 2, 300000).specificHeat * (85 - r.outletTemp_C);
      const cold = 3 * w.properties((20 + r.coolantOutletTemp_C!) / 2, 300000).specificHeat * (r.coolantOutletTemp_C! - 20);
      expect(Math.abs(hot - r.duty_W) / r.duty_W).toBeLessThan(1e-3);
      expect(Math.abs(cold - r.duty_W) / r.duty_W).toBeLessThan(1e-3);
    }
  });

  it('longer tubes never give a warmer outlet; a very long tube approaches the wall / coolant temperature', () => {
    for (const boundary of [wallReq.boundary, coolant]) {
      let last = Infinity;
      for (const length of [0.3, 1, 2, 4, 8, 16, 40, 200]) {
        // past the request's 12 m limit: the engine itself is asked (rateParsed), not the public schema
        const parsed = rateRequestSchema.parse({ ...wallReq, boundary });
        const r = rateParsed({ ...parsed, geometry: { ...parsed.geometry, tubeLength_m: length } });
        expect(r.outletTemp_C).toBeLessThanOrEqual(last + 1e-9);
        last = r.outletTemp_C;
      }
      // limiting case: 200 m of tube leaves the process within 0.05 K of the sink (wall, or coolant inlet for C_hot < C_cold)
      expect(last - 20).toBeLessThan(0.05);
    }
  });

  it('results are continuous across Re 2300 and 10⁴ (no jump above 15 %)', () => {
    const fluid = { constant: { density: 1000, specificHeat: 4000, viscosity: 0.001, conductivity: 0.6 } };
    const dInner = geometry.tubeOuterDiameter_m - 2 * geometry.tubeWall_m;
    for (const re of [2300, 1e4]) {
      const flowAt = (r: number) => ((r * Math.PI * dInner * 0.001) / 4) * 40;
      const at = (f: number) => rate({ ...wallReq, process: { ...processWater, fluid, massFlow_kg_s: f } });
      const below = at(flowAt(re * (1 - 1e-6)));
      const above = at(flowAt(re * (1 + 1e-6)));
      expect(Math.abs(above.htc_W_m2K - below.htc_W_m2K) / below.htc_W_m2K).toBeLessThan(0.15);
      expect(Math.abs(above.frictionFactor - below.frictionFactor) / below.frictionFactor).toBeLessThan(0.15);
    }
  });

  it('never returns NaN; names the method and the regime', () => {
    for (const correlation of ['auto', 'gnielinski', 'dittus-boelter', 'sieder-tate', 'hausen', 'laminar-fully-developed'] as const) {
      const r = rate({ ...coolReq, correlation, geometry: { ...geometry, tubeCount: 8 } });
      expect(finiteEverywhere(r)).toBe(true);
      expect(r.correlation.length).toBeGreaterThan(0);
    }
    expect(finiteEverywhere(rate(wallReq))).toBe(true);
  });

  it('humid compressed air: condensate = dry air × (W_in − W_sat(T_out, p)) (domain brief 2.6, psychrolib)', () => {
    const intake = { temp_C: 30, relativeHumidity: 0.8, pressure_Pa: 101325 };
    const r = rate({
      process: { fluid: 'air-moist', pressure_Pa: 8e5, massFlow_kg_s: 0.3, inletTemp_C: 120, intake },
      boundary: { ...coolant, massFlow_kg_s: 1 },
      geometry: { ...geometry, tubeCount: 60, tubeLength_m: 2 },
    });
    const w = humidityRatioFromIntake(intake);
    const expected = (0.3 / (1 + w)) * (w - saturationHumidityRatio(r.outletTemp_C, 8e5));
    expect(r.outletTemp_C).toBeLessThan(60); // below the dew point at 8 bar (about 67 °C)
    expect(r.condensate_kg_s!).toBeGreaterThan(0);
    expect(r.condensate_kg_s!).toBeCloseTo(expected, 9);
    expect(r.latentDuty_W!).toBeGreaterThan(0);
  });
});

describe('impossible duties are explained, not computed', () => {
  const code = (f: () => unknown) => {
    try {
      f();
    } catch (e) {
      if (e instanceof ThermalInputError) return [e.code, e.field];
      throw e;
    }
    return null;
  };
  it('heating duties, zero flows, non-finite numbers, fluids outside their data, low F', () => {
    expect(code(() => rate({ ...wallReq, boundary: { kind: 'wall', wallTemp_C: 90 } }))).toEqual(['not-a-cooler', 'boundary.wallTemp_C']);
    expect(code(() => rate({ ...coolReq, boundary: { ...coolant, inletTemp_C: 95 } }))).toEqual(['not-a-cooler', 'boundary.inletTemp_C']);
    expect(code(() => rate({ ...wallReq, process: { ...processWater, massFlow_kg_s: 0 } }))).toEqual(['flow-not-positive', 'process.massFlow_kg_s']);
    expect(code(() => rate({ ...coolReq, boundary: { ...coolant, massFlow_kg_s: -1 } }))).toEqual(['flow-not-positive', 'boundary.massFlow_kg_s']);
    expect(code(() => rate({ ...wallReq, process: { ...processWater, inletTemp_C: 150 } }))?.[1]).toBe('process.inletTemp_C');
    expect(code(() => rate({ ...coolReq, boundary: { ...coolant, massFlow_kg_s: 0.05 } }))).toEqual(['fluid-range', 'boundary.fluid']);
    expect(code(() => rate({ ...coolReq, boundary: { ...coolant, massFlow_kg_s: 1.5 }, geometry: { ...geometry, tubePasses: 2, tubeLength_m: 12 } }))).toEqual(['lmtd-correction-low', 'geometry.tubePasses']);
    // JSON carries no NaN and zod refuses it (400); callers of the engine itself get a 422-style error
    const parsed = rateRequestSchema.parse(wallReq);
    expect(code(() => rateParsed({ ...parsed, boundary: { kind: 'wall', wallTemp_C: Number.NaN } }))).toEqual(['not-finite', 'boundary.wallTemp_C']);
    expect(code(() => rateParsed({ ...parsed, process: { ...parsed.process, inletTemp_C: Infinity } }))).toEqual(['not-finite', 'process.inletTemp_C']);
  });
});
