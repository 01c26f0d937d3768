/**
 * Construction clearances of a baffled shell that set the leakage and bypass streams of the
 * Bell–Delaware method: tube-to-baffle hole, shell-to-baffle, bundle-to-shell; and the default
 * number of sealing-strip pairs. All diametral, SI (m).
 *
 * References: Standards of the Tubular Exchanger Manufacturers Association (TEMA), 9th ed., 2007,
 * RCB-4.2 (baffle holes) and RCB-4.3 (cross-baffle clearances) (memory); J. Taborek, "Shell-and-tube
 * heat exchangers: single-phase flow", *Heat Exchanger Design Handbook*, Hemisphere, 1983, §3.3.5
 * (bundle-to-shell clearance by bundle type, figure read from memory).
 */
import { bundleClearance } from '../geometry/shells';

const INCH = 0.0254;

/**
 * Tube-to-baffle-hole diametral clearance, m (TEMA RCB-4.2, memory): the hole is OD + 1/32 in
 * (0.79 mm) where the longest unsupported tube span is ≤ 36 in (914 mm) or the tube is larger than
 * 1¼ in OD; OD + 1/64 in (0.40 mm) for longer spans of smaller tubes.
 * `unsupportedSpan` m: a segmental-baffle tube in the window is held by every second baffle, so
 * the span is about two baffle spacings.
 */
export function tubeToBaffleClearanceTema(dOuter: number, unsupportedSpan: number): number {
  // 36 in, 1¼ in, 1/32 in, 1/64 in: TEMA RCB-4.2 (memory)
  if (unsupportedSpan <= 36 * INCH || dOuter > 1.25 * INCH) return INCH / 32;
  return INCH / 64;
}

/**
 * Shell-to-baffle diametral clearance (shell ID − baffle OD), m, by nominal shell inside diameter
 * (TEMA RCB-4.3 table, memory): 6–17 in: 1/8 in; 18–39 in: 3/16 in; 40–54 in: 1/4 in; 55–69 in:
 * 5/16 in; 70–84 in: 3/8 in; 85–100 in: 7/16 in. Shells below 6 in take the 1/8 in of the first
 * row (our extension). Pipe shells' out-of-roundness tolerance is not added.
 */
export function shellToBaffleClearanceTema(dShell: number): number {
  const inch = dShell / INCH;
  // row limits and clearances in inches: TEMA RCB-4.3 (memory)
  if (inch < 17.5) return INCH / 8;
  if (inch < 39.5) return (3 * INCH) / 16;
  if (inch < 54.5) return INCH / 4;
  if (inch < 69.5) return (5 * INCH) / 16;
  if (inch < 84.5) return (3 * INCH) / 8;
  return (7 * INCH) / 16;
}

export type BundleType = 'fixed' | 'u-tube' | 'floating';

/**
 * Bundle-to-shell diametral clearance D_s − D_otl, m, by bundle type.
 * - fixed tubesheet and U-tube: the clearance our tube layouts are drawn with (`bundleClearance`:
 *   12.7 mm in pipe shells, 15.9 mm in rolled shells, common practice), inside Taborek's band of
 *   about 10–15 mm for these types;
 * - floating head (split-ring, TEMA S): `0.030 m + 0.025 D_s`, a straight-line fit to Taborek's
 *   figure (HEDH §3.3.5, memory): about 35 mm at D_s = 0.2 m to about 68 mm at 1.5 m. A pull-through
 *   head (TEMA T) needs 80–95 mm and more; it is not offered here.
 */
export function bundleToShellClearance(dShell: number, type: BundleType = 'fixed'): number {
  // 0.030, 0.025: fit to Taborek's figure (memory)
  if (type === 'floating') return 0.03 + 0.025 * dShell;
  return bundleClearance(dShell);
}

/**
 * Default sealing-strip pairs (common practice, stated here): none for fixed-tubesheet and U-tube
 * bundles, whose bypass gap is small; for floating-head bundles one pair per 6 tube rows crossed
 * between baffle tips (r_ss ≈ 0.17; Taborek recommends r_ss of about 0.1–0.2), at least one pair.
 * `rowsCrossed` is N_tcc.
 */
export function defaultSealingStripPairs(type: BundleType, rowsCrossed: number): number {
  if (type !== 'floating') return 0;
  // 6 rows per pair: common practice
  return Math.max(1, Math.round(rowsCrossed / 6));
}
