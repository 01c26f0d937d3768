/**
 * Ethylene- and propylene-glycol/water mixtures at 30 % and 50 % glycol by mass, from the freezing
 * point to 100 °C, after Melinder 2010 (./melinder). Below the freezing point the mixture turns to
 * slush (code `fluid-frozen`); above 100 °C the fit is not valid and, at atmospheric pressure, the
 * mixture approaches its boiling point (code `fluid-range`).
 */
import { basicIssue, defineFluid, fmtTemp, props, type StateIssue } from './fluid-base';
import {
  ETHYLENE_GLYCOL,
  PROPYLENE_GLYCOL,
  melinderFreezingPoint,
  melinderProperties,
  type MelinderFluidData,
} from './melinder';
import type { Fluid, FluidInfo } from './types';

const SOURCE =
  'Melinder, Properties of Secondary Working Fluids for Indirect Systems, 2nd ed., IIR 2010 (polynomial fits)';

function glycol(id: string, glycolName: string, data: MelinderFluidData, massPercent: number): Fluid {
  const freezing_C = melinderFreezingPoint(data, massPercent);
  const info: FluidInfo = {
    id,
    name: `${glycolName}–water, ${massPercent} % by mass`,
    phase: 'liquid',
    minTemp_C: Math.ceil(freezing_C * 10) / 10,
    maxTemp_C: 100,
    source: SOURCE,
  };
  const issue = (temp_C: number, pressure_Pa: number): StateIssue | null => {
    if (temp_C <= freezing_C) {
      return {
        code: 'fluid-frozen',
        message:
          `${info.name} begins to freeze at ${fmtTemp(freezing_C)} (Melinder 2010); at ${fmtTemp(temp_C)} it ` +
          `would be slush or ice. Use a stronger mixture or keep the fluid warmer.`,
      };
    }
    return basicIssue(info, temp_C, pressure_Pa);
  };
  return defineFluid(info, issue, (temp_C) => {
    const p = melinderProperties(data, massPercent, temp_C);
    return props(p.density, p.specificHeat, p.viscosity, p.conductivity);
  });
}

export const ethyleneGlycol30 = glycol('ethylene-glycol-30', 'Ethylene glycol', ETHYLENE_GLYCOL, 30);
export const ethyleneGlycol50 = glycol('ethylene-glycol-50', 'Ethylene glycol', ETHYLENE_GLYCOL, 50);
export const propyleneGlycol30 = glycol('propylene-glycol-30', 'Propylene glycol', PROPYLENE_GLYCOL, 30);
export const propyleneGlycol50 = glycol('propylene-glycol-50', 'Propylene glycol', PROPYLENE_GLYCOL, 50);
