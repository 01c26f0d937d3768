/**
 * Viscosity and thermal conductivity of water from the IAPWS transport releases, given density.
 *
 * Viscosity: IAPWS R12-08, "Release on the IAPWS Formulation 2008 for the Viscosity of Ordinary
 *   Water Substance"; M. L. Huber et al., J. Phys. Chem. Ref. Data 38 (2009) 101–125,
 *   doi:10.1063/1.3088050.  μ = μ₀(T̄) · μ₁(T̄, ρ̄) · μ₂ (Eq. 10); μ₂ = 1 here.
 * Conductivity: IAPWS R15-11, "Release on the IAPWS Formulation 2011 for the Thermal Conductivity
 *   of Ordinary Water Substance"; M. L. Huber et al., J. Phys. Chem. Ref. Data 41 (2012) 033102,
 *   doi:10.1063/1.4738955.  λ = λ₀(T̄) · λ₁(T̄, ρ̄) + λ₂ (Eq. 10); λ₂ = 0 here.
 *
 * The critical enhancements μ₂ and λ₂ are neglected: they matter only near the critical point
 * (374 °C, 322 kg/m³); for liquid water up to 150 °C the tests against IAPWS-95 with the full
 * releases (tests/reference/fixtures/properties.json) bound the effect to well under 0.5 %.
 * Reduced variables: T̄ = T/647.096 K, ρ̄ = ρ/322 kg/m³.
 */

const T_CRIT = 647.096; // K, IAPWS R12-08 Eq. 3
const RHO_CRIT = 322; // kg/m³

// IAPWS R12-08 Table 1 (μ₀) and Table 2 (μ₁: exponents i, j and H_ij).
const H0 = [1.67752, 2.20462, 0.6366564, -0.241605];
const HI = Int32Array.from([0, 1, 2, 3, 0, 1, 2, 3, 5, 0, 1, 2, 3, 4, 0, 1, 0, 3, 4, 3, 5]);
const HJ = Int32Array.from([0, 0, 0, 0, 1, 1, 1, 1, 1, 2, 2, 2, 2, 2, 3, 3, 4, 4, 5, 6, 6]);
const HN = Float64Array.from([
  0.520094, 0.0850895, -1.08374, -0.289555, 0.222531, 0.999115, 1.88797, 1.26613, 0.120573, -0.281378, -0.906851,
  -0.772479, -0.489837, -0.25704, 0.161913, 0.257399, -0.0325372, 0.0698452, 0.00872102, -0.00435673, -0.000593264,
]);

// IAPWS R15-11 Table 1 (λ₀) and Table 2 (λ₁: exponents i, j and L_ij; zero entries left out).
const L0 = [2.443221e-3, 1.323095e-2, 6.770357e-3, -3.454586e-3, 4.096266e-4];
const LI = Int32Array.from([0, 0, 0, 0, 0, 0, 1, 1, 1, 1, 1, 1, 2, 2, 2, 2, 2, 2, 3, 3, 3, 3, 4, 4, 4, 4, 4, 4]);
const LJ = Int32Array.from([0, 1, 2, 3, 4, 5, 0, 1, 2, 3, 4, 5, 0, 1, 2, 3, 4, 5, 0, 1, 2, 3, 0, 1, 2, 3, 4, 5]);
const LN = Float64Array.from([
  1.60397357, -0.646013523, 0.111443906, 0.102997357, -0.0504123634, 0.00609859258, 2.33771842, -2.78843778,
  1.53616167, -0.463045512, 0.0832827019, -0.00719201245, 2.19650529, -4.54580785, 3.55777244, -1.40944978,
  0.275418278, -0.0205938816, -1.21051378, 1.60812989, -0.621178141, 0.0716373224, -2.720337, 4.57586331,
  -3.18369245, 1.1168348, -0.19268305, 0.012913842,
]);

const powT = new Float64Array(6); // (1/T̄ − 1)^i
const powD = new Float64Array(7); // (ρ̄ − 1)^j
// the state the tables hold: viscosity and conductivity are asked at the same (T, ρ) in turn
let filledTr = NaN;
let filledDr = NaN;

function fillPowers(tr: number, dr: number): void {
  if (tr === filledTr && dr === filledDr) return;
  filledTr = tr;
  filledDr = dr;
  const x = 1 / tr - 1;
  const y = dr - 1;
  powT[0] = 1;
  powD[0] = 1;
  for (let i = 1; i < 6; i++) powT[i] = powT[i - 1] * x;
  for (let j = 1; j < 7; j++) powD[j] = powD[j - 1] * y;
}

/** Dilute-gas (zero-density) viscosity of water vapour, Pa·s (IAPWS R12-08 Eq. 11). */
export function waterViscosityDilute(temp_K: number): number {
  const tr = temp_K / T_CRIT;
  const s = H0[0] + H0[1] / tr + H0[2] / (tr * tr) + H0[3] / (tr * tr * tr);
  return (100 * Math.sqrt(tr)) / s * 1e-6;
}

/** Viscosity of water, Pa·s, at temperature (K) and density (kg/m³), without critical enhancement. */
export function waterViscosity(temp_K: number, density: number): number {
  const tr = temp_K / T_CRIT;
  const dr = density / RHO_CRIT;
  fillPowers(tr, dr);
  let sum = 0;
  for (let k = 0; k < 21; k++) sum += HN[k] * powT[HI[k]] * powD[HJ[k]];
  return waterViscosityDilute(temp_K) * Math.exp(dr * sum);
}

/** Dilute-gas thermal conductivity of water vapour, W/(m·K) (IAPWS R15-11 Eq. 16). */
export function waterConductivityDilute(temp_K: number): number {
  const tr = temp_K / T_CRIT;
  const s = L0[0] + L0[1] / tr + L0[2] / (tr * tr) + L0[3] / (tr * tr * tr) + L0[4] / (tr * tr * tr * tr);
  return (Math.sqrt(tr) / s) * 1e-3;
}

/** Thermal conductivity of water, W/(m·K), at temperature (K) and density (kg/m³), λ₂ neglected. */
export function waterConductivity(temp_K: number, density: number): number {
  const tr = temp_K / T_CRIT;
  const dr = density / RHO_CRIT;
  fillPowers(tr, dr);
  let sum = 0;
  for (let k = 0; k < 28; k++) sum += LN[k] * powT[LI[k]] * powD[LJ[k]];
  return waterConductivityDilute(temp_K) * Math.exp(dr * sum);
}
