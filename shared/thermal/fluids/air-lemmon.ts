/**
 * Dry air as a pseudo-pure fluid after Lemmon et al., evaluated cheaply for gas states.
 *
 * Equation of state: E. W. Lemmon, R. T Jacobsen, S. G. Penoncello, D. G. Friend, "Thermodynamic
 *   Properties of Air and Mixtures of Nitrogen, Argon, and Oxygen From 60 to 2000 K at Pressures to
 *   2000 MPa", J. Phys. Chem. Ref. Data 29 (2000) 331–385, doi:10.1063/1.1285884.
 *   α = α⁰(τ, δ) + αʳ(τ, δ), τ = 132.6312 K/T, δ = ρ/(10.4477 mol/dm³ · M).
 *   The ideal part α⁰ is used in full (Eq. 23, N₁…N₁₃). The residual part αʳ (Eq. 24) is expanded in
 *   powers of δ up to δ³ (the 2nd, 3rd and 4th virial coefficients); its terms in δ⁴ and above are
 *   dropped. At 25 bar δ ≤ 0.12, where the dropped terms change cp and ρ by well under 0.1 %; the
 *   tests against the full equation (python3-iapws) bound the error over −20…300 °C, 1–25 bar.
 *   cp/R = −τ²(α⁰_ττ + αʳ_ττ) + (1 + δαʳ_δ − δτ αʳ_δτ)² / (1 + 2δαʳ_δ + δ²αʳ_δδ);
 *   p = ρ R T (1 + δαʳ_δ), solved for ρ by Newton's method (the real-gas density, not ideal gas).
 * Transport: E. W. Lemmon, R. T Jacobsen, "Viscosity and Thermal Conductivity Equations for
 *   Nitrogen, Oxygen, Argon, and Air", Int. J. Thermophys. 25 (2004) 21–69,
 *   doi:10.1023/B:IJOT.0000022327.04529.f3.  η = η⁰(T) + ηʳ(τ, δ) (Eq. 1);
 *   λ = λ⁰(T) + λʳ(τ, δ) + λᶜ (Eq. 4), the critical enhancement λᶜ neglected (air's critical
 *   point is −140.5 °C, far below the range here).
 */

const M = 28.9586; // g/mol, Lemmon 2000 Table 1
const R = 8314.51 / M; // J/(kg·K): 8.31451 J/(mol·K), Lemmon 2000
const T_RED = 132.6312; // K, maxcondentherm-based reducing temperature
const RHO_RED = 10.4477 * M; // kg/m³

// Lemmon 2000 Table 12, ideal part: N₁…N₅ τ^(i−4) and N₆ τ^1.5 (N₄, N₅ do not enter cp).
const N_POW = [0.6057194e-7, -0.210274769e-4, -0.158860716e-3, -0.19536342e-3]; // τ^−3, τ^−2, τ^−1, τ^1.5
const N7 = 2.490888032; // ln τ
const N8 = 0.791309509; // ln(1 − e^(−N11 τ))
const N9 = 0.212236768; // ln(1 − e^(−N12 τ))
const N10 = -0.197938904; // ln(2/3 + e^(N13 τ))
const N11 = 25.36365;
const N12 = 16.90741;
const N13 = 87.31279;

// Lemmon 2000 Table 13, residual part, expanded in δ: term a·τ^t·δ^n. The exponential terms
// N δ^d τ^t exp(−δ^l) contribute through exp(−x) = 1 − x + x²/2: e.g. N δ τ^1.6 e^(−δ)
// gives N τ^1.6 (δ − δ² + δ³/2).
const A = [
  // δ¹
  0.118160747229, 0.713116392079, -1.61824192067, -0.101365037912, -0.146629609713, 0.0148287891978,
  // δ²
  0.0714140178971, 0.101365037912,
  // δ³
  -0.0865421396646, 0.134211176704, -0.101365037912 / 2, -0.17381369097, 0.146629609713, -0.0316055879821,
  -0.00938782884667,
];
const T = [0, 0.33, 1.01, 1.6, 3.6, 3.5, 0, 1.6, 0, 0.15, 1.6, 0.8, 3.6, 6, 15];
const D = [1, 1, 1, 1, 1, 1, 2, 2, 3, 3, 3, 3, 3, 3, 3];

/** Ideal-gas isobaric heat capacity of dry air, J/(kg·K). */
export function airIdealCp(temp_K: number): number {
  const tau = T_RED / temp_K;
  const it = 1 / tau;
  // −τ²α⁰_ττ term by term; the power terms are p(p − 1) Nₚ τ^p for p = −3, −2, −1, 1.5
  let cv = N7;
  cv -= 12 * N_POW[0] * it * it * it + 6 * N_POW[1] * it * it + 2 * N_POW[2] * it + 0.75 * N_POW[3] * tau * Math.sqrt(tau);
  const x8 = N11 * tau;
  const e8 = Math.exp(-x8);
  const x9 = N12 * tau;
  const e9 = Math.exp(-x9);
  const e10 = Math.exp(-N13 * tau);
  cv += (N8 * x8 * x8 * e8) / ((1 - e8) * (1 - e8)) + (N9 * x9 * x9 * e9) / ((1 - e9) * (1 - e9));
  cv -= (N10 * N13 * N13 * tau * tau * (2 / 3) * e10) / ((1 + (2 / 3) * e10) * (1 + (2 / 3) * e10));
  return R * (cv + 1);
}

/** Real-gas density (kg/m³) and isobaric heat capacity (J/(kg·K)) of dry air. */
export function airState(temp_K: number, pressure_Pa: number): { density: number; specificHeat: number } {
  const lnTau = Math.log(T_RED / temp_K);
  // Per power n of δ: s = Σ a τ^t, st = Σ t a τ^t, stt = Σ t(t−1) a τ^t.
  let s1 = 0, s2 = 0, s3 = 0, st1 = 0, st2 = 0, st3 = 0, stt1 = 0, stt2 = 0, stt3 = 0;
  for (let k = 0; k < 15; k++) {
    const t = T[k];
    const v = t === 0 ? A[k] : A[k] * Math.exp(t * lnTau); // τ^t without Math.pow (3× slower)
    if (D[k] === 1) {
      s1 += v; st1 += t * v; stt1 += t * (t - 1) * v;
    } else if (D[k] === 2) {
      s2 += v; st2 += t * v; stt2 += t * (t - 1) * v;
    } else {
      s3 += v; st3 += t * v; stt3 += t * (t - 1) * v;
    }
  }
  // Solve δ(1 + δαʳ_δ) = δ₀ (the ideal-gas δ) by Newton; converges in 2–3 steps below 50 bar.
  const d0 = pressure_Pa / (R * temp_K * RHO_RED);
  let d = d0;
  for (let it = 0; it < 4; it++) {
    const f = d * (1 + s1 * d + 2 * s2 * d * d + 3 * s3 * d * d * d) - d0;
    const df = 1 + 2 * s1 * d + 6 * s2 * d * d + 12 * s3 * d * d * d;
    d -= f / df;
  }
  const d2 = d * d;
  const d3 = d2 * d;
  const dAd = s1 * d + 2 * s2 * d2 + 3 * s3 * d3; // δαʳ_δ
  const d2Add = 2 * s2 * d2 + 6 * s3 * d3; // δ²αʳ_δδ
  const dtAdt = st1 * d + 2 * st2 * d2 + 3 * st3 * d3; // δτ αʳ_δτ
  const t2Att = stt1 * d + stt2 * d2 + stt3 * d3; // τ²αʳ_ττ
  const cvIdeal = airIdealCp(temp_K) / R - 1;
  const num = 1 + dAd - dtAdt;
  const cp = cvIdeal - t2Att + (num * num) / (1 + 2 * dAd + d2Add);
  return { density: d * RHO_RED, specificHeat: cp * R };
}

// Lemmon & Jacobsen 2004, Table I (air): ε/k = 103.3 K, σ = 0.360 nm, collision-integral bᵢ.
const EPS_K = 103.3;
const SIGMA = 0.36;
const OMEGA_B = [0.431, -0.4623, 0.08406, 0.005341, -0.00331];

/** Dilute-gas viscosity of air, µPa·s (Lemmon & Jacobsen 2004 Eq. 2). */
function eta0(temp_K: number): number {
  const x = Math.log(temp_K / EPS_K);
  const lnOmega = OMEGA_B[0] + x * (OMEGA_B[1] + x * (OMEGA_B[2] + x * (OMEGA_B[3] + x * OMEGA_B[4])));
  return (0.0266958 * Math.sqrt(M * temp_K)) / (SIGMA * SIGMA * Math.exp(lnOmega));
}

/** Viscosity of air, Pa·s, at temperature (K) and density (kg/m³) (Lemmon & Jacobsen 2004 Eqs. 1–3). */
export function airViscosity(temp_K: number, density: number): number {
  const tau = T_RED / temp_K;
  const d = density / RHO_RED;
  const d4 = d * d * d * d;
  const ed = Math.exp(-d);
  // Table III (air): Nᵢ τ^tᵢ δ^dᵢ exp(−γᵢ δ^lᵢ)
  const t05 = Math.exp(0.05 * Math.log(tau)); // τ^0.05; the other exponents are multiples of it
  const t02 = t05 * t05 * t05 * t05;
  const t06 = t02 * t02 * t02;
  const t24 = t06 * t06 * t06 * t06;
  const etaR =
    10.72 * t02 * d +
    1.122 * t05 * d4 +
    0.002019 * t24 * d4 * d4 * d +
    -8.876 * t06 * d * ed +
    -0.02916 * t24 * t06 * t06 * d4 * d4 * ed;
  return (eta0(temp_K) + etaR) * 1e-6;
}

/** Thermal conductivity of air, W/(m·K), λᶜ neglected (Lemmon & Jacobsen 2004 Eqs. 4–6). */
export function airConductivity(temp_K: number, density: number): number {
  const tau = T_RED / temp_K;
  const d = density / RHO_RED;
  // Table IV (air): λ⁰ = N₁ η⁰ + N₂ τ^t₂ + N₃ τ^t₃, mW/(m·K)
  const t01 = Math.exp(0.1 * Math.log(tau)); // τ^0.1; the other exponents are multiples of it
  const t03 = t01 * t01 * t01;
  const t05 = Math.sqrt(tau);
  const t13 = tau * t03;
  const lambda0 = 1.308 * eta0(temp_K) + 1.405 / (tau * t01) - 1.036 / t03;
  const d2 = d * d;
  const d3 = d2 * d;
  const d7 = d3 * d3 * d;
  const e = Math.exp(-d2);
  const lambdaR =
    8.743 * t01 * d +
    14.76 * d2 +
    -16.62 * t05 * d3 * e +
    3.793 * tau * tau * t05 * t01 * t01 * d7 * e +
    -6.142 * t03 * d7 * e +
    -0.3778 * t13 * d7 * d3 * d * e;
  return (lambda0 + lambdaR) * 1e-3;
}
