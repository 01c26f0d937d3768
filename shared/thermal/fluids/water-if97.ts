/**
 * Liquid water, IAPWS-IF97 region 1 (density, isobaric heat capacity) and region 4 (saturation line).
 *
 * Reference: IAPWS, "Revised Release on the IAPWS Industrial Formulation 1997 for the Thermodynamic
 * Properties of Water and Steam" (IAPWS R7-97, 2012); W. Wagner et al., "The IAPWS Industrial
 * Formulation 1997 for the Thermodynamic Properties of Water and Steam", J. Eng. Gas Turbines Power
 * 122 (2000) 150–182, doi:10.1115/1.483186.
 *
 * Region 1 (Eq. 7): γ(π,τ) = g/(RT) = Σ nᵢ (7.1 − π)^Iᵢ (τ − 1.222)^Jᵢ, π = p/16.53 MPa, τ = 1386 K/T;
 *   v = R T π γ_π / p,   cp = −R τ² γ_ττ.   Valid 273.15 K ≤ T ≤ 623.15 K, p_s(T) ≤ p ≤ 100 MPa.
 * Region 4 (Eqs. 30, 31): saturation pressure p_s(T) and temperature T_s(p), 273.15 K … 647.096 K.
 */

/** Specific gas constant of water, kJ/(kg·K) (IF97 Eq. 1). */
const R_KJ = 0.461526;

// Table 2 of IAPWS R7-97: exponents I, J and coefficients n of region 1.
const I1 = Int32Array.from([0, 0, 0, 0, 0, 0, 0, 0, 1, 1, 1, 1, 1, 1, 2, 2, 2, 2, 2, 3, 3, 3, 4, 4, 4, 5, 8, 8, 21, 23, 29, 30, 31, 32]);
const J1 = Int32Array.from([-2, -1, 0, 1, 2, 3, 4, 5, -9, -7, -1, 0, 1, 3, -3, 0, 1, 3, 17, -4, 0, 6, -5, -2, 10, -8, -11, -6, -29, -31, -38, -39, -40, -41]);
const N1 = Float64Array.from([
  0.14632971213167, -0.84548187169114, -3.756360367204, 3.3855169168385, -0.95791963387872, 0.15772038513228,
  -0.016616417199501, 8.1214629983568e-4, 2.8319080123804e-4, -6.0706301565874e-4, -0.018990068218419,
  -0.032529748770505, -0.021841717175414, -5.283835796993e-5, -4.7184321073267e-4, -3.0001780793026e-4,
  4.7661393906987e-5, -4.4141845330846e-6, -7.2694996297594e-16, -3.1679644845054e-5, -2.8270797985312e-6,
  -8.5205128120103e-10, -2.2425281908e-6, -6.5171222895601e-7, -1.4341729937924e-13, -4.0516996860117e-7,
  -1.2734301741641e-9, -1.7424871230634e-10, -6.8762131295531e-19, 1.4478307828521e-20, 2.6335781662795e-23,
  -1.1947622640071e-23, 1.8228094581404e-24, -9.3537087292458e-26,
]);

// Integer-power tables, refilled on every call (no state survives a call): powA[k] = a^k for
// k = 0..32; powB[k + 43] = b^k for k = −43..17 (J − 2 reaches −43).
const powA = new Float64Array(33);
const powB = new Float64Array(61);
const B0 = 43;

/** Density (kg/m³) and isobaric heat capacity (J/(kg·K)) of liquid water, IF97 region 1. */
export function waterRegion1(temp_K: number, pressure_Pa: number): { density: number; specificHeat: number } {
  const pi = pressure_Pa / 16.53e6;
  const tau = 1386 / temp_K;
  const a = 7.1 - pi;
  const b = tau - 1.222;
  // Two interleaved chains (step a², b²) halve the dependency length of the power tables.
  const a2 = a * a;
  powA[0] = 1;
  powA[1] = a;
  for (let k = 2; k < 33; k++) powA[k] = powA[k - 2] * a2;
  const b2 = b * b;
  powB[B0] = 1;
  powB[B0 + 1] = b;
  for (let k = 2; k <= 17; k++) powB[B0 + k] = powB[B0 + k - 2] * b2;
  const ib = 1 / b;
  const ib2 = ib * ib;
  powB[B0 - 1] = ib;
  for (let k = 2; k <= B0; k++) powB[B0 - k] = powB[B0 - k + 2] * ib2;

  let gPi = 0;
  let gTauTau = 0;
  for (let k = 0; k < 34; k++) {
    const i = I1[k];
    const j = J1[k];
    const n = N1[k];
    if (i > 0) gPi -= n * i * powA[i - 1] * powB[B0 + j];
    if (j !== 0 && j !== 1) gTauTau += n * powA[i] * j * (j - 1) * powB[B0 + j - 2];
  }
  // v = R T π γ_π / p with R in J/(kg·K): 1000·R_KJ.
  const specificVolume = (1000 * R_KJ * temp_K * pi * gPi) / pressure_Pa;
  return { density: 1 / specificVolume, specificHeat: -1000 * R_KJ * tau * tau * gTauTau };
}

// Table 34 of IAPWS R7-97: coefficients n1..n10 of the saturation-pressure equation.
const n1 = 0.11670521452767e4;
const n2 = -0.72421316703206e6;
const n3 = -0.17073846940092e2;
const n4 = 0.1202082470247e5;
const n5 = -0.32325550322333e7;
const n6 = 0.1491510861353e2;
const n7 = -0.48232657361591e4;
const n8 = 0.40511340542057e6;
const n9 = -0.23855557567849;
const n10 = 0.65017534844798e3;

/** Lower and upper ends of the saturation line: triple point and critical point (IF97 region 4). */
export const SAT_P_MIN_PA = 611.212677;
export const SAT_P_MAX_PA = 22.064e6;

/** Saturation pressure of water, Pa, for 273.15 K ≤ T ≤ 647.096 K (IF97 Eq. 30). */
export function waterSaturationPressure(temp_K: number): number {
  const th = temp_K + n9 / (temp_K - n10);
  const A = th * th + n1 * th + n2;
  const B = n3 * th * th + n4 * th + n5;
  const C = n6 * th * th + n7 * th + n8;
  const x = (2 * C) / (-B + Math.sqrt(B * B - 4 * A * C));
  return x * x * x * x * 1e6;
}

/** Saturation temperature of water, K, for 611.213 Pa ≤ p ≤ 22.064 MPa (IF97 Eq. 31). */
export function waterSaturationTemperature(pressure_Pa: number): number {
  const beta = Math.sqrt(Math.sqrt(pressure_Pa / 1e6));
  const E = beta * beta + n3 * beta + n6;
  const F = n1 * beta * beta + n4 * beta + n7;
  const G = n2 * beta * beta + n5 * beta + n8;
  const D = (2 * G) / (-F - Math.sqrt(F * F - 4 * E * G));
  return (n10 + D - Math.sqrt((n10 + D) * (n10 + D) - 4 * (n9 + n10 * D))) / 2;
}
