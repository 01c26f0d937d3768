/**
 * Estimating rules of the bill of materials: plain numbers in SI units, shared by the itemised bill
 * (bom.ts) and the fast cost function of the sizing search (cost.ts), so both count the same steel.
 * They are rules for QUOTING ONLY: the real tubesheet, baffle and shell thicknesses come from the
 * code calculation (ASME VIII-1 / PED) of the fabricator's responsible engineer.
 */
import { tubeMaterial } from '../../../shared/thermal/geometry';

const INCH = 0.0254;

/** Round to 0.01 (m, kg, m², h): quantities on a price line are shown and priced at this precision. */
export const round2 = (x: number) => Math.round(x * 100 + 1e-9) / 100;

/** Half up to a whole minor unit (cent); the 1e-9 keeps 12.5 from becoming 12.4999… → 12. */
export const roundMinor = (x: number) => (x < 0 ? -Math.floor(-x + 0.5 + 1e-9) : Math.floor(x + 0.5 + 1e-9));

/** Tubesheet thickness placeholder max(25 mm, 0.08 D_s), rounded up to a whole mm (estimating only). */
export function tubesheetThickness_m(ds: number): number {
  return Math.ceil(Math.max(0.025, 0.08 * ds) * 1000 - 1e-9) / 1000;
}

/**
 * Tubesheet blank diameter: the shell disc plus a ring for the flange/bolting, 1.2 D_s + 0.1 m
 * (a placeholder that roughly follows class-150 flange outside diameters (memory)).
 */
export const tubesheetDiameter_m = (ds: number) => 1.2 * ds + 0.1;

/** Plate disc mass, kg. */
export const discMass = (diameter: number, thickness: number, density: number) =>
  (Math.PI / 4) * diameter * diameter * thickness * density;

/** Shell length between the tubesheets: tube length less the two tubesheets. */
export const shellLength_m = (tubeLength: number, ds: number) => tubeLength - 2 * tubesheetThickness_m(ds);

/* Baffles per shell: bafflesPerShell in design-fields.ts (the design's count, else from its spacings). */

/** Segmental baffle: ~0.8 of the shell disc (a 20–25 % cut, common practice). */
export const BAFFLE_AREA_FRACTION = 0.8;

/** Baffle plate 6 mm up to 0.4 m shell ID, 10 mm above (common practice, estimating only). */
export const baffleThickness_m = (ds: number) => (ds <= 0.4 ? 0.006 : 0.01);

/**
 * Plate grades (estimating rule, not a materials selection): stainless and titanium tubes get
 * tubesheets of their own grade; copper alloys and carbon steel get carbon-steel tubesheets.
 * Baffles follow stainless tubes, titanium tubes get 316 baffles, all others carbon steel.
 */
export function plateGrades(tube: string): { tubesheets: string; baffles: string } {
  if (tube === 'stainless-304' || tube === 'stainless-316') return { tubesheets: tube, baffles: tube };
  if (tube === 'titanium-gr2') return { tubesheets: tube, baffles: 'stainless-316' };
  return { tubesheets: 'carbon-steel', baffles: 'carbon-steel' };
}

/** kg/m³ of a plate grade, from the tube-material catalogue (carbon steel 7850 if unknown). */
export const plateDensity = (grade: string) => tubeMaterial(grade)?.density ?? 7850;

/** Carbon-steel density for shells, kg/m³ (handbook, memory). */
export const SHELL_DENSITY = 7850;

/** Rolled shell mass, kg: π (D_s + t) t L ρ. */
export const rolledShellMass = (ds: number, wall: number, length: number) => Math.PI * (ds + wall) * wall * length * SHELL_DENSITY;

/**
 * Painted outside area, m²: π D_o (L_shell + D_s), the shell plus the two heads taken as half a
 * shell diameter of cylinder each (a placeholder).
 */
export const paintArea_m2 = (ds: number, wall: number, shellLength: number) => Math.PI * (ds + 2 * wall) * (shellLength + ds);

/** Nozzle sizes offered, NPS. */
export const NOZZLE_NPS: readonly number[] = [1, 1.5, 2, 3, 4, 6, 8, 10, 12];

const npsAtLeast = (inch: number) => NOZZLE_NPS.find((n) => n >= inch - 1e-9) ?? NOZZLE_NPS[NOZZLE_NPS.length - 1]!;

/** Without a flow: the smallest NPS at least a quarter of the shell ID (a placeholder rule). */
export const nozzleNpsByShell = (ds: number) => npsAtLeast(ds / INCH / 4);

/**
 * From a volumetric flow, m³/s: the smallest NPS whose nominal bore (NPS × 25.4 mm, an
 * approximation) keeps the nozzle velocity ≤ 3 m/s when the stream moves slower than 5 m/s in the
 * bundle (a liquid), else ≤ 30 m/s (a gas) (common practice).
 */
export function nozzleNpsByFlow(flow_m3_s: number, bundleVelocity: number): number {
  const vMax = bundleVelocity < 5 ? 3 : 30;
  const bore = Math.sqrt((4 * flow_m3_s) / (Math.PI * vMax));
  return npsAtLeast(bore / INCH);
}
