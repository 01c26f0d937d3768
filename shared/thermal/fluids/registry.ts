/** The fluid library: stable ids, lookup and the list `GET /api/fluids` shows. */
import { ThermalInputError } from '../errors';
import { air } from './air';
import { airMoist } from './air-moist';
import { CONSTANT_FLUID_ID } from './constant';
import { ethyleneGlycol30, ethyleneGlycol50, propyleneGlycol30, propyleneGlycol50 } from './glycols';
import { oilVg32, oilVg46, oilVg68 } from './oils';
import type { Fluid, FluidInfo } from './types';
import { water } from './water';

/** Ids of the library's fluids, usable as `z.enum(fluidIds)`. */
export const fluidIds = [
  'water',
  'air',
  'air-moist',
  'ethylene-glycol-30',
  'ethylene-glycol-50',
  'propylene-glycol-30',
  'propylene-glycol-50',
  'oil-vg32',
  'oil-vg46',
  'oil-vg68',
] as const;

export type FluidId = (typeof fluidIds)[number];

/** Library ids plus `constant` (built with `constantFluid` from the user's values). */
export const allFluidIds = [...fluidIds, CONSTANT_FLUID_ID] as const;

const FLUIDS: Record<FluidId, Fluid> = {
  water,
  air,
  'air-moist': airMoist,
  'ethylene-glycol-30': ethyleneGlycol30,
  'ethylene-glycol-50': ethyleneGlycol50,
  'propylene-glycol-30': propyleneGlycol30,
  'propylene-glycol-50': propyleneGlycol50,
  'oil-vg32': oilVg32,
  'oil-vg46': oilVg46,
  'oil-vg68': oilVg68,
};

export function isFluidId(id: string): id is FluidId {
  return Object.prototype.hasOwnProperty.call(FLUIDS, id);
}

/** The library fluid with this id; unknown id → ThermalInputError `unknown-fluid` on `field`. */
export function getFluid(id: string, field = 'process.fluid'): Fluid {
  if (isFluidId(id)) return FLUIDS[id];
  const hint = id === CONSTANT_FLUID_ID ? ' A constant-properties fluid needs its values (constantFluid).' : '';
  throw new ThermalInputError(
    'unknown-fluid',
    `Unknown fluid '${id}'. Known fluids: ${fluidIds.join(', ')}.${hint}`,
    field,
  );
}

/** Plain descriptions of the library's fluids (fresh objects, safe to serialise or change). */
export function listFluids(): FluidInfo[] {
  return fluidIds.map((id) => {
    const f = FLUIDS[id];
    return { id: f.id, name: f.name, phase: f.phase, minTemp_C: f.minTemp_C, maxTemp_C: f.maxTemp_C, source: f.source };
  });
}
