/**
 * Default cost proxy for ranking sizing candidates until the price book feeds a real cost function
 * (pricing issue). Units: "kg of carbon-steel equivalent". The weights below are placeholders
 * chosen to rank designs sensibly (material-heavy and tube-end-heavy designs cost more); they are
 * not prices and not data from any source.
 */
import type { Design } from '../schemas/thermal';
import { tubeMaterial } from './geometry/materials';

/** Relative price per kg against carbon steel (placeholder ranking weights, not market prices). */
export const MATERIAL_COST_FACTOR: Readonly<Record<string, number>> = {
  'carbon-steel': 1,
  'stainless-304': 4,
  'stainless-316': 5,
  copper: 8,
  'admiralty-brass': 7,
  'cuni-90-10': 10,
  'cuni-70-30': 12,
  'titanium-gr2': 25,
};

/** Placeholder weights, kg-CS-equivalent: labour per tube end (expanding), per baffle, fixed heads/nozzles. */
export const COST_PER_TUBE_END = 1.5;
export const COST_PER_BAFFLE = 5;
export const COST_FIXED = 150;
const STEEL_DENSITY = 7850; // kg/m³, carbon steel (handbook, memory)

/** The part of a design the proxy reads (a full `Design` also fits). */
export type CostInput = Pick<Design, 'tubeCount' | 'tubeLength_m' | 'tubeOuterDiameter_m' | 'tubeWall_m' | 'tubeMaterial' | 'shellInnerDiameter_m' | 'baffleSpacing_m'> & {
  shellWall_m?: number;
  /** identical shells (default 1): tube count, length and baffles are per shell */
  shellsInSeries?: number;
  baffleCut?: number;
  /** per shell; default from the spacing */
  baffleCount?: number;
  processSide?: 'tubes' | 'shell';
  /** issue 11: the rated design's nozzles and TEMA type (absent on a search candidate: flow-free nozzles, BEM) */
  nozzles?: Design['nozzles'];
  construction?: Design['construction'];
};

/**
 * Per shell: tube mass × material factor + shell pipe/plate mass + two tubesheets + tube ends +
 * baffles + fixed (heads, nozzles), times the shells in series.
 * Tubesheet thickness is taken as max(25 mm, 0.08 D_s) for the proxy only.
 */
export function costProxy(d: CostInput): number {
  const m = tubeMaterial(d.tubeMaterial);
  const factor = MATERIAL_COST_FACTOR[d.tubeMaterial] ?? 5;
  const dIn = d.tubeOuterDiameter_m - 2 * d.tubeWall_m;
  const tubeMass = d.tubeCount * d.tubeLength_m * (Math.PI / 4) * (d.tubeOuterDiameter_m ** 2 - dIn ** 2) * (m?.density ?? 8000);
  const ds = d.shellInnerDiameter_m ?? 0;
  const tw = d.shellWall_m ?? 0.008;
  const shellMass = Math.PI * (ds + tw) * tw * d.tubeLength_m * STEEL_DENSITY;
  const sheetMass = 2 * (Math.PI / 4) * ds * ds * Math.max(0.025, 0.08 * ds) * STEEL_DENSITY;
  const baffles = d.baffleCount ?? (d.baffleSpacing_m ? Math.max(0, Math.round(d.tubeLength_m / d.baffleSpacing_m) - 1) : 0);
  const perShell = tubeMass * factor + shellMass + sheetMass + 2 * d.tubeCount * COST_PER_TUBE_END + baffles * COST_PER_BAFFLE + COST_FIXED;
  return perShell * (d.shellsInSeries ?? 1);
}
