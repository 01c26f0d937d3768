/**
 * Water vapour in compressed air: humidity ratios, pressure dew point and latent heat.
 *
 * Saturation and humidity ratios come from npm `psychrolib` (SI), which implements ASHRAE
 * Handbook—Fundamentals (2017) ch. 1: saturation pressure over water/ice by Hyland & Wexler (1983),
 * eqs. 5–6, valid −100…200 °C; humidity ratio W = 0.621945 p_w/(p − p_w) (eq. 20), an ideal mixture
 * without the enhancement factor, which is good to about 0.5 % at line pressures of a few bar.
 * Above 200 °C the saturation pressure is taken from IAPWS-IF97 region 4 (./water-if97).
 *
 * Humidity ratio W is kg of water vapour per kg of dry air, at any pressure. Compressing air does not
 * change W; cooling it below the pressure dew point condenses W − W_sat(T, p) per kg of dry air.
 */
import shared from 'psychrolib';
import type { Psychrometrics } from 'psychrolib';
import { ThermalInputError } from '../errors';
import { waterSaturationPressure } from './water-if97';

// A private instance: the package's own export carries a global unit system that other code could
// switch to IP; the constructor gives us one that stays SI.
const psy = new (shared.constructor as new () => Psychrometrics)();
psy.SetUnitSystem(psy.SI);

/** Molar-mass ratio water/dry air, ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 20. */
export const MOLAR_MASS_RATIO = 0.621945;
/** cp of water vapour and liquid water, J/(kg·K), ASHRAE Handbook—Fundamentals (2017) ch. 1 eq. 32. */
export const CP_VAPOUR = 1860;
export const CP_LIQUID_WATER = 4186;

/** Conditions of the air a compressor draws in. */
export interface IntakeConditions {
  temp_C: number;
  /** 0…1 */
  relativeHumidity: number;
  /** barometric (absolute) pressure at the intake, Pa */
  pressure_Pa: number;
}

function requireFinite(value: number, field: string, what: string, min: number, max: number): void {
  if (!Number.isFinite(value) || value < min || value > max) {
    throw new ThermalInputError('humidity-input', `${what} must be between ${min} and ${max} (got ${value}).`, field);
  }
}

/** Saturation pressure of water vapour over liquid water (ice below 0.01 °C), Pa; −100…370 °C. */
export function saturationVapourPressure(temp_C: number): number {
  requireFinite(temp_C, 'temp_C', 'The temperature in °C', -100, 370);
  return temp_C <= 200 ? psy.GetSatVapPres(temp_C) : waterSaturationPressure(temp_C + 273.15);
}

/** Humidity ratio (kg water/kg dry air) of intake air; unchanged by compression. */
export function humidityRatioFromIntake(intake: IntakeConditions): number {
  requireFinite(intake.temp_C, 'intake.temp_C', 'The intake temperature in °C', -50, 80);
  requireFinite(intake.relativeHumidity, 'intake.relativeHumidity', 'The relative humidity (fraction)', 0, 1);
  requireFinite(intake.pressure_Pa, 'intake.pressure_Pa', 'The intake pressure in Pa', 10e3, 200e3);
  return psy.GetHumRatioFromRelHum(intake.temp_C, intake.relativeHumidity, intake.pressure_Pa);
}

/**
 * Humidity ratio of air saturated at `temp_C` and absolute line pressure `pressure_Pa`.
 * `Infinity` when the saturation pressure reaches the line pressure: water cannot condense there.
 */
export function saturationHumidityRatio(temp_C: number, pressure_Pa: number): number {
  requireFinite(pressure_Pa, 'pressure_Pa', 'The absolute pressure in Pa', 1e3, 1e8);
  const pws = saturationVapourPressure(temp_C);
  return pws >= pressure_Pa ? Infinity : (MOLAR_MASS_RATIO * pws) / (pressure_Pa - pws);
}

/** Dew point (°C) at absolute line pressure of air carrying `humidityRatio` kg/kg. */
export function dewPointAtPressure(humidityRatio: number, pressure_Pa: number): number {
  requireFinite(humidityRatio, 'humidityRatio', 'The humidity ratio in kg/kg', 0, 10);
  requireFinite(pressure_Pa, 'pressure_Pa', 'The absolute pressure in Pa', 1e3, 1e8);
  const pw = (pressure_Pa * humidityRatio) / (MOLAR_MASS_RATIO + humidityRatio);
  if (pw > psy.GetSatVapPres(200) || pw < psy.GetSatVapPres(-100)) {
    throw new ThermalInputError(
      'humidity-input',
      `A dew point at ${Math.round(pw)} Pa of water vapour is outside −100…200 °C.`,
      'humidityRatio',
    );
  }
  return psy.GetTDewPointFromVapPres(200, pw);
}

/**
 * Heat released per kg of water condensing at `temp_C`, J/kg, on the ASHRAE enthalpy basis that
 * psychrolib uses (vapour 2 501 000 + 1860 t, liquid 4186 t; Fundamentals 2017 ch. 1 eqs. 30–32):
 * h_fg = 2 501 000 − 2326 t. Within 0.6 % of IAPWS-95 from 0 to 100 °C, 1.8 % low-biased at 150 °C
 * (overstates latent heat slightly, the conservative side for a cooler's duty).
 */
export function latentHeatOfCondensation(temp_C: number): number {
  requireFinite(temp_C, 'temp_C', 'The condensing temperature in °C', 0, 150);
  return 2501000 + (CP_VAPOUR - CP_LIQUID_WATER) * temp_C;
}

/** Moist-air enthalpy per kg of dry air, J/kg (ASHRAE 2017 ch. 1 eq. 32, through psychrolib). */
export function moistAirEnthalpy(temp_C: number, humidityRatio: number): number {
  return psy.GetMoistAirEnthalpy(temp_C, humidityRatio);
}
