/** Shells: standard pipe up to NPS 24, then rolled plate. */
import { temaTieRods } from './tie-rods';

export interface Shell {
  label: string;
  innerDiameter_m: number;
  wall_m: number;
  kind: 'pipe' | 'rolled';
}

/**
 * NPS pipe, standard weight (STD) wall, ASME B36.10M (memory: OD and wall); checked against
 * python3-fluids' `nearest_pipe(NPS, schedule='STD')` in tests/reference/fixtures/fluids-lib.json.
 * [NPS, OD mm, wall mm]
 */
const PIPE_STD: readonly [number, number, number][] = [
  [4, 114.3, 6.02], [5, 141.3, 6.55], [6, 168.3, 7.11], [8, 219.1, 8.18], [10, 273.0, 9.27],
  [12, 323.8, 9.53], [14, 355.6, 9.53], [16, 406.4, 9.53], [18, 457.0, 9.53], [20, 508.0, 9.53],
  [22, 559.0, 9.53], [24, 610.0, 9.53],
];

export const PIPE_SHELLS: readonly Shell[] = PIPE_STD.map(([nps, od, t]) => ({
  label: `NPS ${nps} STD`,
  innerDiameter_m: (od - 2 * t) / 1000,
  wall_m: t / 1000,
  kind: 'pipe',
}));

/**
 * Rolled-plate shells above NPS 24: inner diameters from 650 mm in steps of `step_m` (a shop choice,
 * default 50 mm), wall 10 mm (a placeholder for cost only; the code calculation sets the real wall).
 */
export function rolledShells(maxInnerDiameter_m = 1.5, step_m = 0.05): Shell[] {
  const out: Shell[] = [];
  for (let d = 0.65; d <= maxInnerDiameter_m + 1e-9; d += step_m) {
    const id = Math.round(d * 1000) / 1000;
    out.push({ label: `rolled ${Math.round(id * 1000)} mm ID`, innerDiameter_m: id, wall_m: 0.01, kind: 'rolled' });
  }
  return out;
}

/** The default ladder of shells, smallest first. */
export const STANDARD_SHELLS: readonly Shell[] = [...PIPE_SHELLS, ...rolledShells()];

/**
 * Diametral clearance between shell ID and outer tube limit for a fixed-tubesheet bundle:
 * 12.7 mm for pipe shells, 15.9 mm for rolled shells (common practice).
 */
export function bundleClearance(shellInnerDiameter_m: number): number {
  return shellInnerDiameter_m <= 0.6 ? 0.0127 : 0.0159;
}

/** TEMA RCB-4.71 minimum tie-rod count by shell diameter (memory; the table is in ./tie-rods.ts). */
export function tieRodCount(shellInnerDiameter_m: number): number {
  return temaTieRods(shellInnerDiameter_m).count;
}
