import shared from 'psychrolib';
import { describe, expect, it } from 'vitest';
import { air } from './air';
import { DESIGN_HUMIDITY_RATIO, airMoist, moistAirProperties } from './air-moist';
import { saturationHumidityRatio } from './psychro';

shared.SetUnitSystem(shared.SI);

describe('humid-air mixture', () => {
  it('reduces to dry air at W = 0', () => {
    expect(moistAirProperties(50, 8e5, 0)).toEqual(air.properties(50, 8e5));
  });

  it('density agrees with ASHRAE eq. 11 (psychrolib, ideal mixture) at 1 atm within 0.2 %', () => {
    for (const [t, w] of [
      [20, 0.01],
      [60, 0.1],
    ]) {
      const ref = shared.GetMoistAirDensity(t, w, 101325);
      expect(Math.abs(moistAirProperties(t, 101325, w).density / ref - 1)).toBeLessThan(0.002);
    }
  });

  it('follows the known trends of humid air (Tsilingiris, Energy Convers. Manag. 49 (2008) 1098; memory)', () => {
    const dry = moistAirProperties(60, 101325, 0);
    const wet = moistAirProperties(60, 101325, saturationHumidityRatio(60, 101325));
    expect(wet.density).toBeLessThan(dry.density); // vapour is lighter than air
    expect(wet.specificHeat).toBeGreaterThan(dry.specificHeat); // cp_v ≈ 1.86 kJ/kgK > cp_da
    expect(wet.viscosity).toBeLessThan(dry.viscosity); // viscosity falls with humidity
    expect(wet.viscosity / dry.viscosity).toBeGreaterThan(0.85);
  });

  it('caps vapour at saturation: extra water is condensed, not gas', () => {
    const wsat = saturationHumidityRatio(30, 8e5);
    expect(moistAirProperties(30, 8e5, 0.05)).toEqual(moistAirProperties(30, 8e5, wsat));
  });

  it('the air-moist fluid uses the documented design humidity (35 °C, 70 % RH)', () => {
    expect(DESIGN_HUMIDITY_RATIO).toBeGreaterThan(0.024);
    expect(DESIGN_HUMIDITY_RATIO).toBeLessThan(0.026);
    expect(airMoist.properties(100, 9e5)).toEqual(moistAirProperties(100, 9e5, DESIGN_HUMIDITY_RATIO));
    expect(() => airMoist.properties(500, 9e5)).toThrow(expect.objectContaining({ code: 'fluid-range' }));
    expect(() => moistAirProperties(20, 1e5, -1)).toThrow(expect.objectContaining({ code: 'humidity-input' }));
  });
});
