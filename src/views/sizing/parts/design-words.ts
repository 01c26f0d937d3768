/**
 * The design engine's v2 fields read with the defaults every reader applies to designs stored before
 * they existed (process in the tubes, one shell, 25 % cut, baffle spacing 0.4 D_s but at least 51 mm),
 * and the words the pages use for them: where each fluid goes, how many shells, which shell-side
 * method. No code of the engine reaches the screen as it is.
 */
import type { Design, FluidRef, RateResult, SizeRequest } from '@shared/schemas/thermal';
import { parseGlycolId } from '@shared/thermal/fluids/glycols';

export type ProcessSide = 'tubes' | 'shell';
export type ShellMethod = 'bell-delaware' | 'kern';
export interface ShellCorrections {
  Jc: number;
  Jl: number;
  Jb: number;
  Js: number;
  Jr: number;
}
export interface ShellDpBreakdown {
  crossflow_Pa: number;
  window_Pa: number;
  ends_Pa: number;
  nozzles_Pa?: number;
  total_Pa: number;
}

/** The contract's new design fields, optional here: old stored designs never have them. */
interface DesignExtras {
  processSide?: ProcessSide;
  shellsInSeries?: number;
  baffleSpacing_m?: number;
  baffleCut?: number;
  baffleCount?: number;
  inletBaffleSpacing_m?: number;
  outletBaffleSpacing_m?: number;
  allocationReason?: string;
  recommendedReason?: string;
}
interface RatingExtras {
  processSide?: ProcessSide;
  baffleCut?: number;
  baffleCount?: number;
  inletBaffleSpacing_m?: number;
  outletBaffleSpacing_m?: number;
  shellsInSeries?: number;
  shellMethod?: ShellMethod;
  shellHtcKern_W_m2K?: number;
  shellPressureDropKern_Pa?: number;
  shellCorrections?: ShellCorrections;
  shellPressureDropBreakdown?: ShellDpBreakdown;
}

export type AnyDesign = Omit<Design, 'rating'> & { rating?: RateResult };

export interface DesignReading {
  processSide: ProcessSide;
  shellsInSeries: number;
  /** central baffle spacing, m; undefined for a design without a shell (wall-cooled) */
  baffleSpacing_m?: number;
  baffleCut: number;
  baffleCount?: number;
  inletBaffleSpacing_m?: number;
  outletBaffleSpacing_m?: number;
  allocationReason?: string;
  recommendedReason?: string;
  shellMethod?: ShellMethod;
  shellHtcKern_W_m2K?: number;
  shellPressureDropKern_Pa?: number;
  shellCorrections?: ShellCorrections;
  shellPressureDropBreakdown?: ShellDpBreakdown;
}

export const DEFAULT_BAFFLE_CUT = 0.25;

/** The spacing older designs were rated with: 0.4 D_s, at least 51 mm (TEMA minimum, 2 in). */
export function oldDefaultBaffleSpacing(shellInnerDiameter_m: number): number {
  return Math.max(0.4 * shellInnerDiameter_m, 0.0508);
}

export function readDesign(d: AnyDesign): DesignReading {
  const x = d as AnyDesign & DesignExtras;
  const r = (d.rating ?? {}) as Partial<RateResult> & RatingExtras;
  const shell = d.shellInnerDiameter_m;
  return {
    processSide: x.processSide ?? r.processSide ?? 'tubes',
    shellsInSeries: x.shellsInSeries ?? r.shellsInSeries ?? 1,
    baffleSpacing_m: x.baffleSpacing_m ?? (shell === undefined ? undefined : oldDefaultBaffleSpacing(shell)),
    baffleCut: x.baffleCut ?? r.baffleCut ?? DEFAULT_BAFFLE_CUT,
    baffleCount: x.baffleCount ?? r.baffleCount,
    inletBaffleSpacing_m: x.inletBaffleSpacing_m ?? r.inletBaffleSpacing_m,
    outletBaffleSpacing_m: x.outletBaffleSpacing_m ?? r.outletBaffleSpacing_m,
    allocationReason: x.allocationReason,
    recommendedReason: x.recommendedReason,
    shellMethod: r.shellMethod,
    shellHtcKern_W_m2K: r.shellHtcKern_W_m2K,
    shellPressureDropKern_Pa: r.shellPressureDropKern_Pa,
    shellCorrections: r.shellCorrections,
    shellPressureDropBreakdown: r.shellPressureDropBreakdown,
  };
}

export const SHELL_METHOD_LABELS: Record<ShellMethod, string> = {
  'bell-delaware': 'Bell–Delaware (Taborek), with leakage and bypass corrections',
  kern: 'Kern (ideal bundle, no leakage or bypass)',
};

export const SIDE_WORDS: Record<ProcessSide, string> = { tubes: 'in the tubes', shell: 'on the shell side' };

/** Short names of the library's fluids, as they read inside a sentence. */
const FLUID_WORDS: Record<string, string> = {
  water: 'water',
  air: 'air',
  'air-moist': 'compressed air',
  'ethylene-glycol-30': '30 % ethylene glycol',
  'ethylene-glycol-50': '50 % ethylene glycol',
  'propylene-glycol-30': '30 % propylene glycol',
  'propylene-glycol-50': '50 % propylene glycol',
  'oil-vg32': 'ISO VG 32 oil',
  'oil-vg46': 'ISO VG 46 oil',
  'oil-vg68': 'ISO VG 68 oil',
};

export function fluidWords(fluid: FluidRef | undefined, fallback: string): string {
  if (typeof fluid !== 'string') return fallback;
  const glycol = parseGlycolId(fluid); // any library strength, e.g. '40 % ethylene glycol'
  return FLUID_WORDS[fluid] ?? (glycol ? `${glycol.massPercent} % ${glycol.kind} glycol` : fallback);
}

const capital = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);

/**
 * "ISO VG 46 oil on the shell side, cooling water in the tubes" (names from the duty when known,
 * else "Process fluid … coolant …"); a wall-cooled design has only the process in the tubes.
 */
export function allocationSentence(side: ProcessSide, duty?: Pick<SizeRequest, 'process' | 'boundary'> | null): string {
  const process = fluidWords(duty?.process.fluid, 'process fluid');
  if (duty?.boundary.kind === 'wall') return `${capital(process)} in the tubes, a wall at fixed temperature outside`;
  const coolantFluid = duty?.boundary.kind === 'coolant' ? duty.boundary.fluid : undefined;
  const coolant = coolantFluid === 'water' ? 'cooling water' : fluidWords(coolantFluid, 'coolant');
  const other: ProcessSide = side === 'tubes' ? 'shell' : 'tubes';
  return `${capital(process)} ${SIDE_WORDS[side]}, ${coolant} ${SIDE_WORDS[other]}`;
}

/** "Process on the shell side" / "Process in the tubes", for tables and short labels. */
export function sideShort(side: ProcessSide): string {
  return side === 'shell' ? 'Shell side' : 'Tubes';
}

export function shellsWords(n: number): string {
  return n === 1 ? 'one shell' : `${n} shells in series`;
}

/** A key of what makes two designs the same exchanger (used to drop repeats and find the recommended). */
export function designKey(d: AnyDesign): string {
  const v = readDesign(d);
  return [
    d.tubeCount,
    d.tubeLength_m.toFixed(4),
    d.tubeOuterDiameter_m.toFixed(5),
    d.tubeWall_m.toFixed(5),
    d.tubeMaterial,
    d.tubePasses,
    d.layout ?? '',
    d.shellInnerDiameter_m?.toFixed(4) ?? '',
    v.processSide,
    v.shellsInSeries,
    v.baffleSpacing_m?.toFixed(4) ?? '',
    v.baffleCut.toFixed(3),
  ].join('|');
}

/**
 * The designs to show as alternatives: the recommended one first (or where the server put it), each
 * exchanger once, and the recommended one's index in the list.
 */
export function distinctAlternatives<D extends AnyDesign>(recommended: D, candidates: D[]): { designs: D[]; recommended: number } {
  const seen = new Set<string>();
  const designs = candidates.filter((d) => {
    const key = designKey(d);
    if (seen.has(key)) return false;
    seen.add(key);
    return true;
  });
  const key = designKey(recommended);
  const at = designs.findIndex((d) => designKey(d) === key);
  if (at >= 0) return { designs, recommended: at };
  return { designs: [recommended, ...designs], recommended: 0 };
}
