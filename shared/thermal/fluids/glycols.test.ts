import { describe, expect, it } from 'vitest';
import fixture from '../../../tests/reference/fixtures/properties.json';
import { ethyleneGlycol30, ethyleneGlycol50, propyleneGlycol30, propyleneGlycol50 } from './glycols';
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
