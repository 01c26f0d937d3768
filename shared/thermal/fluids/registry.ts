/** The fluid library: stable ids, lookup and the list `GET /api/fluids` shows. */
import { ThermalInputError } from '../errors';
import { air } from './air';
import { airMoist } from './air-moist';
import { CONSTANT_FLUID_ID } from './constant';
import { GLYCOL_MAX_PERCENT, GLYCOL_MIN_PERCENT, glycolFluidIds, glycolFluids, glycolStrengthProblem, parseGlycolId } from './glycols';
import { oilVg32, oilVg46, oilVg68 } from './oils';
import type { Fluid, FluidInfo } from './types';
import { water } from './water';

/**
 * Ids of the library's fluids, usable as `z.enum(fluidIds)`. Glycol–water mixtures are
 * `ethylene-glycol-<p>` / `propylene-glycol-<p>` for p = 10, 15, …, 60 % glycol by mass (./glycols).
 */
export const fluidIds = [
  'water',
  'air',
  'air-moist',
  ...glycolFluidIds,
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
  ...glycolFluids,
  'oil-vg32': oilVg32,
  'oil-vg46': oilVg46,
  'oil-vg68': oilVg68,
};

export function isFluidId(id: string): id is FluidId {
  return Object.prototype.hasOwnProperty.call(FLUIDS, id);
}

/** The known ids in words (the glycol strengths as a range, not 22 ids). */
export const fluidIdsInWords =
  `water, air, air-moist, ethylene-glycol-<p> and propylene-glycol-<p> (p = ${GLYCOL_MIN_PERCENT}, ` +
  `${GLYCOL_MIN_PERCENT + 5}, …, ${GLYCOL_MAX_PERCENT} % glycol by mass), oil-vg32, oil-vg46, oil-vg68`;

/**
 * Why `id` is not a library fluid, in words (a glycol strength outside the data or off the 5 % steps
 * is named as such), or null when it is one.
 */
export function unknownFluidProblem(id: string): string | null {
  if (isFluidId(id)) return null;
  const glycol = parseGlycolId(id);
  if (glycol) {
    const range = glycolStrengthProblem(glycol.kind, glycol.massPercent);
    if (range) return range;
    const below = Math.floor(glycol.massPercent / 5) * 5;
    return (
      `'${id}': the library lists glycol strengths in steps of 5 % by mass; choose ` +
      `${glycol.kind}-glycol-${below} or ${glycol.kind}-glycol-${below + 5}.`
    );
  }
  const hint = id === CONSTANT_FLUID_ID ? ' A constant-properties fluid needs its values (constantFluid).' : '';
  return `Unknown fluid '${id}'. Known fluids: ${fluidIdsInWords}.${hint}`;
}

/**
 * The library fluid with this id; unknown id → ThermalInputError on `field`: `fluid-range` for a glycol
 * strength outside the data or off the steps, `unknown-fluid` otherwise.
 */
export function getFluid(id: string, field = 'process.fluid'): Fluid {
  if (isFluidId(id)) return FLUIDS[id];
  const code = parseGlycolId(id) ? 'fluid-range' : 'unknown-fluid';
  throw new ThermalInputError(code, unknownFluidProblem(id)!, field);
}

/** Plain descriptions of the library's fluids (fresh objects, safe to serialise or change). */
export function listFluids(): FluidInfo[] {
  return fluidIds.map((id) => {
    const f = FLUIDS[id];
    return { id: f.id, name: f.name, phase: f.phase, minTemp_C: f.minTemp_C, maxTemp_C: f.maxTemp_C, source: f.source };
  });
}
