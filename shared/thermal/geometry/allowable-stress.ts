/**
 * Pressure-part data for the wall check (shared/thermal/checks/walls.ts): allowable stress by
 * material and temperature, joint efficiency, corrosion allowance and the trade's minimum tube gauge.
 * Estimates for a quotation; the fabricator's responsible engineer takes the values of the code
 * edition in force.
 */
import { BWG_WALL_M } from './tubes';

/** Temperatures of the stress table, °C (the nearest of ASME II-D's °F columns: 100, 200, 300, 400, 500, 600 °F). */
export const STRESS_TEMPS_C = [40, 100, 150, 200, 250, 300] as const;

export interface StressEntry {
  /** the product form and specification the values are for */
  spec: string;
  /** maximum allowable stress S, MPa, at STRESS_TEMPS_C; `null` past the material's limit in the table */
  S_MPa: readonly (number | null)[];
}

/**
 * Maximum allowable stress S for tubes, ASME Boiler and Pressure Vessel Code Section II Part D,
 * Tables 1A (ferrous) and 1B (non-ferrous), Section VIII Division 1 values (memory: rounded from the
 * ksi columns, e.g. SA-179 13.4 ksi = 92 MPa; verify against the edition in force). Seamless tubes
 * are assumed (joint efficiency 1.0, see TUBE_JOINT_EFFICIENCY): SA-179 carbon steel, SA-213 TP304 /
 * TP316 (SA-249 welded tube takes the same S with E = 0.85), SB-111 copper C12200 light-drawn,
 * admiralty C44300 and copper-nickel C70600 / C71500 annealed, SB-338 titanium grade 2. Copper alloys
 * stop at 200 °C, past which the table does not offer them.
 */
export const TUBE_STRESS: Readonly<Record<string, StressEntry>> = {
  'carbon-steel': { spec: 'SA-179 seamless carbon steel (SA-214 welded: same S, E = 0.85)', S_MPa: [92, 92, 92, 92, 92, 92] },
  'stainless-304': { spec: 'SA-213 TP304 seamless (SA-249 welded: same S, E = 0.85)', S_MPa: [138, 115, 103, 95, 89, 85] },
  'stainless-316': { spec: 'SA-213 TP316 seamless (SA-249 welded: same S, E = 0.85)', S_MPa: [138, 119, 108, 99, 92, 87] },
  copper: { spec: 'SB-111 C12200 light-drawn', S_MPa: [62, 60, 57, 48, null, null] },
  'admiralty-brass': { spec: 'SB-111 C44300 annealed', S_MPa: [69, 69, 67, 62, null, null] },
  'cuni-90-10': { spec: 'SB-111 C70600 annealed', S_MPa: [60, 58, 57, 55, null, null] },
  'cuni-70-30': { spec: 'SB-111 C71500 annealed', S_MPa: [83, 80, 78, 76, null, null] },
  'titanium-gr2': { spec: 'SB-338 titanium grade 2 seamless', S_MPa: [99, 85, 71, 61, 52, 45] },
};

/**
 * Shell material: SA-106 grade B seamless pipe (S = 17.1 ksi ≈ 118 MPa) for pipe shells, SA-516
 * grade 70 plate (20.0 ksi ≈ 138 MPa) for rolled shells, both flat to 343 °C (650 °F) (ASME II-D
 * Table 1A, memory).
 */
export const SHELL_STRESS: Readonly<Record<'pipe' | 'rolled', StressEntry>> = {
  pipe: { spec: 'SA-106 B seamless pipe', S_MPa: [118, 118, 118, 118, 118, 118] },
  rolled: { spec: 'SA-516 70 plate', S_MPa: [138, 138, 138, 138, 138, 138] },
};

/**
 * S in Pa at `temp_C`, straight-line between the table's temperatures (as ASME II-D permits), the
 * 40 °C value below it; `undefined` past the last temperature the material has a value for.
 */
export function allowableStress(entry: StressEntry, temp_C: number): number | undefined {
  const T = STRESS_TEMPS_C;
  if (temp_C <= T[0]) return entry.S_MPa[0]! * 1e6;
  for (let i = 1; i < T.length; i++) {
    if (temp_C <= T[i]!) {
      const a = entry.S_MPa[i - 1];
      const b = entry.S_MPa[i];
      if (a == null || b == null) return undefined;
      return (a + ((b - a) * (temp_C - T[i - 1]!)) / (T[i]! - T[i - 1]!)) * 1e6;
    }
  }
  return undefined;
}

/**
 * Joint efficiency E of UG-27: 1.0 for seamless tube and pipe; 0.85 for a welded tube (SA-214,
 * SA-249) and for a rolled shell's longitudinal seam with spot radiography (ASME VIII-1 Table
 * UW-12, memory).
 */
export const TUBE_JOINT_EFFICIENCY = 1.0;
export const WELDED_TUBE_JOINT_EFFICIENCY = 0.85;
export const PIPE_JOINT_EFFICIENCY = 1.0;
export const ROLLED_JOINT_EFFICIENCY = 0.85;

/**
 * Corrosion allowance, m (common practice): carbon steel 1.5 mm (1/16 in) where the fluid is aqueous
 * (water, glycol mixtures: cooling-water service), 0.8 mm (1/32 in) in oils and gases; stainless
 * steel, copper alloys and titanium none (they are chosen because they do not corrode in the
 * services this engine rates; their gauge covers erosion). A tube is wetted by both fluids: it takes
 * the larger of the two allowances.
 */
export function corrosionAllowance(material: string, aqueous: boolean): number {
  if (material !== 'carbon-steel') return 0;
  return aqueous ? 0.0015 : 0.0008;
}

/**
 * Minimum tube gauge by material (common practice of the trade; TEMA Table RCB-2.21 lists similar
 * gauges, memory): carbon steel BWG 16 (1.65 mm), copper alloys BWG 18 (1.24 mm), stainless steel
 * and titanium BWG 20 (0.89 mm). Metric tubes: the nearest EN wall at or below it, 1.5 / 1.2 / 0.8 mm.
 */
export const MIN_GAUGE: Readonly<Record<string, { bwg: number; metric_m: number }>> = {
  'carbon-steel': { bwg: 16, metric_m: 0.0015 },
  copper: { bwg: 18, metric_m: 0.0012 },
  'admiralty-brass': { bwg: 18, metric_m: 0.0012 },
  'cuni-90-10': { bwg: 18, metric_m: 0.0012 },
  'cuni-70-30': { bwg: 18, metric_m: 0.0012 },
  'stainless-304': { bwg: 20, metric_m: 0.0008 },
  'stainless-316': { bwg: 20, metric_m: 0.0008 },
  'titanium-gr2': { bwg: 20, metric_m: 0.0008 },
};

/** The trade's minimum wall for this material, m, as a BWG tube (label `BWG n`) or a metric one. */
export function minimumWall(material: string, wallLabel: string | undefined): number {
  const g = MIN_GAUGE[material] ?? MIN_GAUGE['carbon-steel']!;
  return wallLabel?.startsWith('BWG') ? BWG_WALL_M[g.bwg]! : g.metric_m;
}

/**
 * Plate thicknesses a shop rolls shells from, m (common practice). The smallest, 10 mm, is the
 * rolled shell's catalogue wall (shells.ts) and about TEMA's minimum shell thickness for these
 * diameters (3/8–1/2 in, memory).
 */
export const PLATE_THICKNESSES_M = [0.01, 0.012, 0.014, 0.016, 0.018, 0.02, 0.022, 0.025, 0.028, 0.03, 0.032, 0.035, 0.04, 0.045, 0.05];

/** 0.875: a pipe's wall may be 12.5 % under its nominal (ASME B36.10M / SA-106 mill tolerance, memory). */
export const PIPE_MILL_TOLERANCE = 0.875;
