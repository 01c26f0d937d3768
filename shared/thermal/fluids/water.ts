/**
 * Liquid water, 0–150 °C, at any pressure above its saturation pressure.
 *
 * Density and cp: IAPWS-IF97 region 1 (./water-if97). Viscosity: IAPWS 2008; conductivity:
 * IAPWS 2011, both without critical enhancement (./water-transport). Checked against IAPWS-95
 * (python3-iapws) within ±0.5 % from 1 to 150 °C, 1–20 bar(a).
 */
import { basicIssue, defineFluid, fmtBar, fmtTemp, props, type StateIssue } from './fluid-base';
import type { FluidInfo } from './types';
import {
  SAT_P_MAX_PA,
  SAT_P_MIN_PA,
  waterRegion1,
  waterSaturationPressure,
  waterSaturationTemperature,
} from './water-if97';
import { waterConductivity, waterViscosity } from './water-transport';

const info: FluidInfo = {
  id: 'water',
  name: 'Water',
  phase: 'liquid',
  minTemp_C: 0,
  maxTemp_C: 150,
  source:
    'IAPWS-IF97 region 1 and 4 (IAPWS R7-97, 2012); viscosity IAPWS R12-08 (2008); ' +
    'thermal conductivity IAPWS R15-11 (2011), critical enhancement neglected',
};

// Every property call checks for boiling; a rating asks at one pressure many times, so the last
// pressure's saturation temperature is kept (the same number, computed once).
let lastSatP = NaN;
let lastSatT_C = NaN;

function saturationTemp_C(pressure_Pa: number): number {
  if (pressure_Pa !== lastSatP) {
    lastSatT_C = pressure_Pa > SAT_P_MIN_PA ? waterSaturationTemperature(pressure_Pa) - 273.15 : 0.01;
    lastSatP = pressure_Pa;
  }
  return lastSatT_C;
}

function waterIssue(temp_C: number, pressure_Pa: number): StateIssue | null {
  if (Number.isFinite(temp_C) && temp_C <= 0) {
    return {
      code: 'fluid-frozen',
      message: `Water freezes at 0 °C; at ${fmtTemp(temp_C)} it would be ice. Use a glycol mixture below 0 °C.`,
    };
  }
  const basic = basicIssue(info, temp_C, pressure_Pa);
  if (basic) return basic;
  if (pressure_Pa > 100e6) {
    return { code: 'fluid-range', message: `Water: ${fmtBar(pressure_Pa)} is above the 1000 bar limit of IAPWS-IF97 region 1.` };
  }
  if (pressure_Pa < SAT_P_MAX_PA) {
    const tSat_C = saturationTemp_C(pressure_Pa);
    if (temp_C >= tSat_C) {
      const pNeeded = waterSaturationPressure(temp_C + 273.15);
      return {
        code: 'fluid-boiling',
        message:
          `Water boils at ${fmtTemp(tSat_C)} at ${fmtBar(pressure_Pa)}; at ${fmtTemp(temp_C)} it would be steam ` +
          `or a steam–water mixture. Keep it below ${fmtTemp(tSat_C)} or raise the pressure above ${fmtBar(pNeeded)}.`,
      };
    }
  }
  return null;
}

export const water = defineFluid(info, waterIssue, (temp_C, pressure_Pa) => {
  const T = temp_C + 273.15;
  const r1 = waterRegion1(T, pressure_Pa);
  return props(r1.density, r1.specificHeat, waterViscosity(T, r1.density), waterConductivity(T, r1.density));
});
