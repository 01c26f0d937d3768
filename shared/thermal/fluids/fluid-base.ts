import { ThermalInputError } from '../errors';
import type { Fluid, FluidInfo, FluidProperties } from './types';

/** A reason a state cannot be computed: the error code and a message for the engineer. */
export interface StateIssue {
  code: string;
  message: string;
}

/** Temperatures and pressures in messages: short, unit-bearing, no trailing noise. */
export function fmtTemp(temp_C: number): string {
  return `${Number(temp_C.toFixed(1))} °C`;
}

export function fmtBar(pressure_Pa: number): string {
  const bar = pressure_Pa / 1e5;
  return `${bar < 1 ? bar.toFixed(3) : bar.toFixed(2).replace(/0$/, '')} bar(a)`;
}

/**
 * The checks every fluid shares: finite inputs, positive absolute pressure, and the fluid's
 * tabulated temperature range. Returns `null` when the state is inside all of them.
 */
export function basicIssue(info: FluidInfo, temp_C: number, pressure_Pa: number): StateIssue | null {
  if (!Number.isFinite(temp_C)) {
    return { code: 'fluid-range', message: `${info.name}: the temperature is not a number (${temp_C}).` };
  }
  if (!Number.isFinite(pressure_Pa) || pressure_Pa <= 0) {
    return {
      code: 'fluid-range',
      message: `${info.name}: the absolute pressure must be a positive number of pascals (got ${pressure_Pa}).`,
    };
  }
  if (temp_C < info.minTemp_C || temp_C > info.maxTemp_C) {
    return {
      code: 'fluid-range',
      message:
        `${info.name}: ${fmtTemp(temp_C)} is outside the range of its property data, ` +
        `${fmtTemp(info.minTemp_C)} to ${fmtTemp(info.maxTemp_C)} (${info.source}).`,
    };
  }
  return null;
}

/** Assembles the result object, Prandtl number included (the one allocation of a call). */
export function props(density: number, specificHeat: number, viscosity: number, conductivity: number): FluidProperties {
  return { density, specificHeat, viscosity, conductivity, prandtl: (specificHeat * viscosity) / conductivity };
}

/**
 * Builds a `Fluid` from its description, a state check (`null` = computable) and the property
 * evaluation, which only ever runs on states the check accepted. A non-finite result is turned
 * into a `fluid-range` error rather than leaking NaN into a rating.
 */
export function defineFluid(
  info: FluidInfo,
  issue: (temp_C: number, pressure_Pa: number) => StateIssue | null,
  evaluate: (temp_C: number, pressure_Pa: number) => FluidProperties,
): Fluid {
  const fluid: Fluid = {
    ...info,
    stateProblem(temp_C, pressure_Pa) {
      const found = issue(temp_C, pressure_Pa);
      return found ? found.message : null;
    },
    properties(temp_C, pressure_Pa) {
      const found = issue(temp_C, pressure_Pa);
      if (found) throw new ThermalInputError(found.code, found.message);
      const p = evaluate(temp_C, pressure_Pa);
      if (!(p.density > 0 && p.specificHeat > 0 && p.viscosity > 0 && p.conductivity > 0 && p.prandtl > 0)) {
        throw new ThermalInputError(
          'fluid-range',
          `${info.name}: no valid properties at ${fmtTemp(temp_C)} and ${fmtBar(pressure_Pa)}.`,
        );
      }
      return p;
    },
  };
  return fluid;
}
