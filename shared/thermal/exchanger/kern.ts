/**
 * Shell-side heat transfer and pressure drop by Kern's method (segmental baffles, 25 % cut).
 *
 * References: D. Q. Kern, *Process Heat Transfer*, McGraw-Hill, New York, 1950, ch. 7
 * (eq. 6.15b for h_o, Fig. 29 for friction); the SI friction fit `f = exp(0.576 − 0.19 ln Re_s)` as
 * given by S. Kakaç, H. Liu and A. Pramuanjaroenkij, *Heat Exchangers: Selection, Rating, and Thermal
 * Design*, 3rd ed., CRC Press, 2012, ch. 8 (memory).
 */

export type PitchFamily = 'triangular' | 'square';

/** Cross-flow area at the shell centre line: `A_s = (p_t − d_o) D_s B / p_t`, m². */
export function shellCrossflowAreaKern(dShell: number, baffleSpacing: number, pitch: number, dOuter: number): number {
  return ((pitch - dOuter) * dShell * baffleSpacing) / pitch;
}

/**
 * Kern's equivalent diameter, m: square pitch `d_e = 4(p_t² − π d_o²/4)/(π d_o)`; triangular pitch
 * `d_e = 4(√3 p_t²/4 − π d_o²/8)/(π d_o/2)`.
 */
export function equivalentDiameterKern(pitch: number, dOuter: number, family: PitchFamily): number {
  if (family === 'square') return (4 * (pitch * pitch - (Math.PI * dOuter * dOuter) / 4)) / (Math.PI * dOuter);
  return (4 * ((Math.sqrt(3) * pitch * pitch) / 4 - (Math.PI * dOuter * dOuter) / 8)) / ((Math.PI * dOuter) / 2);
}

/**
 * Kern's shell-side Nusselt number on `d_e`: `Nu = 0.36 Re_s^0.55 Pr^(1/3) (μ/μ_w)^0.14`,
 * `Re_s = G_s d_e / μ`. Valid for `2·10³ < Re_s < 10⁶`, 25 % baffle cut.
 */
export function nusseltShellKern(re: number, pr: number, muRatio: number): number {
  // 0.36, 0.55: Kern 1950, eq. 6.15b
  return 0.36 * Math.pow(re, 0.55) * Math.cbrt(pr) * Math.pow(muRatio, 0.14);
}

/** Kern's shell-side friction factor (SI fit): `f = exp(0.576 − 0.19 ln Re_s)`, `400 < Re_s ≤ 10⁶`. */
export function frictionShellKern(re: number): number {
  // 0.576, 0.19: fit of Kern's Fig. 29, Kakaç, Liu & Pramuanjaroenkij 2012 (memory)
  return Math.exp(0.576 - 0.19 * Math.log(re));
}

/**
 * Shell-side frictional pressure drop, Pa: `ΔP_s = f G_s² (N_b + 1) D_s / (2 ρ d_e (μ/μ_w)^0.14)`.
 * `massVelocity` G_s in kg/(m²·s), `baffles` N_b.
 */
export function pressureDropShellKern(
  f: number,
  massVelocity: number,
  baffles: number,
  dShell: number,
  density: number,
  dEquivalent: number,
  muRatio: number,
): number {
  return (f * massVelocity * massVelocity * (baffles + 1) * dShell) / (2 * density * dEquivalent * Math.pow(muRatio, 0.14));
}
