/**
 * A tube span as a beam in a liquid or gas: elastic modulus by material, the mass per metre a
 * vibrating tube carries (tube, fluid inside, hydrodynamic mass of the shell fluid) and the first
 * natural frequency of one span with its end conditions. Pure, SI units.
 */
import type { Layout } from '../geometry/layout';
import { pitchFamily } from '../geometry/layout';
import { TUBE_MATERIALS } from '../geometry/materials';

/**
 * Young's modulus near room temperature, Pa, by tube material id: ASME Boiler and Pressure Vessel
 * Code Section II Part D, tables TM-1 (steels), TM-3 (copper alloys), TM-5 (titanium) at 70 °F
 * (memory: carbon steel 29.4, stainless 28.3, copper 17.0, admiralty 16.0, 90/10 Cu-Ni 18.0,
 * 70/30 Cu-Ni 22.0, titanium 15.5 × 10⁶ psi). The modulus falls by a few percent up to 150 °C; the
 * room-temperature value is used (a screen, not a design calculation).
 */
export const TUBE_ELASTIC_MODULUS_PA: Readonly<Record<string, number>> = {
  'carbon-steel': 202e9,
  'stainless-304': 195e9,
  'stainless-316': 195e9,
  copper: 117e9,
  'admiralty-brass': 110e9,
  'cuni-90-10': 124e9,
  'cuni-70-30': 152e9,
  'titanium-gr2': 107e9,
};

/**
 * End-condition constants C = λ² of the first bending mode of a uniform Euler–Bernoulli beam
 * (any vibration textbook, e.g. Blevins, *Formulas for Natural Frequency and Mode Shape*, 1979,
 * table 8-1; the same C's as TEMA section 6, V-5.3, memory): both ends pinned π² = 9.87, clamped–
 * pinned 15.42, both clamped 22.37. A baffle hole holds a tube like a pin (it turns in the hole);
 * the tubesheet clamps it.
 */
export const SPAN_END_CONSTANT = { 'pinned-pinned': 9.8696, 'clamped-pinned': 15.418, 'clamped-clamped': 22.373 } as const;
export type SpanEnds = keyof typeof SPAN_END_CONSTANT;

/** Second moment of area of a tube, m⁴: `I = π (d_o⁴ − d_i⁴)/64`. */
export function tubeSecondMoment(dOuter: number, dInner: number): number {
  return (Math.PI * (dOuter ** 4 - dInner ** 4)) / 64;
}

/**
 * First natural frequency of a uniform beam span, Hz: `f_n = (C/(2π L²)) √(E I / m)`
 * (Euler–Bernoulli; TEMA section 6 V-5.3 writes the same form in US units, memory).
 * `C` from SPAN_END_CONSTANT, `L` span m, `EI` N·m², `m` kg/m including fluid and added mass.
 * No axial load (a fixed tubesheet's thermal axial stress would raise or lower it; not screened).
 */
export function spanNaturalFrequency(c: number, span_m: number, ei_Nm2: number, mass_kg_m: number): number {
  return (c / (2 * Math.PI * span_m * span_m)) * Math.sqrt(ei_Nm2 / mass_kg_m);
}

/**
 * Added-mass (hydrodynamic mass) coefficient of a tube confined in a bundle, Blevins,
 * *Flow-Induced Vibration*, 2nd ed., 1990, ch. 6 (memory): `C_m = ((D_e/d_o)² + 1)/((D_e/d_o)² − 1)`
 * with the equivalent confining diameter `D_e/d_o = (1 + 0.5 p/d_o)(p/d_o)` for triangular pitch and
 * `(1.07 + 0.56 p/d_o)(p/d_o)` for square pitch. About 1.6 at p/d_o = 1.25 triangular, tending to
 * 1 (an unconfined cylinder) for wide pitch. Validity: p/d_o about 1.2–2 (the fitted range).
 */
export function addedMassCoefficient(pitchRatio: number, layout: Layout): number {
  const de = pitchFamily(layout) === 'triangular' ? (1 + 0.5 * pitchRatio) * pitchRatio : (1.07 + 0.56 * pitchRatio) * pitchRatio;
  return (de * de + 1) / (de * de - 1);
}

export interface TubeMass {
  tube_kg_m: number;
  inside_kg_m: number;
  added_kg_m: number;
  total_kg_m: number;
  addedMassCoefficient: number;
}

/** Mass per metre of a vibrating tube: metal + fluid inside + `C_m ρ_shell π d_o²/4`. */
export function tubeMassPerLength(dOuter: number, dInner: number, metalDensity: number, tubeFluidDensity: number, shellFluidDensity: number, cm: number): TubeMass {
  const tube = metalDensity * (Math.PI / 4) * (dOuter * dOuter - dInner * dInner);
  const inside = tubeFluidDensity * (Math.PI / 4) * dInner * dInner;
  const added = cm * shellFluidDensity * (Math.PI / 4) * dOuter * dOuter;
  return { tube_kg_m: tube, inside_kg_m: inside, added_kg_m: added, total_kg_m: tube + inside + added, addedMassCoefficient: cm };
}

/** Modulus and density of a tube material (unknown ids: carbon steel, the search's reference material). */
export function tubeMechanics(materialId: string | undefined): { id: string; elasticModulus_Pa: number; density_kg_m3: number } {
  const m = TUBE_MATERIALS.find((x) => x.id === materialId) ?? TUBE_MATERIALS.find((x) => x.id === 'carbon-steel')!;
  return { id: m.id, elasticModulus_Pa: TUBE_ELASTIC_MODULUS_PA[m.id] ?? 202e9, density_kg_m3: m.density };
}
