/**
 * Outlet-temperature uncertainty of a rating (issue 11, margin and uncertainty policy): the band on
 * the process outlet that follows from the stated accuracy of the film correlations that ran.
 *
 * Method (stated on every rating as `outletUncertainty_K`):
 * 1. Each film coefficient carries its correlation's stated relative accuracy e (tables below).
 * 2. The overall coefficient's relative uncertainty is the root sum of squares of each film's
 *    accuracy weighted by its share of the total resistance (independent errors):
 *    `δU/U = √((e_t · U d_o/(d_i h_i))² + (e_s · U/h_o)²)`; wall and fouling resistances are taken
 *    as exact (fouling is a stated design allowance, not a prediction).
 * 3. The exchanger is re-evaluated with U at its low and high ends, `NTU·(1 ∓ δU/U)`, through the
 *    arrangement's own effectiveness relation (shells in series of 1-n passes, or the wall's
 *    `1 − exp(−NTU)`); the outlet moves as `T_out' = T_in − (ε'/ε)(T_in − T_out)`.
 * 4. The band is the larger of the two excursions, K (the low-U end is the larger one).
 */
import type { RateResult } from '../../schemas/thermal';
import { effectivenessShellsInSeries } from './effectiveness';

/**
 * Stated relative accuracy of each tube-side Nusselt method (method-table labels,
 * correlations/methods.ts), as a fraction.
 * - gnielinski 0.10: Gnielinski, Int. Chem. Eng. 16 (1976) 359–368, about ±10 % against most data
 *   (the doc comment in correlations/turbulent.ts).
 * - dittus-boelter 0.25 and sieder-tate-turbulent 0.25: "errors as large as 25 %" for the power-law
 *   forms (Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, 6th ed., 2007, §8.5; memory).
 * - laminar-fully-developed 0.10: the exact Graetz limits (Shah & London 1978) hold for constant
 *   properties; the 10 % covers property variation and the mixed wall condition (common practice).
 * - hausen 0.15 and sieder-tate-laminar 0.20: the entry-length fits scatter about ±15 % and ±20 %
 *   about their data (Shah & London 1978, ch. V; memory).
 * - gnielinski-transition 0.30: the transition band 2300 < Re < 10⁴ is the least certain region of
 *   tube-side convection (Gnielinski 1995's interpolation; memory, wider than either end).
 */
export const TUBE_METHOD_ACCURACY: Record<string, number> = {
  gnielinski: 0.1,
  'dittus-boelter': 0.25,
  'sieder-tate-turbulent': 0.25,
  'laminar-fully-developed': 0.1,
  hausen: 0.15,
  'sieder-tate-laminar': 0.2,
  'gnielinski-transition': 0.3,
};

/** 0.25: accuracy for a tube-side method missing from the table (the widest turbulent one). */
export const UNKNOWN_METHOD_ACCURACY = 0.25;

/**
 * Stated relative accuracy of the shell-side film coefficient by method:
 * - bell-delaware 0.20: Taborek's review in the Heat Exchanger Design Handbook (1983, §3.3.2) puts
 *   the method's h within about ±20 % of the data for well-built bundles (memory; ΔP is looser).
 * - kern 0.30: Kern 1950 is a single ideal-crossflow curve with no leakage or bypass corrections;
 *   about ±30 % against test data (memory; commonly quoted, often conservative).
 */
export const SHELL_METHOD_ACCURACY: Record<string, number> = { 'bell-delaware': 0.2, kern: 0.3 };

export function tubeAccuracy(label: string): number {
  return TUBE_METHOD_ACCURACY[label] ?? UNKNOWN_METHOD_ACCURACY;
}

/** `δU/U` from the films' accuracies and their resistance shares (step 2 above). */
export function overallRelativeUncertainty(r: Pick<RateResult, 'correlation' | 'htc_W_m2K' | 'overallU_W_m2K' | 'shellHtc_W_m2K' | 'shellMethod'>, dOuter: number, dInner: number): number {
  const et = tubeAccuracy(r.correlation);
  if (r.overallU_W_m2K === undefined || r.shellHtc_W_m2K === undefined) return et; // wall boundary: U is the tube film
  const u = r.overallU_W_m2K;
  const shareT = (u * dOuter) / (dInner * r.htc_W_m2K);
  const shareS = u / r.shellHtc_W_m2K;
  const es = SHELL_METHOD_ACCURACY[r.shellMethod ?? 'bell-delaware'] ?? SHELL_METHOD_ACCURACY['bell-delaware']!;
  return Math.hypot(et * shareT, es * shareS);
}

/**
 * Band on the process outlet of a coolant-boundary rating, K (steps 3–4). `tIn` the process inlet,
 * `cr` the capacity ratio, `ntu` the total NTU of the rating, `passes` and `shells` its arrangement.
 */
export function outletBandCoolant(tIn: number, tOut: number, ntu: number, cr: number, passes: number, shells: number, relU: number): number {
  const e0 = effectivenessShellsInSeries(ntu, cr, passes, shells);
  if (!(e0 > 0)) return 0;
  const at = (k: number) => tIn - (effectivenessShellsInSeries(ntu * k, cr, passes, shells) / e0) * (tIn - tOut);
  return Math.max(Math.abs(at(1 - relU) - tOut), Math.abs(at(1 + relU) - tOut));
}

/** Band on the outlet of a wall-boundary rating, K: `T_out = T_w + (T_in − T_w) exp(−NTU)`. */
export function outletBandWall(tIn: number, wallTemp: number, ntu: number, relU: number): number {
  const at = (k: number) => wallTemp + (tIn - wallTemp) * Math.exp(-ntu * k);
  const t0 = at(1);
  return Math.max(Math.abs(at(1 - relU) - t0), Math.abs(at(1 + relU) - t0));
}
