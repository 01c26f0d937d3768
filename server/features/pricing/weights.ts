/**
 * Estimated weights of one unit for the offer's datasheet: empty, and full of water (the hydrotest
 * weight, the heaviest the foundation and the lifting gear see). From the same placeholders the bill
 * of materials prices by (bom-rules.ts: tubesheet thickness and blank, baffle plate, shell wall), so
 * the weights and the price describe the same cooler. An estimate for quotation (about ±15 %):
 *
 * - tubes: π/4 (d_o² − d_i²) L ρ per tube, the tube material's density;
 * - tubesheets, baffles, shell: as the bill of materials (disc and cylinder masses);
 * - channel heads (bonnets): per head a channel barrel of the shell's wall, max(0.3 m, 0.5 D_s) long
 *   (common practice for a bonnet's depth), and a cover plate of the tubesheet's blank and thickness;
 *   a floating head (AES, AET) adds a second pair; a U-tube bundle (BEU) has one head and a shell cover
 *   counted as a head;
 * - nozzles, flanges, tie rods, gaskets and bolting: 10 % of the above (common practice allowance);
 * - water: the tube side (tube bores and the heads' volume) plus the shell side (shell less the tubes'
 *   outside volume), at 1000 kg/m³.
 */
import { shellSpec, type BomInput } from './bom';
import { bafflesPerShell, shellsOf } from './design-fields';
import {
  BAFFLE_AREA_FRACTION, baffleThickness_m, discMass, plateDensity, plateGrades, rolledShellMass, shellLength_m, SHELL_DENSITY,
  tubesheetDiameter_m, tubesheetThickness_m,
} from './bom-rules';
import { tubeMaterial } from '../../../shared/thermal/geometry/materials';

/** Bonnet depth: max(0.3 m, 0.5 D_s) (common practice). */
export const headDepth_m = (ds: number) => Math.max(0.3, 0.5 * ds);
/** Allowance for nozzles, flanges, tie rods, gaskets and bolting: 10 % of the main parts (common practice). */
export const SUNDRIES_FRACTION = 0.1;
const WATER_DENSITY = 1000;

export interface UnitWeights {
  /** kg, one unit (all its shells) */
  empty_kg: number;
  /** kg, one unit full of water on both sides */
  full_kg: number;
  water_kg: number;
}

export function estimateWeights(d: BomInput): UnitWeights {
  const shell = shellSpec(d);
  const ds = shell.innerDiameter_m;
  const N = shellsOf(d);
  const n = d.tubeCount;
  const L = d.tubeLength_m;
  const cons = d.construction ?? 'BEM';
  const sheets = cons === 'BEU' ? 1 : 2;
  const heads = cons === 'AES' || cons === 'AET' ? 4 : 2;
  const grades = plateGrades(d.tubeMaterial);
  const tts = tubesheetThickness_m(ds);
  const dts = tubesheetDiameter_m(ds);
  const shellLen = shellLength_m(L, ds);
  const dOut = d.tubeOuterDiameter_m;
  const dIn = dOut - 2 * d.tubeWall_m;
  const area = (dia: number) => (Math.PI / 4) * dia * dia;

  const tubes = n * (area(dOut) - area(dIn)) * L * (tubeMaterial(d.tubeMaterial)?.density ?? 7850);
  const tubesheets = sheets * discMass(dts, tts, plateDensity(grades.tubesheets));
  const baffles = bafflesPerShell(d) * BAFFLE_AREA_FRACTION * discMass(ds, baffleThickness_m(ds), plateDensity(grades.baffles));
  const shellMass = rolledShellMass(ds, shell.wall_m, shellLen);
  const depth = headDepth_m(ds);
  const headMass = heads * (rolledShellMass(ds, shell.wall_m, depth) + discMass(dts, tts, SHELL_DENSITY));
  const main = tubes + tubesheets + baffles + shellMass + headMass;
  const empty = N * main * (1 + SUNDRIES_FRACTION);

  // the tube side: the bores and the heads' barrels (those that hold the tube-side fluid: one pair)
  const tubeSide = n * area(dIn) * L + 2 * area(ds) * depth;
  const shellSide = Math.max(area(ds) * shellLen - n * area(dOut) * shellLen, 0);
  const water = N * (tubeSide + shellSide) * WATER_DENSITY;
  return { empty_kg: empty, full_kg: empty + water, water_kg: water };
}
