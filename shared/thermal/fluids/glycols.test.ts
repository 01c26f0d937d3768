import { describe, expect, it } from 'vitest';
import fixture from '../../../tests/reference/fixtures/properties.json';
import {
  ethyleneGlycol30,
  ethyleneGlycol50,
  glycolFluidIds,
  glycolFluids,
  glycolFreezingPoint,
  glycolMixture,
  propyleneGlycol30,
  propyleneGlycol50,
} from './glycols';
import { ETHYLENE_GLYCOL, PROPYLENE_GLYCOL, melinderProperties } from './melinder';

const rel = (a: number, b: number) => Math.abs(a / b - 1);

describe('Melinder fits in the pure-water limit against IAPWS-95 (python3-iapws fixture)', () => {
  // Independent of the glycol data: at 0 % additive both fits must give water.
  // Tolerances allow for fits made for mixtures, not for pure water: a wrong coefficient still fails.
  it.each([
    ['ethylene glycol', ETHYLENE_GLYCOL],
    ['propylene glycol', PROPYLENE_GLYCOL],
  ])('%s at x = 0', (_name, data) => {
    for (const ref of fixture.water.states.filter((s) => s.pressure_Pa === 1e5 && s.temp_C <= 92)) {
      const p = melinderProperties(data, 0, ref.temp_C);
      const at = `${ref.temp_C} °C`;
      expect(rel(p.density, ref.density), at).toBeLessThan(0.005);
      expect(rel(p.specificHeat, ref.specificHeat), at).toBeLessThan(0.015);
      expect(rel(p.conductivity, ref.conductivity), at).toBeLessThan(0.03);
      expect(rel(p.viscosity, ref.viscosity), at).toBeLessThan(0.06);
    }
  });
});

describe('glycol mixtures against published tables at 20 °C', () => {
  // ASHRAE Handbook—Fundamentals (2009) ch. 31, ethylene- and propylene-glycol property tables,
  // mass-% basis; all values (memory), hence the generous tolerances: ±1 % ρ, ±3 % cp, ±5 % k, ±15 % μ.
  it.each([
    // fluid, ρ kg/m³, cp J/kgK, k W/mK, μ Pa·s
    [ethyleneGlycol30, 1040, 3700, 0.46, 2.2e-3],
    [ethyleneGlycol50, 1066, 3280, 0.38, 3.9e-3],
    [propyleneGlycol30, 1026, 3850, 0.44, 3.0e-3],
    [propyleneGlycol50, 1041, 3550, 0.36, 6.4e-3],
  ] as const)('%s', (fluid, rho, cp, k, mu) => {
    const p = fluid.properties(20, 101325);
    expect(rel(p.density, rho)).toBeLessThan(0.01);
    expect(rel(p.specificHeat, cp)).toBeLessThan(0.03);
    expect(rel(p.conductivity, k)).toBeLessThan(0.05);
    expect(rel(p.viscosity, mu)).toBeLessThan(0.15);
  });

  it('freezing points (ASHRAE Handbook—Fundamentals 2009 ch. 31 Table 4 / CRC Handbook; memory, ±2 K)', () => {
    expect(Math.abs(ethyleneGlycol30.minTemp_C + 15)).toBeLessThan(2); // about −15 °C
    expect(Math.abs(ethyleneGlycol50.minTemp_C + 35)).toBeLessThan(2); // about −34…−37 °C
    expect(Math.abs(propyleneGlycol30.minTemp_C + 13)).toBeLessThan(2); // about −13 °C
    expect(Math.abs(propyleneGlycol50.minTemp_C + 33)).toBeLessThan(2); // about −33 °C
  });
});

describe('glycol trends and state checks', () => {
  it('ρ and μ fall, cp and k rise with temperature; more glycol is more viscous', () => {
    for (const f of [ethyleneGlycol30, ethyleneGlycol50, propyleneGlycol30, propyleneGlycol50]) {
      let prev = f.properties(f.minTemp_C + 0.5, 1e5);
      for (let t = Math.ceil(f.minTemp_C) + 5; t <= 100; t += 5) {
        const p = f.properties(t, 1e5);
        expect(p.density, `${f.id} ${t}`).toBeLessThan(prev.density);
        expect(p.viscosity, `${f.id} ${t}`).toBeLessThan(prev.viscosity);
        expect(p.specificHeat, `${f.id} ${t}`).toBeGreaterThan(prev.specificHeat);
        expect(p.conductivity, `${f.id} ${t}`).toBeGreaterThan(prev.conductivity);
        prev = p;
      }
    }
    expect(ethyleneGlycol50.properties(20, 1e5).viscosity).toBeGreaterThan(ethyleneGlycol30.properties(20, 1e5).viscosity);
    expect(propyleneGlycol30.properties(20, 1e5).viscosity).toBeGreaterThan(ethyleneGlycol30.properties(20, 1e5).viscosity);
  });

  it('explains freezing and the upper limit', () => {
    expect(ethyleneGlycol30.stateProblem(-20, 1e5)).toMatch(/begins to freeze at -14.6 °C/);
    expect(() => ethyleneGlycol30.properties(-20, 1e5)).toThrow(expect.objectContaining({ code: 'fluid-frozen' }));
    expect(() => propyleneGlycol50.properties(110, 1e5)).toThrow(expect.objectContaining({ code: 'fluid-range' }));
    expect(ethyleneGlycol50.stateProblem(-30, 1e5)).toBeNull();
  });
});

describe('glycol strength as a parameter (10–60 % by mass, Melinder 2010 polynomial in concentration)', () => {
  const eg = (p: number) => glycolMixture('ethylene', p);
  const pg = (p: number) => glycolMixture('propylene', p);

  it('keeps the former ids and values: ethylene-glycol-30 is the 30 % mixture', () => {
    expect(ethyleneGlycol30.id).toBe('ethylene-glycol-30');
    expect(propyleneGlycol50.id).toBe('propylene-glycol-50');
    expect(eg(30).properties(40, 1e5)).toEqual(ethyleneGlycol30.properties(40, 1e5));
    expect(glycolFluidIds).toContain('ethylene-glycol-40');
    expect(glycolFluidIds).toContain('propylene-glycol-40');
    expect(glycolFluidIds).toHaveLength(22);
  });

  it('40 % lies between 30 % and 50 % for every property, −10…90 °C, both glycols', () => {
    for (const make of [eg, pg]) {
      const [a, m, b] = [make(30), make(40), make(50)];
      for (let t = -10; t <= 90; t += 10) {
        const [pa, pm, pb] = [a.properties(t, 1e5), m.properties(t, 1e5), b.properties(t, 1e5)];
        for (const key of ['density', 'specificHeat', 'viscosity', 'conductivity'] as const) {
          const lo = Math.min(pa[key], pb[key]);
          const hi = Math.max(pa[key], pb[key]);
          expect(pm[key], `${m.id} ${key} ${t} °C`).toBeGreaterThan(lo);
          expect(pm[key], `${m.id} ${key} ${t} °C`).toBeLessThan(hi);
        }
      }
    }
  });

  it('every strength 10…60 % is monotonic in concentration at 20 °C and 60 °C (ρ, μ up; cp, k down)', () => {
    for (const make of [eg, pg]) {
      for (const t of [20, 60]) {
        for (let p = 10; p < 60; p += 5) {
          const [x, y] = [make(p).properties(t, 1e5), make(p + 5).properties(t, 1e5)];
          expect(y.density).toBeGreaterThan(x.density);
          expect(y.viscosity).toBeGreaterThan(x.viscosity);
          expect(y.specificHeat).toBeLessThan(x.specificHeat);
          expect(y.conductivity).toBeLessThan(x.conductivity);
        }
      }
    }
  });

  // ASHRAE Handbook—Fundamentals (2009) ch. 31, ethylene- and propylene-glycol tables at 40 % by mass,
  // 20 °C; all values (memory), tolerances as for 30 and 50 % above: ±1 % ρ, ±3 % cp, ±5 % k, ±15 % μ,
  // freezing point ±1.5 K.
  it.each([
    // glycol, ρ kg/m³, cp J/kgK, k W/mK, μ Pa·s, freezing °C
    ['ethylene', 1053, 3500, 0.42, 2.9e-3, -23.5],
    ['propylene', 1033, 3700, 0.40, 4.4e-3, -21.1],
  ] as const)('%s glycol 40 % against published values at 20 °C (memory)', (kind, rho, cp, k, mu, freezing) => {
    const f = glycolMixture(kind, 40);
    const p = f.properties(20, 101325);
    expect(rel(p.density, rho)).toBeLessThan(0.01);
    expect(rel(p.specificHeat, cp)).toBeLessThan(0.03);
    expect(rel(p.conductivity, k)).toBeLessThan(0.05);
    expect(rel(p.viscosity, mu)).toBeLessThan(0.15);
    expect(Math.abs(glycolFreezingPoint(kind, 40) - freezing)).toBeLessThan(1.5);
  });

  it('freezing point falls with strength; the freezing check refuses a coolant below it', () => {
    for (const kind of ['ethylene', 'propylene'] as const) {
      for (let p = 10; p < 60; p += 5) expect(glycolFreezingPoint(kind, p + 5)).toBeLessThan(glycolFreezingPoint(kind, p));
    }
    const f = eg(40); // freezes near −23.8 °C (Melinder 2010)
    expect(f.stateProblem(-20, 1e5)).toBeNull();
    expect(() => f.properties(-30, 1e5)).toThrow(expect.objectContaining({ code: 'fluid-frozen' }));
    expect(f.stateProblem(-30, 1e5)).toMatch(/40 % by mass begins to freeze at -23\.8 °C/);
  });

  it('takes any strength inside the range (42.5 % lies between 40 and 45 %), refuses one outside', () => {
    const mid = eg(42.5).properties(20, 1e5).viscosity;
    expect(mid).toBeGreaterThan(eg(40).properties(20, 1e5).viscosity);
    expect(mid).toBeLessThan(eg(45).properties(20, 1e5).viscosity);
    for (const bad of [5, 65, Number.NaN]) {
      expect(() => glycolMixture('ethylene', bad, 'boundary.fluid')).toThrow(
        expect.objectContaining({ code: 'fluid-range', field: 'boundary.fluid' }),
      );
    }
    expect(() => pg(70)).toThrow(/10 to 60 % glycol by mass/);
  });

  it('every library strength keeps the temperature trends from its freezing point to 100 °C', () => {
    for (const id of glycolFluidIds) {
      const f = glycolFluids[id];
      let prev = f.properties(f.minTemp_C + 0.5, 1e5);
      for (let t = Math.ceil(f.minTemp_C) + 5; t <= 100; t += 5) {
        const p = f.properties(t, 1e5);
        expect(p.density, `${id} ${t}`).toBeLessThan(prev.density);
        expect(p.viscosity, `${id} ${t}`).toBeLessThan(prev.viscosity);
        expect(p.specificHeat, `${id} ${t}`).toBeGreaterThan(prev.specificHeat);
        prev = p;
      }
    }
  });
});
