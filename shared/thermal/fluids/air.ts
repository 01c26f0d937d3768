/**
 * Dry air, −40…400 °C, up to 50 bar(a): Lemmon et al. (2000) equation of state truncated after the
 * fourth virial coefficient, Lemmon & Jacobsen (2004) transport (see ./air-lemmon).
 *
 * Density is the real-gas density from that equation, not the ideal gas: at 25 bar and −20 °C the
 * ideal gas would be 2 % low. Checked against the full equations (python3-iapws `Air`) within
 * ±2 % (in fact ±0.4 %) over the whole range.
 */
import { airConductivity, airState, airViscosity } from './air-lemmon';
import { basicIssue, defineFluid, fmtBar, props, type StateIssue } from './fluid-base';
import type { FluidInfo } from './types';

/** Highest absolute pressure the truncated equation of state is checked for, Pa. */
export const AIR_MAX_PRESSURE_PA = 50e5;

export const airInfo: FluidInfo = {
  id: 'air',
  name: 'Air (dry)',
  phase: 'gas',
  minTemp_C: -40,
  maxTemp_C: 400,
  source:
    'Lemmon, Jacobsen, Penoncello & Friend, J. Phys. Chem. Ref. Data 29 (2000) 331 (EOS, virial form); ' +
    'Lemmon & Jacobsen, Int. J. Thermophys. 25 (2004) 21 (viscosity, conductivity)',
};

/** Range and pressure checks shared by dry and humid air. */
export function airIssue(info: FluidInfo, temp_C: number, pressure_Pa: number): StateIssue | null {
  const basic = basicIssue(info, temp_C, pressure_Pa);
  if (basic) return basic;
  if (pressure_Pa > AIR_MAX_PRESSURE_PA) {
    return {
      code: 'fluid-range',
      message: `${info.name}: ${fmtBar(pressure_Pa)} is above the ${fmtBar(AIR_MAX_PRESSURE_PA)} its property data cover.`,
    };
  }
  return null;
}

/** Dry-air properties without checks (callers check first). */
export function dryAirProperties(temp_C: number, pressure_Pa: number) {
  const T = temp_C + 273.15;
  const s = airState(T, pressure_Pa);
  return props(s.density, s.specificHeat, airViscosity(T, s.density), airConductivity(T, s.density));
}

export const air = defineFluid(airInfo, (t, p) => airIssue(airInfo, t, p), dryAirProperties);
