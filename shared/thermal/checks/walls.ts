/**
 * Walls for pressure (issue 11): the tube wall and the shell wall against each side's design
 * pressure by the thin-cylinder formula of ASME VIII-1 UG-27(c)(1), with allowable stress by
 * material and temperature, joint efficiency and corrosion allowance (geometry/allowable-stress.ts),
 * and the trade's minimum tube gauge. The tubes under the shell side's pressure (external pressure,
 * UG-28's charts) are flagged, not computed. Hard findings: `tube-wall-thin`, `shell-wall-thin`.
 *
 * Each side is designed for its own pressure with the other side empty (common practice). Pressures
 * in the duty are absolute (as everywhere in the API); the wall takes the gauge pressure (the
 * atmosphere outside). An estimate for the quotation: the responsible engineer's calculation under
 * the code in force governs.
 */
import type { ProcessSide, SizeRequest } from '../../schemas/thermal';
import type { ThermalWarning } from '../errors';
import { resolveStream } from '../exchanger/streams';
import { tubeMechanics } from './tube-frequency';
import {
  allowableStress, corrosionAllowance, minimumWall, PIPE_JOINT_EFFICIENCY, PIPE_MILL_TOLERANCE, PLATE_THICKNESSES_M,
  ROLLED_JOINT_EFFICIENCY, SHELL_STRESS, TUBE_JOINT_EFFICIENCY, TUBE_STRESS,
} from '../geometry/allowable-stress';
import { STANDARD_SHELLS, type Shell } from '../geometry/shells';

const ATM = 101_325;
/** Default design pressure: the operating gauge pressure plus 10 %, at least 1 bar more (common practice). */
export const DESIGN_PRESSURE_MARGIN = 0.1;
export const DESIGN_PRESSURE_MIN_MARGIN_PA = 1e5;
/** Default design temperature: the highest operating temperature plus 25 K (common practice). */
export const DESIGN_TEMP_MARGIN_K = 25;

/** A side's design point: `pressure_Pa` absolute, `gauge_Pa` above the atmosphere; `stated` when the duty gave it. */
export interface DesignPoint {
  pressure_Pa: number;
  gauge_Pa: number;
  temp_C: number;
  stated: boolean;
}

/** Default design gauge pressure from an operating absolute pressure, Pa (vacuum counts as 0 bar(g)). */
export function defaultDesignGauge(operating_Pa: number): number {
  const g = Math.max(operating_Pa - ATM, 0);
  return Math.max(g * (1 + DESIGN_PRESSURE_MARGIN), g + DESIGN_PRESSURE_MIN_MARGIN_PA);
}

type DutyStreams = Pick<SizeRequest, 'process' | 'boundary'>;

/**
 * The design pressure and temperature of both streams: the duty's `design` where given, else the
 * defaults above. The highest operating temperature is the process inlet for both streams (the
 * coolant cannot leave hotter than the process enters); a wall boundary (a bath) is at atmospheric
 * pressure.
 */
export function designConditions(duty: DutyStreams): { process: DesignPoint; boundary: DesignPoint } {
  const b = duty.boundary;
  const hottest = duty.process.inletTemp_C + DESIGN_TEMP_MARGIN_K;
  const point = (given: { pressure_Pa: number; temp_C: number } | undefined, operating_Pa: number): DesignPoint =>
    given
      ? { pressure_Pa: given.pressure_Pa, gauge_Pa: Math.max(given.pressure_Pa - ATM, 0), temp_C: given.temp_C, stated: true }
      : { pressure_Pa: ATM + defaultDesignGauge(operating_Pa), gauge_Pa: defaultDesignGauge(operating_Pa), temp_C: hottest, stated: false };
  return {
    process: point(duty.process.design, duty.process.pressure_Pa),
    boundary: point(b.kind === 'coolant' ? b.design : undefined, b.kind === 'coolant' ? b.pressure_Pa : ATM),
  };
}

/** One side of the exchanger for the wall check. */
export interface WallSide {
  design: DesignPoint;
  /** the fluid is water or a glycol mixture (sets the carbon-steel corrosion allowance) */
  aqueous: boolean;
}

/** The tube side and the shell side of a duty with the process on `processSide`. */
export function wallSides(duty: DutyStreams, processSide: ProcessSide = 'tubes'): { tube: WallSide; shell: WallSide } {
  const dc = designConditions(duty);
  const b = duty.boundary;
  const process = { design: dc.process, aqueous: resolveStream(duty.process, 'process').aqueous };
  const other = { design: dc.boundary, aqueous: b.kind === 'coolant' ? resolveStream(b, 'boundary').aqueous : true };
  return processSide === 'shell' && b.kind === 'coolant' ? { tube: other, shell: process } : { tube: process, shell: other };
}

/**
 * ASME VIII-1 UG-27(c)(1), circumferential stress in a cylinder under internal pressure:
 * t = P R / (S E − 0.6 P), with t the wall for pressure (m), P the design gauge pressure (Pa), R the
 * inside radius in the corroded condition (m), S the allowable stress (Pa), E the joint efficiency.
 * Valid for t ≤ R/2 and P ≤ 0.385 S E; outside that `Infinity` (the code's thick-wall rules apply).
 */
export function ug27Thickness(P: number, R: number, S: number, E: number): number {
  if (!(P <= 0.385 * S * E)) return Infinity;
  const t = (P * R) / (S * E - 0.6 * P);
  return t <= R / 2 ? t : Infinity;
}

/**
 * The least wall of a cylinder of outside radius R_o that meets UG-27(c)(1) with corrosion allowance
 * c, its inside radius taken at that wall (R = R_o − t + c): solved in closed form,
 * t − c = P R_o / (S E + 0.4 P) (the outside-radius form of ASME VIII-1 Appendix 1-1).
 */
export function wallForPressureOutside(P: number, Ro: number, S: number, E: number, c: number): number {
  if (!(P <= 0.385 * S * E)) return Infinity;
  return (P * Ro) / (S * E + 0.4 * P) + c;
}

export interface TubeWallResult {
  ok: boolean;
  /** the wall the tube needs: pressure + corrosion allowance, at least the trade's minimum gauge, m */
  required_m: number;
  pressure_m: number;
  corrosion_m: number;
  minimum_m: number;
  allowableStress_Pa: number | undefined;
  designPressure_Pa: number;
  designTemp_C: number;
}

/** The tube wall a material, OD and wall (label `BWG n` or metric) needs for its two sides. */
export function tubeWallCheck(t: { od: number; wall: number; wallLabel?: string; material: string }, tube: WallSide, shell: WallSide): TubeWallResult {
  const temp = Math.max(tube.design.temp_C, shell.design.temp_C);
  const entry = TUBE_STRESS[t.material] ?? TUBE_STRESS['carbon-steel']!;
  const S = allowableStress(entry, temp);
  const ca = Math.max(corrosionAllowance(t.material, tube.aqueous), corrosionAllowance(t.material, shell.aqueous));
  const P = tube.design.gauge_Pa;
  const pressure = S === undefined ? Infinity : wallForPressureOutside(P, t.od / 2, S, TUBE_JOINT_EFFICIENCY, 0);
  const minimum = minimumWall(t.material, t.wallLabel);
  const required = Math.max(pressure + ca, minimum);
  // the chosen wall by UG-27 itself, inside radius corroded: the same verdict as `wall ≥ required`
  const tChosen = S === undefined ? Infinity : ug27Thickness(P, t.od / 2 - t.wall + ca, S, TUBE_JOINT_EFFICIENCY) + ca;
  return {
    ok: tChosen <= t.wall + 1e-9 && t.wall >= minimum - 1e-6,
    required_m: required, pressure_m: pressure, corrosion_m: ca, minimum_m: minimum, allowableStress_Pa: S, designPressure_Pa: P, designTemp_C: temp,
  };
}

export interface ShellWallResult {
  ok: boolean;
  /** the least wall the shell needs (pressure + corrosion allowance), m */
  required_m: number;
  /** the wall the design gets: the pipe's STD wall, or the rolled plate that covers `required_m` */
  wall_m: number;
  allowableStress_Pa: number | undefined;
  designPressure_Pa: number;
  designTemp_C: number;
}

/**
 * The shell's wall under the shell-side design pressure, UG-27(c)(1) on its inside radius (corroded).
 * Pipe (SA-106 B, seamless): the STD wall less its 12.5 % mill tolerance must cover it, else the
 * shell fails (the next schedule would change the inside diameter and the tube count). Rolled plate
 * (SA-516 70, E 0.85): the thinnest plate of the shop's list, from the catalogue's 10 mm, that covers it.
 */
export function shellWallCheck(sh: Pick<Shell, 'innerDiameter_m' | 'wall_m' | 'kind'>, shell: WallSide): ShellWallResult {
  const S = allowableStress(SHELL_STRESS[sh.kind], shell.design.temp_C);
  const E = sh.kind === 'pipe' ? PIPE_JOINT_EFFICIENCY : ROLLED_JOINT_EFFICIENCY;
  const ca = corrosionAllowance('carbon-steel', shell.aqueous);
  const P = shell.design.gauge_Pa;
  const required = S === undefined ? Infinity : ug27Thickness(P, sh.innerDiameter_m / 2 + ca, S, E) + ca;
  const base = { required_m: required, allowableStress_Pa: S, designPressure_Pa: P, designTemp_C: shell.design.temp_C };
  if (sh.kind === 'pipe') return { ...base, ok: sh.wall_m * PIPE_MILL_TOLERANCE >= required - 1e-9, wall_m: sh.wall_m };
  const plate = PLATE_THICKNESSES_M.find((t) => t >= sh.wall_m - 1e-9 && t >= required - 1e-9);
  return { ...base, ok: plate !== undefined, wall_m: plate ?? sh.wall_m };
}

/** The geometry the wall check reads. */
export interface WallGeometry {
  tubeOuterDiameter_m: number;
  tubeWall_m: number;
  tubeWallLabel?: string;
  tubeMaterial: string;
  shellInnerDiameter_m?: number;
}

export interface WallCheck {
  ok: boolean;
  findings: ThermalWarning[];
  tubeWallRequired_m: number;
  shellWallRequired_m?: number;
  /** the shell's wall: pipe STD or the rolled plate chosen */
  shellWall_m?: number;
  tube: TubeWallResult;
  shell?: ShellWallResult;
}

const mm = (m: number) => `${(m * 1000).toFixed(2)} mm`;
const barg = (pa: number) => `${(pa / 1e5).toFixed(1)} bar(g)`;

/** The catalogue shell of this inside diameter (within 0.5 mm), if any. */
export function catalogueShell(innerDiameter_m: number): Shell | undefined {
  return STANDARD_SHELLS.find((s) => Math.abs(s.innerDiameter_m - innerDiameter_m) < 5e-4);
}

/**
 * Both walls of a design. Hard findings (`ok` false): `tube-wall-thin` (thinner than the pressure,
 * the corrosion allowance or the minimum gauge need, or the material has no allowable stress at the
 * design temperature), `shell-wall-thin` (a pipe shell's STD wall, or no plate in the list, covers
 * the shell side). Soft: `tube-external-pressure` when the shell side's design pressure exceeds the
 * tube side's and a quarter of the tubes' elastic collapse pressure (UG-28's charts decide; not
 * computed here). A shell outside the catalogue is taken as
 * rolled plate.
 */
export function checkWalls(g: WallGeometry, sides: { tube: WallSide; shell: WallSide }): WallCheck {
  const findings: ThermalWarning[] = [];
  const tube = tubeWallCheck({ od: g.tubeOuterDiameter_m, wall: g.tubeWall_m, wallLabel: g.tubeWallLabel, material: g.tubeMaterial }, sides.tube, sides.shell);
  if (!tube.ok) {
    const why = tube.allowableStress_Pa === undefined
      ? `${g.tubeMaterial} has no allowable stress at the design temperature ${tube.designTemp_C.toFixed(0)} °C (ASME II-D, memory)`
      : `it needs ${mm(tube.required_m)}: ${mm(tube.pressure_m)} for ${barg(tube.designPressure_Pa)} at ${tube.designTemp_C.toFixed(0)} °C (ASME VIII-1 UG-27, S ${(tube.allowableStress_Pa / 1e6).toFixed(0)} MPa) plus ${mm(tube.corrosion_m)} corrosion allowance, and at least the trade's minimum ${mm(tube.minimum_m)} for this material`;
    findings.push({ code: 'tube-wall-thin', message: `The tube wall ${mm(g.tubeWall_m)} is too thin: ${why}.` });
  }
  let shell: ShellWallResult | undefined;
  if (g.shellInnerDiameter_m !== undefined) {
    const sh = catalogueShell(g.shellInnerDiameter_m) ?? { innerDiameter_m: g.shellInnerDiameter_m, wall_m: PLATE_THICKNESSES_M[0]!, kind: 'rolled' as const };
    shell = shellWallCheck(sh, sides.shell);
    if (!shell.ok) {
      const what = sh.kind === 'pipe' ? `the pipe's STD wall ${mm(sh.wall_m)} less 12.5 % mill tolerance` : `no plate up to ${mm(PLATE_THICKNESSES_M.at(-1)!)}`;
      findings.push({ code: 'shell-wall-thin', message: `The shell is too thin for the shell side's ${barg(shell.designPressure_Pa)}: it needs ${Number.isFinite(shell.required_m) ? mm(shell.required_m) : 'a thick-wall design'} (ASME VIII-1 UG-27 with corrosion allowance), more than ${what}. Choose a rolled shell or a lower design pressure.` });
    }
    const external = sides.shell.design.gauge_Pa;
    if (external > sides.tube.design.gauge_Pa && external > EXTERNAL_FLAG_FRACTION * tubeCollapsePressure(g.tubeOuterDiameter_m, g.tubeWall_m, g.tubeMaterial)) {
      findings.push({ code: 'tube-external-pressure', message: `The shell side's design pressure ${barg(external)} exceeds the tube side's ${barg(sides.tube.design.gauge_Pa)} and is more than a quarter of these tubes' elastic collapse pressure: check the tubes under external pressure on the code's charts (ASME VIII-1 UG-28) before relying on this wall.` });
    }
  }
  return {
    ok: tube.ok && (shell?.ok ?? true),
    findings,
    tubeWallRequired_m: tube.required_m,
    shellWallRequired_m: shell?.required_m,
    shellWall_m: shell?.wall_m,
    tube,
    shell,
  };
}

/**
 * 0.25: the tubes under external pressure are flagged for UG-28's charts only when the shell side's
 * design pressure exceeds a quarter of their elastic collapse pressure (a screen of ours, not the
 * code's rule: well below it the charts are governed by yield and clear a few bar easily, and a flag
 * on every design would hide the one that matters).
 */
export const EXTERNAL_FLAG_FRACTION = 0.25;

/**
 * Elastic collapse pressure of a long thin tube under external pressure, Pa (Bryan 1888; Timoshenko &
 * Gere, *Theory of Elastic Stability*, 2nd ed., 1961, §7.3, memory): `p_cr = 2E/(1 − ν²) (t/D_o)³`,
 * ν = 0.3. `E` by tube material (checks/tube-frequency.ts).
 */
export function tubeCollapsePressure(dOuter: number, wall: number, materialId: string): number {
  const e = tubeMechanics(materialId).elasticModulus_Pa;
  return ((2 * e) / (1 - 0.3 * 0.3)) * Math.pow(wall / dOuter, 3);
}

/** Codes of the wall check's hard findings. */
export const WALL_HARD_CODES = ['tube-wall-thin', 'shell-wall-thin'];

/** The design's wall fields from a check (finite values only: an impossible wall is a finding, not a number). */
export function designWallFields(w: WallCheck): { tubeWallRequired_m?: number; shellWallRequired_m?: number; shellWall_m?: number } {
  const f = (x: number | undefined) => (x !== undefined && Number.isFinite(x) ? x : undefined);
  return { tubeWallRequired_m: f(w.tubeWallRequired_m), shellWallRequired_m: f(w.shellWallRequired_m), shellWall_m: f(w.shellWall_m) };
}

/** 1.3: ASME VIII-1 UG-99(b) hydrostatic test factor (memory; verify against the edition in force). */
export const HYDROTEST_FACTOR = 1.3;

export interface HydrotestSide {
  /** test gauge pressure, Pa */
  test_Pa: number;
  /** design gauge pressure taken as the MAWP, Pa */
  design_Pa: number;
  designTemp_C: number;
  stated: boolean;
  /** UG-99(b) stress ratio: the lowest S(test, 40 °C) / S(design temperature) of the side's materials */
  stressRatio: number;
}

/**
 * Hydrotest pressure of each side by ASME VIII-1 UG-99(b): 1.3 × MAWP × the lowest stress ratio of
 * the side's materials (memory), the MAWP taken as the side's design pressure (the responsible
 * engineer's calculation sets the real MAWP). The tubes are a pressure part of both sides; the
 * channel and shell are carbon steel (SA-106 B / SA-516 70).
 */
export function hydrotest(g: { tubeMaterial: string; shellInnerDiameter_m?: number }, sides: { tube: WallSide; shell: WallSide }): { tube: HydrotestSide; shell: HydrotestSide; basis: string } {
  const shellEntry = SHELL_STRESS[catalogueShell(g.shellInnerDiameter_m ?? 0)?.kind ?? 'rolled'];
  const tubeEntry = TUBE_STRESS[g.tubeMaterial] ?? TUBE_STRESS['carbon-steel']!;
  const ratio = (temp: number) => {
    const r = [tubeEntry, shellEntry].map((e) => (allowableStress(e, 40) ?? 0) / (allowableStress(e, temp) ?? Infinity)).filter((x) => x > 0);
    return r.length ? Math.max(1, Math.min(...r)) : 1;
  };
  const side = (s: WallSide): HydrotestSide => {
    const k = ratio(s.design.temp_C);
    return { test_Pa: HYDROTEST_FACTOR * s.design.gauge_Pa * k, design_Pa: s.design.gauge_Pa, designTemp_C: s.design.temp_C, stated: s.design.stated, stressRatio: k };
  };
  const tube = side(sides.tube);
  const shell = side(sides.shell);
  const words = (name: string, h: HydrotestSide) =>
    `${name}: 1.3 × ${barg(h.design_Pa)} × ${h.stressRatio.toFixed(2)} = ${barg(h.test_Pa)} (design ${barg(h.design_Pa)} at ${h.designTemp_C.toFixed(0)} °C, ${h.stated ? 'as stated on the duty' : 'default: the operating gauge pressure + 10 %, at least + 1 bar, and the process inlet + 25 K'})`;
  const basis =
    `ASME VIII-1 UG-99(b): 1.3 × MAWP × stress ratio (the lowest S at test over S at design temperature of the side's materials, ASME II-D, memory), the MAWP taken as the design pressure. ` +
    `${words('Tube side', tube)}; ${words('shell side', shell)}. The responsible engineer confirms the MAWP and the test pressure.`;
  return { tube, shell, basis };
}
