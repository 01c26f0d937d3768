/**
 * Melinder's polynomial fits for aqueous secondary coolants.
 *
 * Reference: Å. Melinder, "Properties of Secondary Working Fluids for Indirect Systems", 2nd ed.,
 * International Institute of Refrigeration (IIR), Paris, 2010. Each property is
 *   f(x, t) = Σᵢ Σⱼ cᵢⱼ (x − x_m)ⁱ (t − t_m)ʲ,  i = 0…5, j = 0…3, i + j ≤ 5 (18 coefficients),
 * with x the additive mass fraction in percent, t in °C, (x_m, t_m) the fit's centre. Viscosity is
 * fitted as ln(μ / mPa·s). The freezing point is a polynomial in (x − x_m) alone. Fit range: additive
 * 0–60 %, from the freezing point to about 100 °C.
 * The coefficient tables below were transcribed from the book's tables as reproduced in the
 * open-source SecondaryCoolantProps package (NREL, github.com/NREL/SecondaryCoolantProps).
 */

/** Coefficient rows i = 0…5, row i holding cᵢ₀…cᵢ,(min(3, 5−i)). */
export type MelinderMatrix = readonly (readonly number[])[];

export interface MelinderFluidData {
  /** x_m, mass percent */
  xm: number;
  /** t_m, °C */
  tm: number;
  /** freezing point: c₀…c₅ of Σ cᵢ (x − x_m)ⁱ, °C */
  freezing: readonly number[];
  density: MelinderMatrix; // kg/m³
  specificHeat: MelinderMatrix; // J/(kg·K)
  conductivity: MelinderMatrix; // W/(m·K)
  lnViscosity: MelinderMatrix; // ln(mPa·s)
}

/** Evaluates one fitted property at additive mass percent `x` and temperature `t` (°C). */
export function melinderEval(c: MelinderMatrix, xm: number, tm: number, x: number, t: number): number {
  const dx = x - xm;
  const dt = t - tm;
  let sum = 0;
  let xi = 1;
  for (let i = 0; i < c.length; i++) {
    const row = c[i];
    let acc = 0;
    for (let j = row.length - 1; j >= 0; j--) acc = acc * dt + row[j];
    sum += acc * xi;
    xi *= dx;
  }
  return sum;
}

/** Freezing point (°C) of the mixture with `x` mass percent additive. */
export function melinderFreezingPoint(d: MelinderFluidData, x: number): number {
  const dx = x - d.xm;
  let sum = 0;
  for (let i = d.freezing.length - 1; i >= 0; i--) sum = sum * dx + d.freezing[i];
  return sum;
}

/** All four properties in SI at mass percent `x` and `t` °C. */
export function melinderProperties(d: MelinderFluidData, x: number, t: number) {
  return {
    density: melinderEval(d.density, d.xm, d.tm, x, t),
    specificHeat: melinderEval(d.specificHeat, d.xm, d.tm, x, t),
    viscosity: Math.exp(melinderEval(d.lnViscosity, d.xm, d.tm, x, t)) * 1e-3,
    conductivity: melinderEval(d.conductivity, d.xm, d.tm, x, t),
  };
}

/** Ethylene glycol–water, Melinder 2010 (centre x_m = 30.8462 %, t_m = 31.728 °C). */
export const ETHYLENE_GLYCOL: MelinderFluidData = {
  xm: 30.8462,
  tm: 31.728,
  freezing: [-15.25, -0.808, -1.334e-2, -7.293e-5, 1.006e-6, 1.14e-9],
  density: [
    [1034, -0.4781, -2.692e-3, 4.725e-6],
    [1.311, -6.876e-3, 4.805e-5, 1.69e-8],
    [7.49e-5, 7.855e-5, -3.995e-7, 4.982e-9],
    [-1.062e-4, 1.229e-6, -1.153e-8],
    [-9.623e-7, -7.211e-8],
    [4.891e-8],
  ],
  specificHeat: [
    [3737, 2.93, -4.675e-3, -1.389e-5],
    [-17.99, 0.1046, -4.147e-4, 1.847e-7],
    [-9.933e-2, 3.516e-4, 5.109e-6, -7.138e-8],
    [2.61e-3, -1.189e-6, -1.643e-7],
    [1.537e-5, -4.272e-7],
    [-1.618e-6],
  ],
  conductivity: [
    [0.472, 8.903e-4, -1.058e-6, -2.789e-9],
    [-4.286e-3, -1.473e-5, 1.059e-7, -1.142e-10],
    [1.747e-5, 6.814e-8, -3.612e-9, 2.365e-12],
    [3.017e-8, -2.412e-9, 4.004e-11],
    [-1.322e-9, 2.555e-11],
    [2.678e-11],
  ],
  lnViscosity: [
    [0.4705, -2.55e-2, 1.782e-4, -7.669e-7],
    [2.471e-2, -1.171e-4, 1.052e-6, -1.634e-8],
    [3.328e-6, 1.086e-6, 1.051e-8, -6.475e-10],
    [1.659e-6, 3.157e-9, 4.063e-10],
    [3.089e-8, 1.831e-10],
    [-1.865e-9],
  ],
};

/** Propylene glycol–water, Melinder 2010 (centre x_m = 30.7031 %, t_m = 32.7083 °C). */
export const PROPYLENE_GLYCOL: MelinderFluidData = {
  xm: 30.7031,
  tm: 32.7083,
  freezing: [-13.25, -0.6631, -1.094e-2, -2.283e-4, -3.409e-6, 1.465e-8],
  density: [
    [1018, -0.5406, -2.666e-3, 1.347e-5],
    [0.7604, -9.45e-3, 5.541e-5, -1.343e-7],
    [-2.498e-3, 2.7e-5, -4.018e-7, 3.376e-9],
    [-1.55e-4, 2.829e-6, -7.175e-9],
    [-1.131e-6, -2.221e-8],
    [2.342e-8],
  ],
  specificHeat: [
    [3882, 2.699, -1.659e-3, -1.032e-5],
    [-13.04, 5.07e-2, -4.752e-5, 1.522e-6],
    [-0.1598, 9.534e-5, 1.167e-5, -4.87e-8],
    [3.539e-4, 3.102e-5, -2.95e-7],
    [5e-5, -7.135e-7],
    [-4.959e-7],
  ],
  conductivity: [
    [0.4513, 7.955e-4, 3.482e-8, -5.966e-9],
    [-4.795e-3, -1.678e-5, 8.941e-8, 1.493e-10],
    [2.076e-5, 1.563e-7, -4.615e-9, 9.897e-12],
    [-9.083e-8, -2.518e-9, 6.543e-11],
    [-5.952e-10, -3.605e-11],
    [2.104e-11],
  ],
  lnViscosity: [
    [0.6837, -3.045e-2, 2.525e-4, -1.399e-6],
    [3.328e-2, -3.984e-4, 4.332e-6, -1.86e-8],
    [5.453e-5, -8.6e-8, -1.593e-8, -4.465e-11],
    [-3.9e-6, 1.054e-7, -1.589e-9],
    [-1.587e-8, 4.475e-10],
    [3.564e-9],
  ],
};
