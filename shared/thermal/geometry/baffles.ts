/**
 * Segmental baffles: the spacing window the search and the editor may use, the end spacings the
 * shell nozzles need, and the baffle count of one shell.
 */
import { tubeMaterial } from './materials';

/** 50.8 mm (2 in): TEMA RCB-4.51 minimum baffle spacing, with 1/5 of the shell ID (memory). */
export const MIN_BAFFLE_SPACING_M = 0.0508;
export const MIN_BAFFLE_SPACING_FRACTION = 0.2;

/**
 * Maximum unsupported straight tube span, inches, by tube OD (inches), TEMA RCB-4.52 table
 * (*Standards of the Tubular Exchanger Manufacturers Association*, 10th ed., 2019, memory; confirm
 * against the edition in force). Group A: carbon and low-alloy steel, high-alloy (stainless) steel,
 * nickel alloys; group B: aluminium, copper and copper alloys, titanium, zirconium.
 * [OD in, group A in, group B in]
 */
export const TEMA_MAX_UNSUPPORTED_SPAN_IN: readonly [number, number, number][] = [
  [0.25, 26, 22], [0.375, 35, 30], [0.5, 44, 38], [0.625, 52, 45], [0.75, 60, 52], [0.875, 69, 60],
  [1, 74, 64], [1.25, 88, 76], [1.5, 100, 87], [2, 125, 110],
];

/** TEMA material group of a tube material: B for copper alloys and titanium, A otherwise. */
export function temaMaterialGroup(materialId: string): 'A' | 'B' {
  const m = tubeMaterial(materialId);
  return m?.copperAlloy || materialId.startsWith('titanium') ? 'B' : 'A';
}

/** Maximum unsupported span, m, interpolated linearly in OD between the table's rows (ends held). */
export function maxUnsupportedSpan(tubeOuterDiameter_m: number, materialId: string): number {
  const t = TEMA_MAX_UNSUPPORTED_SPAN_IN;
  const col = temaMaterialGroup(materialId) === 'A' ? 1 : 2;
  const od = tubeOuterDiameter_m / 0.0254;
  if (od <= t[0]![0]) return t[0]![col]! * 0.0254;
  for (let i = 1; i < t.length; i++) {
    const [a, b] = [t[i - 1]!, t[i]!];
    if (od <= b[0]) return (a[col]! + ((od - a[0]) / (b[0] - a[0])) * (b[col]! - a[col]!)) * 0.0254;
  }
  return t[t.length - 1]![col]! * 0.0254;
}

/**
 * Central baffle spacing window, m: from max(0.2 D_s, 50.8 mm) (TEMA, memory) to the smaller of the
 * maximum unsupported span (TEMA RCB-4.52, memory) and D_s (common practice: wider spacing leaves
 * the flow mostly longitudinal and the crossflow correlations do not hold).
 */
export function baffleSpacingWindow(dShell: number, tubeOuterDiameter_m: number, materialId: string): { min: number; max: number } {
  const min = Math.max(MIN_BAFFLE_SPACING_FRACTION * dShell, MIN_BAFFLE_SPACING_M);
  const max = Math.max(min, Math.min(dShell, maxUnsupportedSpan(tubeOuterDiameter_m, materialId)));
  return { min, max };
}

/** Baffle cuts the search tries, fraction of D_s: 20–35 % for liquids (domain brief 2.8, common practice). */
export const SEARCH_BAFFLE_CUTS = [0.2, 0.25, 0.3, 0.35] as const;
/** 0.25: the cut a rating uses when none is given, and the one old stored designs were rated with. */
export const DEFAULT_BAFFLE_CUT = 0.25;

/**
 * Central spacings the search tries: `levels` values spread geometrically over the window
 * (the shell-side coefficient goes about as B^−0.6, so equal ratios give equal steps in h).
 */
export function searchBaffleSpacings(w: { min: number; max: number }, levels = 4): number[] {
  if (w.max <= w.min * 1.01) return [w.min];
  const r = Math.pow(w.max / w.min, 1 / (levels - 1));
  return Array.from({ length: levels }, (_, i) => Math.round(w.min * Math.pow(r, i) * 1e4) / 1e4);
}

/** Old default kept for stored designs without a spacing: 0.4 D_s, at least 50.8 mm (common practice). */
export function legacyBaffleSpacing(dShell: number, tubeLength: number): number {
  return Math.min(tubeLength, Math.max(0.4 * dShell, MIN_BAFFLE_SPACING_M));
}

/**
 * Shell nozzle bore estimated from the shell, m: about 0.3 D_s, at least 50 mm (common practice for
 * a first layout; the nozzle check by ρv² sizes the real one).
 */
export function shellNozzleBore(dShell: number): number {
  return Math.max(0.05, 0.3 * dShell);
}

/**
 * End spacing the shell nozzle needs, m: the nozzle bore plus 100 mm for the nozzle's reinforcement
 * and the weld clear of the tubesheet (common practice), never below the central spacing.
 */
export function nozzleEndSpacing(dShell: number, central: number): number {
  return Math.max(central, shellNozzleBore(dShell) + 0.1);
}

export interface BafflePlan {
  central: number;
  inlet: number;
  outlet: number;
  /** baffles in one shell */
  count: number;
}

/**
 * Baffles of one shell of tube length `length`: as many central spaces as fit between the end
 * spacings the nozzles need; the remainder widens both end spaces equally (so the spaces add up to
 * the tube length). At least one baffle.
 */
export function bafflePlan(length: number, central: number, dShell: number, inlet?: number, outlet?: number): BafflePlan {
  const li = inlet ?? nozzleEndSpacing(dShell, central);
  const lo = outlet ?? nozzleEndSpacing(dShell, central);
  const inner = length - li - lo;
  const count = inner >= 0 ? Math.floor(inner / central + 1e-9) + 1 : 1;
  if (inlet !== undefined && outlet !== undefined) return { central, inlet, outlet, count };
  const ends = Math.max(0, length - (count - 1) * central);
  if (inlet !== undefined) return { central, inlet, outlet: Math.max(ends - inlet, 1e-3), count };
  if (outlet !== undefined) return { central, inlet: Math.max(ends - outlet, 1e-3), outlet, count };
  return { central, inlet: ends / 2, outlet: ends / 2, count };
}
