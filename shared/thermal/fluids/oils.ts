/**
 * Mineral hydraulic and lubricating oils by ISO viscosity grade (ISO 3448: VG n = kinematic viscosity
 * n mm²/s at 40 °C, ±10 %), valid −10…150 °C.
 *
 * Kinematic viscosity: Walther's equation as standardised in ASTM D341 ("Standard Practice for
 *   Viscosity–Temperature Equations and Charts for Liquid Petroleum or Hydrocarbon Products"),
 *   log₁₀ log₁₀(ν + 0.7) = A − B log₁₀ T, ν in mm²/s, T in K, through the grade's values at 40 °C
 *   and 100 °C. (The 0.7 form holds for ν ≥ 2 mm²/s, true for these grades up to 150 °C.)
 * Reference points: typical VI ≈ 100 paraffinic oils, 15 °C densities and 100 °C viscosities as on
 *   typical hydraulic-oil datasheets (memory): VG32 32/5.4 mm²/s, 870 kg/m³; VG46 46/6.8 mm²/s,
 *   875 kg/m³; VG68 68/8.7 mm²/s, 880 kg/m³. A real oil's datasheet overrides these.
 * Density: thermal expansion after ASTM D1250 / API MPMS ch. 11.1 (1980), Table 54D (lubricating
 *   oils): ρ = ρ₁₅ exp(−α ΔT (1 + 0.8 α ΔT)), α = K₁/ρ₁₅, K₁ = 0.6278 (memory), ΔT = t − 15 °C.
 * cp and k: C. S. Cragoe, "Thermal Properties of Petroleum Products", U.S. Bureau of Standards
 *   Misc. Publ. 97 (1929): cp = (0.388 + 0.00045 t_F)/√s Btu/(lb·°F) = (1685 + 3.39 t)/√s J/(kg·K);
 *   k = 0.813 (1 − 0.0003 (t_F − 32))/s Btu·in/(h·ft²·°F) = 0.1173 (1 − 0.00054 t)/s W/(m·K);
 *   s = specific gravity 60/60 °F ≈ ρ₁₅/999.0 kg/m³.
 */
import { basicIssue, defineFluid, props } from './fluid-base';
import type { Fluid, FluidInfo } from './types';

export interface OilGrade {
  /** kinematic viscosity at 40 °C and 100 °C, mm²/s */
  nu40: number;
  nu100: number;
  /** density at 15 °C, kg/m³ */
  rho15: number;
}

const LOG_T40 = Math.log10(313.15);
const LOG_T100 = Math.log10(373.15);
const K1_LUBE = 0.6278; // API MPMS 11.1 Table 54D, lubricating oils (memory)

/** Walther/ASTM D341 constants A, B from two (T, ν) points. */
export function waltherConstants(nu40: number, nu100: number): { A: number; B: number } {
  const z40 = Math.log10(Math.log10(nu40 + 0.7));
  const z100 = Math.log10(Math.log10(nu100 + 0.7));
  const B = (z40 - z100) / (LOG_T100 - LOG_T40);
  return { A: z40 + B * LOG_T40, B };
}

/** Kinematic viscosity, mm²/s, at `temp_K` from Walther constants. */
export function waltherViscosity(A: number, B: number, temp_K: number): number {
  return Math.pow(10, Math.pow(10, A - B * Math.log10(temp_K))) - 0.7;
}

/** Density, kg/m³, at `temp_C` from the 15 °C density (API MPMS 11.1 Table 54D form). */
export function oilDensity(rho15: number, temp_C: number): number {
  const alpha = K1_LUBE / rho15;
  const dt = temp_C - 15;
  return rho15 * Math.exp(-alpha * dt * (1 + 0.8 * alpha * dt));
}

/** Cragoe (1929) specific heat, J/(kg·K). */
export function cragoeSpecificHeat(rho15: number, temp_C: number): number {
  return (1685 + 3.39 * temp_C) / Math.sqrt(rho15 / 999.0);
}

/** Cragoe (1929) thermal conductivity, W/(m·K). */
export function cragoeConductivity(rho15: number, temp_C: number): number {
  return (0.1173 * (1 - 0.00054 * temp_C)) / (rho15 / 999.0);
}

/** A mineral oil fluid from its grade data. */
export function mineralOil(id: string, name: string, grade: OilGrade): Fluid {
  const { A, B } = waltherConstants(grade.nu40, grade.nu100);
  const info: FluidInfo = {
    id,
    name,
    phase: 'liquid',
    minTemp_C: -10,
    maxTemp_C: 150,
    source:
      `ν ${grade.nu40}/${grade.nu100} mm²/s at 40/100 °C, typical VI≈100 datasheet values, Walther (ASTM D341); ` +
      'density ASTM D1250 Table 54D; cp and k Cragoe, US Bureau of Standards Misc. Publ. 97 (1929)',
  };
  return defineFluid(info, (t, p) => basicIssue(info, t, p), (temp_C) => {
    const rho = oilDensity(grade.rho15, temp_C);
    const nu = waltherViscosity(A, B, temp_C + 273.15) * 1e-6;
    return props(rho, cragoeSpecificHeat(grade.rho15, temp_C), nu * rho, cragoeConductivity(grade.rho15, temp_C));
  });
}

export const OIL_GRADES = {
  'oil-vg32': { nu40: 32, nu100: 5.4, rho15: 870 },
  'oil-vg46': { nu40: 46, nu100: 6.8, rho15: 875 },
  'oil-vg68': { nu40: 68, nu100: 8.7, rho15: 880 },
} as const satisfies Record<string, OilGrade>;

export const oilVg32 = mineralOil('oil-vg32', 'Mineral oil ISO VG 32', OIL_GRADES['oil-vg32']);
export const oilVg46 = mineralOil('oil-vg46', 'Mineral oil ISO VG 46', OIL_GRADES['oil-vg46']);
export const oilVg68 = mineralOil('oil-vg68', 'Mineral oil ISO VG 68', OIL_GRADES['oil-vg68']);
