import { describe, expect, it } from 'vitest';
import fixture from '../../../tests/reference/fixtures/properties.json';
import { air } from './air';
import { airIdealCp } from './air-lemmon';

const KEYS = ['density', 'specificHeat', 'viscosity', 'conductivity'] as const;

describe('dry air against Lemmon et al. 2000 / Lemmon & Jacobsen 2004 (python3-iapws Air fixture)', () => {
  it('stays within ±2 % for density, cp, viscosity and conductivity, −40…400 °C, 1–50 bar(a)', () => {
    expect(fixture.air.states.length).toBeGreaterThan(40);
    for (const ref of fixture.air.states) {
      const p = air.properties(ref.temp_C, ref.pressure_Pa);
      for (const k of KEYS) {
        const dev = p[k] / ref[k] - 1;
        expect(Math.abs(dev), `${k} at ${ref.temp_C} °C, ${ref.pressure_Pa} Pa`).toBeLessThan(0.02);
      }
    }
  });

  it('captures the real-gas rise of cp at 25 bar that an ideal-gas cp would miss', () => {
    const ref = fixture.air.states.find((s) => s.temp_C === -20 && s.pressure_Pa === 25e5)!;
    // the reference itself shows the effect: cp(25 bar) well above cp(1 bar) at −20 °C
    expect(ref.specificHeat / airIdealCp(253.15)).toBeGreaterThan(1.03);
    expect(Math.abs(air.properties(-20, 25e5).specificHeat / ref.specificHeat - 1)).toBeLessThan(0.005);
  });

  it('ideal-gas cp near 300 K is about 1005 J/(kg·K) (CRC/JANAF air tables, memory)', () => {
    expect(airIdealCp(300)).toBeGreaterThan(1000);
    expect(airIdealCp(300)).toBeLessThan(1010);
  });

  it('rejects states outside its data with a named range', () => {
    expect(() => air.properties(450, 1e5)).toThrow(expect.objectContaining({ code: 'fluid-range' }));
    expect(air.stateProblem(450, 1e5)).toMatch(/Air \(dry\): 450 °C .* -40 °C to 400 °C/);
    expect(air.stateProblem(20, 80e5)).toMatch(/80.0 bar\(a\) is above/);
    expect(air.stateProblem(20, 8e5)).toBeNull();
  });
});
