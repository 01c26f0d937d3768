/**
 * Effectiveness–NTU relations for one shell pass, and the LMTD correction factor F.
 *
 * References: W. M. Kays and A. L. London, *Compact Heat Exchangers*, 3rd ed., McGraw-Hill, 1984,
 * ch. 2 (closed forms and tables); R. A. Bowman, A. C. Mueller and W. M. Nagle, "Mean temperature
 * difference in design", Transactions of the ASME 62, pp. 283–294, 1940.
 */

/** `Cr` below this is treated as 0 (one stream at constant temperature), above 1 − this as 1. */
const CR_EPS = 1e-9;

/**
 * Counterflow: `ε = (1 − e^{−NTU(1−Cr)}) / (1 − Cr e^{−NTU(1−Cr)})`, `ε = NTU/(1+NTU)` at `Cr = 1`.
 * `ntu = UA/C_min`, `cr = C_min/C_max` (0 ≤ Cr ≤ 1).
 */
export function effectivenessCounterflow(ntu: number, cr: number): number {
  if (ntu <= 0) return 0;
  if (cr < CR_EPS) return -Math.expm1(-ntu);
  if (cr > 1 - CR_EPS) return ntu / (1 + ntu);
  const e = Math.exp(-ntu * (1 - cr));
  return (1 - e) / (1 - cr * e);
}

/** Inverse of `effectivenessCounterflow`: the NTU giving `eff`; `Infinity` when `eff ≥ 1`. */
export function ntuCounterflow(eff: number, cr: number): number {
  if (eff <= 0) return 0;
  if (eff >= 1) return Infinity;
  if (cr < CR_EPS) return -Math.log1p(-eff);
  if (cr > 1 - CR_EPS) return eff / (1 - eff);
  return Math.log((1 - eff * cr) / (1 - eff)) / (1 - cr);
}

/**
 * One shell pass, any even number of tube passes (the 1–2 formula):
 * `ε = 2 / (1 + Cr + √(1+Cr²) (1 + e^{−NTU√(1+Cr²)}) / (1 − e^{−NTU√(1+Cr²)}))`.
 */
export function effectivenessShell12(ntu: number, cr: number): number {
  if (ntu <= 0) return 0;
  const s = Math.sqrt(1 + cr * cr);
  const e = Math.exp(-ntu * s);
  return 2 / (1 + cr + (s * (1 + e)) / (1 - e));
}

/** The largest effectiveness a 1–2 exchanger reaches (NTU → ∞): `2 / (1 + Cr + √(1+Cr²))`. */
export function maxEffectivenessShell12(cr: number): number {
  return 2 / (1 + cr + Math.sqrt(1 + cr * cr));
}

/** Inverse of `effectivenessShell12`; `Infinity` when `eff` is at or beyond the 1–2 maximum. */
export function ntuShell12(eff: number, cr: number): number {
  if (eff <= 0) return 0;
  const s = Math.sqrt(1 + cr * cr);
  const big = (2 / eff - 1 - cr) / s;
  if (big <= 1) return Infinity;
  return Math.log((big + 1) / (big - 1)) / s;
}

/** ε for 1 tube pass (counterflow) or an even number of passes (1–2). */
export function effectiveness(ntu: number, cr: number, tubePasses: number): number {
  return tubePasses === 1 ? effectivenessCounterflow(ntu, cr) : effectivenessShell12(ntu, cr);
}

export function ntuFromEffectiveness(eff: number, cr: number, tubePasses: number): number {
  return tubePasses === 1 ? ntuCounterflow(eff, cr) : ntuShell12(eff, cr);
}

/**
 * LMTD correction factor from the NTU relations: `F = NTU_counterflow(ε, Cr) / NTU`, which is the
 * same number as Bowman, Mueller & Nagle's chart value for that ε and Cr. 1 for counterflow.
 */
export function lmtdCorrectionFactor(ntu: number, cr: number, tubePasses: number): number {
  if (tubePasses === 1 || ntu <= 0) return 1;
  return ntuCounterflow(effectivenessShell12(ntu, cr), cr) / ntu;
}

/**
 * Bowman, Mueller & Nagle (1940) closed form of F for one shell pass and 2, 4, … tube passes, in
 * terms of the tube-side temperature effectiveness `p` and the capacity ratio `r = C_tube/C_shell`:
 * `F = √(R²+1)/(R−1) · ln[(1−P)/(1−PR)] / ln{[2 − P(R+1−√(R²+1))] / [2 − P(R+1+√(R²+1))]}`
 * (limit form at `R = 1`). `NaN`-free: returns 0 where no 1–2 exchanger reaches `p`.
 */
export function lmtdCorrectionBowman(p: number, r: number): number {
  const s = Math.sqrt(r * r + 1);
  const den = (2 - p * (r + 1 - s)) / (2 - p * (r + 1 + s));
  if (!(den > 1)) return 0;
  if (Math.abs(r - 1) < 1e-9) return ((p * Math.SQRT2) / (1 - p)) / Math.log(den);
  const num = Math.log((1 - p) / (1 - p * r));
  return ((s / (r - 1)) * num) / Math.log(den);
}

/**
 * N identical shells in series, counter-current between shells (each shell 1-2, or counterflow 1-1
 * when `tubePasses` is 1). `ntu` is the total UA/C_min of all shells; each shell has `ntu/N` and
 * the per-shell ε₁ from `effectiveness`. Overall (Kays & London 1984, ch. 2; Bowman, Mueller &
 * Nagle 1940): `X = ((1 − ε₁ Cr)/(1 − ε₁))^N`, `ε = (X − 1)/(X − Cr)`; at `Cr = 1`:
 * `ε = N ε₁/(1 + (N − 1) ε₁)`. N = 1 is the one-shell relation.
 */
export function effectivenessShellsInSeries(ntu: number, cr: number, tubePasses: number, shells: number): number {
  const n = Math.max(1, Math.round(shells));
  const e1 = effectiveness(ntu / n, cr, tubePasses);
  if (n === 1) return e1;
  if (cr > 1 - CR_EPS) return (n * e1) / (1 + (n - 1) * e1);
  if (e1 >= 1) return 1;
  const x = Math.pow((1 - e1 * cr) / (1 - e1), n);
  return (x - 1) / (x - cr);
}

/**
 * Inverse of `effectivenessShellsInSeries`: the total NTU of N shells giving `eff`; `Infinity` when
 * no number of transfer units reaches it (ε ≥ 1, or the per-shell ε₁ beyond the 1–2 maximum).
 * Per shell: `Y = ((1 − ε Cr)/(1 − ε))^{1/N}`, `ε₁ = (Y − 1)/(Y − Cr)`; at `Cr = 1`
 * `ε₁ = ε/(N − (N − 1) ε)`; then `NTU = N · NTU₁(ε₁)`.
 */
export function ntuShellsInSeries(eff: number, cr: number, tubePasses: number, shells: number): number {
  const n = Math.max(1, Math.round(shells));
  if (eff <= 0) return 0;
  if (eff >= 1) return Infinity;
  let e1: number;
  if (n === 1) e1 = eff;
  else if (cr > 1 - CR_EPS) e1 = eff / (n - (n - 1) * eff);
  else {
    const y = Math.pow((1 - eff * cr) / (1 - eff), 1 / n);
    e1 = (y - 1) / (y - cr);
  }
  return n * ntuFromEffectiveness(e1, cr, tubePasses);
}

/**
 * LMTD correction factor of N shells in series: `F = NTU_counterflow(ε, Cr)/NTU`, ε the overall
 * effectiveness of `effectivenessShellsInSeries` (Bowman, Mueller & Nagle 1940 chart values for
 * 2, 3, … shell passes). 1 for counterflow shells (`tubePasses` 1); N = 1 equals `lmtdCorrectionFactor`.
 */
export function lmtdCorrectionFactorShells(ntu: number, cr: number, tubePasses: number, shells: number): number {
  if (tubePasses === 1 || ntu <= 0) return 1;
  return ntuCounterflow(effectivenessShellsInSeries(ntu, cr, tubePasses, shells), cr) / ntu;
}
