/**
 * The fields the design engine v2 added to a design (issue 10: fluid allocation, shells in series,
 * baffles), read with the defaults an old stored design gets: quotes stored before them carry none
 * of these, and every reader here (bill of materials, cost, build sheet, offer, summary) must still
 * price and build them exactly as before.
 */

export type ProcessSide = 'tubes' | 'shell';

/** The v2 fields, all optional on a stored design (the engine's `Design` carries them). */
export interface TrainFields {
  processSide?: ProcessSide;
  /** identical shells in series, 1–4; `tubeCount` and `tubeLength_m` are per shell */
  shellsInSeries?: number;
  /** central baffle spacing, m */
  baffleSpacing_m?: number;
  /** fraction of the shell ID */
  baffleCut?: number;
  /** baffles in ONE shell */
  baffleCount?: number;
  inletBaffleSpacing_m?: number;
  outletBaffleSpacing_m?: number;
  allocationReason?: string;
}

/** 25 %: the cut every design had before the cut became a design variable (and Kern's own). */
export const DEFAULT_BAFFLE_CUT = 0.25;
/** The engine searches 1 to 4 shells in series (issue 10 contract). */
export const MAX_SHELLS = 4;

/** Shells in series, 1 for an old design; a whole number 1–4 whatever the record says. */
export function shellsOf(d: TrainFields): number {
  const n = d.shellsInSeries;
  return n !== undefined && Number.isFinite(n) ? Math.min(MAX_SHELLS, Math.max(1, Math.round(n))) : 1;
}

/** Which side the process stream is on: the tubes for an old design. */
export const processSideOf = (d: TrainFields): ProcessSide => (d.processSide === 'shell' ? 'shell' : 'tubes');

export const baffleCutOf = (d: TrainFields): number => d.baffleCut ?? DEFAULT_BAFFLE_CUT;

/**
 * Baffles in one shell. The design's own count when it carries one (the engine counted the baffles
 * it rated); else, with inlet/outlet spacings, N_b = ⌊(L − L_bi − L_bo) / L_bc⌋ + 1 (Taborek,
 * Heat Exchanger Design Handbook §3.3, memory) over the tube length; else the count every design
 * was priced with before: round(L / B) − 1. None without a spacing (a tube bundle in a bath).
 */
export function bafflesPerShell(d: TrainFields & { tubeLength_m: number }): number {
  if (d.baffleCount !== undefined && Number.isFinite(d.baffleCount)) return Math.max(0, Math.round(d.baffleCount));
  const b = d.baffleSpacing_m;
  if (!b || b <= 0) return 0;
  if (d.inletBaffleSpacing_m !== undefined || d.outletBaffleSpacing_m !== undefined) {
    // at least one baffle, as the engine's plan (shared/thermal/geometry/baffles.ts) counts
    const free = d.tubeLength_m - (d.inletBaffleSpacing_m ?? b) - (d.outletBaffleSpacing_m ?? b);
    return free < 0 ? 1 : Math.floor(free / b + 1e-9) + 1;
  }
  return Math.max(0, Math.round(d.tubeLength_m / b) - 1);
}

/** "2 shells in series" / "1 shell". */
export const shellsWords = (n: number) => (n === 1 ? '1 shell' : `${n} shells in series`);
