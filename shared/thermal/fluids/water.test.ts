import { describe, expect, it } from 'vitest';
import fixture from '../../../tests/reference/fixtures/properties.json';
import { ThermalInputError } from '../errors';
import { water } from './water';
import { waterRegion1, waterSaturationPressure, waterSaturationTemperature } from './water-if97';
import { waterConductivity, waterViscosity } from './water-transport';

const KEYS = ['density', 'specificHeat', 'viscosity', 'conductivity'] as const;

describe('water against IAPWS-95 (python3-iapws fixture)', () => {
  it('stays within ±0.5 % for density, cp, viscosity and conductivity, 1–150 °C', () => {
    expect(fixture.water.states.length).toBeGreaterThan(50);
    for (const ref of fixture.water.states) {
      const p = water.properties(ref.temp_C, ref.pressure_Pa);
      for (const k of KEYS) {
        const dev = p[k] / ref[k] - 1;
        expect(Math.abs(dev), `${k} at ${ref.temp_C} °C, ${ref.pressure_Pa} Pa`).toBeLessThan(0.005);
      }
    }
  });
});

describe('IF97 region 1 and 4 against the verification tables of IAPWS R7-97 (memory)', () => {
  it('reproduces Table 5', () => {
    // R7-97 Table 5: v = 0.100215168e-2 m³/kg, cp = 4.17301218 kJ/kgK at 300 K, 3 MPa
    const a = waterRegion1(300, 3e6);
    expect(1 / a.density).toBeCloseTo(0.100215168e-2, 11);
    expect(a.specificHeat / 1000).toBeCloseTo(4.17301218, 7);
    // R7-97 Table 5: v = 0.971180894e-3, cp = 4.01008987 at 300 K, 80 MPa
    const b = waterRegion1(300, 80e6);
    expect(1 / b.density).toBeCloseTo(0.971180894e-3, 11);
    expect(b.specificHeat / 1000).toBeCloseTo(4.01008987, 7);
    // R7-97 Table 5: v = 0.120241800e-2, cp = 4.65580682 at 500 K, 3 MPa
    const c = waterRegion1(500, 3e6);
    expect(1 / c.density).toBeCloseTo(0.1202418e-2, 11);
    expect(c.specificHeat / 1000).toBeCloseTo(4.65580682, 7);
  });

  it('reproduces Tables 35 and 36 (saturation line)', () => {
    expect(waterSaturationPressure(300) / 1e6).toBeCloseTo(0.353658941e-2, 10); // Table 35
    expect(waterSaturationPressure(500) / 1e6).toBeCloseTo(0.263889776e1, 7); // Table 35
    expect(waterSaturationTemperature(0.1e6)).toBeCloseTo(372.755919, 5); // Table 36
    expect(waterSaturationTemperature(10e6)).toBeCloseTo(584.149488, 5); // Table 36
  });
});

describe('transport releases against their verification points (memory)', () => {
  it('viscosity: IAPWS R12-08 Table 4, μ₂ = 1', () => {
    expect(waterViscosity(298.15, 998) * 1e6).toBeCloseTo(889.7351, 3); // 889.735100 µPa·s
    expect(waterViscosity(298.15, 1200) * 1e6).toBeCloseTo(1437.649467, 3);
    expect(waterViscosity(373.15, 1000) * 1e6).toBeCloseTo(307.883622, 4);
  });
  it('conductivity: IAPWS R15-11 Table 4, λ₂ = 0', () => {
    expect(waterConductivity(298.15, 998) * 1e3).toBeCloseTo(607.712868, 4); // mW/(m·K)
    expect(waterConductivity(298.15, 1200) * 1e3).toBeCloseTo(799.038144, 4);
    expect(waterConductivity(873.15, 0) * 1e3).toBeCloseTo(79.1034659, 5);
  });
});

describe('water state problems', () => {
  it('explains boiling at the given pressure (IF97 region 4: 133.5 °C at 3 bar(a))', () => {
    const why = water.stateProblem(140, 3e5);
    expect(why).toContain('boils at 133.5 °C at 3.0 bar(a)');
    expect(() => water.properties(140, 3e5)).toThrow(ThermalInputError);
    try {
      water.properties(140, 3e5);
    } catch (e) {
      expect((e as ThermalInputError).code).toBe('fluid-boiling');
    }
    expect(water.stateProblem(130, 3e5)).toBeNull();
  });

  it('explains freezing and the range, never returns NaN', () => {
    expect(water.stateProblem(-5, 1e5)).toMatch(/freezes/);
    expect(() => water.properties(-5, 1e5)).toThrow(expect.objectContaining({ code: 'fluid-frozen' }));
    expect(() => water.properties(160, 20e5)).toThrow(expect.objectContaining({ code: 'fluid-range' }));
    expect(water.stateProblem(160, 20e5)).toMatch(/Water: 160 °C .* 0 °C to 150 °C/);
    expect(() => water.properties(Number.NaN, 1e5)).toThrow(expect.objectContaining({ code: 'fluid-range' }));
    expect(() => water.properties(20, -1)).toThrow(expect.objectContaining({ code: 'fluid-range' }));
    expect(water.stateProblem(20, 2e8)).toMatch(/above the 1000 bar limit/);
  });
});
