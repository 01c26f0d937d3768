/**
 * A fluid with constant properties supplied by the customer (their own datasheet), valid at any
 * temperature and pressure. No source beyond the user's word: results say so through `source`.
 */
import { ThermalInputError } from '../errors';
import { defineFluid, props } from './fluid-base';
import type { Fluid, FluidPhase } from './types';

export const CONSTANT_FLUID_ID = 'constant';

export interface ConstantFluidInput {
  /** kg/m³ */
  density: number;
  /** J/(kg·K) */
  specificHeat: number;
  /** dynamic viscosity, Pa·s */
  viscosity: number;
  /** W/(m·K) */
  conductivity: number;
  phase?: FluidPhase;
  name?: string;
}

const FIELDS = ['density', 'specificHeat', 'viscosity', 'conductivity'] as const;
const UNITS = { density: 'kg/m³', specificHeat: 'J/(kg·K)', viscosity: 'Pa·s', conductivity: 'W/(m·K)' };

/**
 * Builds the `constant` fluid. Throws ThermalInputError (code `invalid-fluid-property`, field
 * `<fieldPrefix>.<name>`, default prefix `process.fluid.constant`) for a missing, non-finite or
 * non-positive value.
 */
export function constantFluid(input: ConstantFluidInput, fieldPrefix = 'process.fluid.constant'): Fluid {
  for (const key of FIELDS) {
    const v = input[key];
    if (typeof v !== 'number' || !Number.isFinite(v) || v <= 0) {
      throw new ThermalInputError(
        'invalid-fluid-property',
        `The fluid's ${key} must be a positive number in ${UNITS[key]} (got ${String(v)}).`,
        `${fieldPrefix}.${key}`,
      );
    }
  }
  const fixed = props(input.density, input.specificHeat, input.viscosity, input.conductivity);
  const info = {
    id: CONSTANT_FLUID_ID,
    name: input.name ?? 'User-defined fluid (constant properties)',
    phase: input.phase ?? 'liquid',
    minTemp_C: -273.15,
    maxTemp_C: 10000,
    source: 'constant properties supplied by the user',
  };
  return defineFluid(
    info,
    (t, p) =>
      Number.isFinite(t) && Number.isFinite(p) && p > 0
        ? null
        : { code: 'fluid-range', message: `${info.name}: temperature and absolute pressure must be numbers (got ${t} °C, ${p} Pa).` },
    () => ({ ...fixed }),
  );
}
