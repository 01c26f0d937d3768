import shared from 'psychrolib';
import { describe, expect, it } from 'vitest';
import fixture from '../../../tests/reference/fixtures/properties.json';
import {
  CP_LIQUID_WATER,
  MOLAR_MASS_RATIO,
  dewPointAtPressure,
  humidityRatioFromIntake,
  latentHeatOfCondensation,
  moistAirEnthalpy,
  saturationHumidityRatio,
  saturationVapourPressure,
} from './psychro';
import { waterSaturationPressure } from './water-if97';

const rel = (a: number, b: number) => Math.abs(a / b - 1);

describe('saturation against sources independent of psychrolib', () => {
  it('matches IAPWS-95 saturation pressures (python3-iapws fixture) within 0.2 %, 1–150 °C', () => {
    for (const s of fixture.waterSaturation.states) {
      expect(rel(saturationVapourPressure(s.temp_C), s.pressure_Pa), `${s.temp_C} °C`).toBeLessThan(0.002);
    }
  });

  it('matches published steam-table values (IAPWS-95 tables, Wagner & Pruss 2002; memory)', () => {
    expect(saturationVapourPressure(20)).toBeCloseTo(2339.2, -1); // 2.3392 kPa at 20 °C
    expect(rel(saturationVapourPressure(100), 101418)).toBeLessThan(0.001); // 101.418 kPa at 100 °C
  });

  it('agrees with the IF97 region-4 equation across the 200 °C hand-over', () => {
    expect(rel(saturationVapourPressure(200), waterSaturationPressure(473.15))).toBeLessThan(0.002);
    expect(saturationVapourPressure(201)).toBeGreaterThan(saturationVapourPressure(200));
  });

  it('saturation humidity ratio scales with line pressure as 0.621945 p_s/(p − p_s) (ASHRAE eq. 20, IAPWS-95 p_s)', () => {
    const ps40 = fixture.waterSaturation.states.find((s) => s.temp_C === 40)!.pressure_Pa;
    for (const p of [101325, 8e5, 16e5]) {
      expect(rel(saturationHumidityRatio(40, p), (MOLAR_MASS_RATIO * ps40) / (p - ps40))).toBeLessThan(0.003);
    }
    // ASHRAE Handbook—Fundamentals 2017 ch. 1 Table 2: Ws = 0.014758 at 20 °C, 101.325 kPa (memory);
    // that table includes the enhancement factor (~1.004) which psychrolib leaves out.
    expect(rel(saturationHumidityRatio(20, 101325), 0.014758)).toBeLessThan(0.006);
  });

  it('returns Infinity, not NaN, where water cannot condense at the line pressure', () => {
    expect(saturationHumidityRatio(120, 1e5)).toBe(Infinity);
  });
});

describe('mass balance identities', () => {
  it('dew point and saturation humidity ratio invert each other at line pressure', () => {
    const w = humidityRatioFromIntake({ temp_C: 35, relativeHumidity: 0.7, pressure_Pa: 101325 });
    const p = 8e5 + 101325;
    const tdp = dewPointAtPressure(w, p);
    expect(rel(saturationHumidityRatio(tdp, p), w)).toBeLessThan(1e-4);
    // vapour partial pressure at the dew point equals IF97's saturation pressure there
    expect(rel(waterSaturationPressure(tdp + 273.15), (p * w) / (MOLAR_MASS_RATIO + w))).toBeLessThan(0.002);
    // compressing raises the dew point: it is far above the 35 °C intake's own dew point
    expect(tdp).toBeGreaterThan(60);
  });

  it('condensate per kg dry air = W_in − W_sat(T_out, p) is positive below the dew point, zero above', () => {
    const w = humidityRatioFromIntake({ temp_C: 30, relativeHumidity: 0.6, pressure_Pa: 101325 });
    const p = 8e5;
    expect(w - saturationHumidityRatio(35, p)).toBeGreaterThan(0);
    expect(Math.max(0, w - saturationHumidityRatio(dewPointAtPressure(w, p) + 5, p))).toBe(0);
  });

  it('rejects impossible intake data with a field name', () => {
    expect(() => humidityRatioFromIntake({ temp_C: 20, relativeHumidity: 1.5, pressure_Pa: 101325 })).toThrow(
      expect.objectContaining({ code: 'humidity-input', field: 'intake.relativeHumidity' }),
    );
  });
});

describe('latent heat', () => {
  it('is within 0.6 % of IAPWS-95 (h″ − h′, python3-iapws fixture) from 1 to 100 °C', () => {
    for (const s of fixture.waterSaturation.states.filter((x) => x.temp_C <= 100)) {
      expect(rel(latentHeatOfCondensation(s.temp_C), s.latentHeat), `${s.temp_C} °C`).toBeLessThan(0.006);
    }
  });

  it('closes the energy balance of an aftercooler with psychrolib enthalpies', () => {
    // Q per kg dry air = h(T_in, W_in) − h(T_out, W_out) − (W_in − W_out) h_liquid(T_out)
    //                 = (cp_da + W_in cp_v)(T_in − T_out) + (W_in − W_out) h_fg(T_out)  (ASHRAE 2017 ch. 1)
    const p = 8e5;
    const tIn = 120;
    const tOut = 35;
    const wIn = 0.02;
    const wOut = saturationHumidityRatio(tOut, p);
    const total = moistAirEnthalpy(tIn, wIn) - moistAirEnthalpy(tOut, wOut) - (wIn - wOut) * CP_LIQUID_WATER * tOut;
    const sensible = (1006 + wIn * 1860) * (tIn - tOut);
    const latent = (wIn - wOut) * latentHeatOfCondensation(tOut);
    expect(rel(sensible + latent, total)).toBeLessThan(1e-9);
    expect(latent / sensible).toBeGreaterThan(0.3); // the latent load matters (domain brief §2.6: 10–30 % or more)
  });
});

describe('the private psychrolib instance', () => {
  it('stays in SI when someone switches the package-wide instance to IP', () => {
    shared.SetUnitSystem(shared.IP);
    try {
      expect(saturationVapourPressure(20)).toBeCloseTo(2339, -1);
    } finally {
      shared.SetUnitSystem(shared.SI);
    }
  });
});
