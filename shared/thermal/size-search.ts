/**
 * The sizing search's enumeration: process side × tube passes × tube OD × layout × wall × shell
 * (tube count = what the laid-out tubesheet holds, shells chosen from the tube-stream velocity
 * window) × central baffle spacing (TEMA minimum to the maximum unsupported span, at most D_s) ×
 * material × shells in series. Each candidate's tube length is solved in closed form (NTU of the
 * arrangement, a short fixed point for entrance effects); only candidates within every limit are
 * kept, as `Pre` records ranked later. Baffle cut is refined on the few that get rated (size.ts).
 */
import type { ProcessSide, SizeRequest } from '../schemas/thermal';
import { foulingFor } from './allocation';
import { RE_LAMINAR_LIMIT } from './correlations/transition';
import type { CostInput } from './cost-proxy';
import { lmtdCorrectionShells, ntuShells } from './exchanger/arrangement';
import { TUBE_WATER_VELOCITY_MAX, TUBE_WATER_VELOCITY_MIN } from './exchanger/checks';
import { MIN_LMTD_CORRECTION, prepareFor } from './exchanger/rate-coolant';
import { requiredLengthCoolant, requiredLengthWall, sideView, type DutyContext, type SideView } from './exchanger/required-length';
import { shellMethod } from './exchanger/shell-methods';
import { SHELL_ASPECT, SHELL_LIQUID_VELOCITY, type ShellGeometry } from './exchanger/shell-side';
import { tubePressureDrop, tubeVelocity, type Bundle } from './exchanger/tube-side';
import { checkWalls, shellWallCheck, wallSides } from './checks/walls';
import { baffleSpacingWindow, DEFAULT_BAFFLE_CUT, searchBaffleSpacings } from './geometry/baffles';
import { tubeCountInShell, type Layout } from './geometry/layout';
import { tubeMaterial } from './geometry/materials';
import { STANDARD_SHELLS } from './geometry/shells';
import { BWG_WALL_M, DEFAULT_SEARCH_ODS_M, MIN_PITCH_RATIO, tubeSizeOf } from './geometry/tubes';
import { velocityWindow } from './size-duty';

export const DEFAULT_MATERIALS = ['carbon-steel', 'stainless-304', 'copper', 'cuni-90-10'];
export const DEFAULT_LAYOUTS: Layout[] = [30, 60, 90, 45];
export const DEFAULT_PASSES = [1, 2, 4];

export type Reason = 'length' | 'pressure-drop' | 'shell-pressure-drop' | 'lmtd-correction' | 'shell-size' | 'shell-aspect' | 'wall' | 'vibration' | 'nozzle';

export type PreInput = CostInput & {
  tubePasses: number; layout: Layout; tubePitch_m: number; shellLabel: string; tubeWallLabel: string;
  processSide: ProcessSide; shellsInSeries: number; baffleCut: number;
};

/** A candidate within every limit on its solved length, before rating. */
export interface Pre {
  cost: number;
  /** cost with the soft penalty for velocities outside their windows: what the ranking uses */
  rank: number;
  input: PreInput;
  bundle: Bundle;
  shell?: ShellGeometry;
  view?: SideView;
  ntu: number;
  requiredLength: number;
  tubeDp: number;
  shellDp: number;
  /** tube- and shell-side coefficients at the solved length */
  hIn: number;
  hOut: number;
  holds: number;
}

/** 0.15: rank penalty per velocity outside its window (a search preference, not a limit). */
export const WINDOW_PENALTY = 0.15;

/**
 * 0.25: rank penalty for a liquid in laminar flow in the tubes when the search may put it on the
 * shell side instead (domain brief 2.8, common practice: the viscous fluid goes on the shell side,
 * where baffled crossflow is turbulent at Reynolds numbers where a tube is laminar; laminar tube-side
 * coefficients are low, depend on the entrance correlation chosen and suffer most from fouling).
 */
export const LAMINAR_TUBE_PENALTY = 0.25;

/** The ranking's cost: the cost plus its soft penalties (preferences, not limits). */
export function rankOf(cost: number, windowFindings: number, laminarTube: boolean): number {
  return cost + Math.abs(cost) * (WINDOW_PENALTY * windowFindings + (laminarTube ? LAMINAR_TUBE_PENALTY : 0));
}

/**
 * 0.5: Bell–Delaware's leakage factor J_l below which a baffle spacing counts as leaky. Close spacing
 * in a small shell lets the baffle-to-shell and tube-to-baffle leakage take half the crossflow
 * (J_l ≈ 0.4); such a design leans on clearances the shop cannot hold tightly and loses most when the
 * leakage paths foul. Typical J_l 0.7–0.8, product of the J's 0.5–0.7 for a well-designed unit
 * (domain brief 2.8; common practice). The search tries spacings that are not leaky first.
 */
export const LEAKY_JL = 0.5;

interface ShellOption {
  shell: ShellGeometry;
  h0: number;
  /** shell-side ΔP of one shell per metre of tube length at the nominal length, Pa/m */
  dpPerM: number;
  velocity: number;
  /** Bell–Delaware's J_l below LEAKY_JL at this spacing */
  leaky: boolean;
}

export interface SearchState {
  req: SizeRequest;
  ctx: DutyContext;
  step: number;
  /** design margin on area as a factor, 1 + margin (the price book's `designMargin_pct`); lengths are sized for required × this */
  margin?: number;
  /** the shortest bundle the shop builds, m (price book `minTubeLength_m`): shorter solved lengths are made this long */
  minLength?: number;
  costOf: (d: CostInput) => number;
  reasons: Record<Reason, number>;
  evaluated: number;
  pre: Pre[];
}

const shells = (req: SizeRequest) => STANDARD_SHELLS.filter((sh) => sh.innerDiameter_m <= (req.constraints.maxShellInnerDiameter_m ?? Infinity));
type ShellList = ReturnType<typeof shells>;

/** Tube counts of each shell for this tube field, divisible by the passes, laid out on first use. */
function countsFor(cache: Map<string, (i: number) => number>, list: ShellList, od: number, pitch: number, layout: Layout, passes: number) {
  const key = `${od}|${layout}|${passes}`;
  let f = cache.get(key);
  if (!f) {
    const memo = new Int32Array(list.length).fill(-1);
    f = (i: number) => {
      if (memo[i]! < 0) memo[i] = Math.floor(tubeCountInShell({ shellInnerDiameter_m: list[i]!.innerDiameter_m, tubeOuterDiameter_m: od, tubePitch_m: pitch, layout, tubePasses: passes }) / passes) * passes;
      return memo[i]!;
    };
    cache.set(key, f);
  }
  return f;
}

/** Runs the enumeration for the given sides at one widening of the tube velocity window. */
export function search(st: SearchState, sides: ProcessSide[], lowScale: number, prevScale: number, counts: Map<string, (i: number) => number>): void {
  const { req, ctx } = st;
  const c = req.constraints;
  const list = shells(req);
  const maxN = ctx.coolant ? (c.maxShellsInSeries ?? 4) : 1;
  const maxShellDp = c.maxShellPressureDrop_Pa ?? c.maxPressureDrop_Pa;
  const method = shellMethod(req.shellMethod);
  for (const side of sides) {
    const view = ctx.coolant ? sideView(ctx, side, foulingFor(req, ctx.s, ctx.coolant.c, side)) : undefined;
    const tube = view?.tube ?? ctx.s;
    const tubeBulk = view?.tubeBulk ?? ctx.bulk;
    const window = velocityWindow(tube, tubeBulk.density);
    const shellLiquid = view ? view.shell.fluid.phase === 'liquid' : false;
    const materials = c.materials ?? DEFAULT_MATERIALS;
    const mats = materials.map((id) => tubeMaterial(id)!);
    const ref = mats[0]!;
    const done = new Uint8Array(materials.length);
    const scratch: Bundle = { dOuter: 0, dInner: 0, count: 0, length: 0, passes: 1, roughness: 1.5e-6, kWall: 50, copperAlloy: false };
    // walls for pressure (checks/walls.ts): a gauge or a pipe shell too thin for its side is not offered
    const ws = wallSides(req, side);
    const shellWalls = new Map<number, number | null>();
    const shellWallOf = (sh: ShellList[number]) => {
      if (!shellWalls.has(sh.innerDiameter_m)) { const r = shellWallCheck(sh, ws.shell); shellWalls.set(sh.innerDiameter_m, r.ok ? r.wall_m : null); }
      return shellWalls.get(sh.innerDiameter_m)!;
    };
    for (const passes of c.tubePasses ?? DEFAULT_PASSES) {
      const ntus = ntuByShells(ctx, passes, maxN);
      if (!ntus.some(Number.isFinite)) { st.reasons['lmtd-correction']++; continue; }
      for (const od of c.tubeOuterDiameters_m ?? DEFAULT_SEARCH_ODS_M) {
        const walls = tubeSizeOf(od)?.walls ?? [14, 16, 18].map((g) => ({ label: `BWG ${g}`, wall_m: BWG_WALL_M[g]! }));
        const pitch = MIN_PITCH_RATIO * od;
        for (const layout of c.layouts ?? DEFAULT_LAYOUTS) {
          const countOf = countsFor(counts, list, od, pitch, layout, passes);
          for (const wall of walls) {
            const dInner = od - 2 * wall.wall_m;
            if (dInner <= 0) continue;
            const fitting = shellsInWindow(list, countOf, passes, dInner, window, lowScale, prevScale);
            if (fitting.length === 0) { st.reasons['shell-size']++; continue; }
            const thin = mats.map((m) => !checkWalls({ tubeOuterDiameter_m: od, tubeWall_m: wall.wall_m, tubeWallLabel: wall.label, tubeMaterial: m.id }, ws).ok);
            if (thin.every(Boolean)) { st.reasons.wall++; continue; }
            for (const { sh, count, holds } of fitting) {
              const shellWall = view ? shellWallOf(sh) : sh.wall_m;
              if (shellWall === null) { st.reasons.wall++; continue; }
              const bundle0: Bundle = { dOuter: od, dInner, count, length: 3, passes, roughness: 1.5e-6, kWall: 50, copperAlloy: false };
              const options = view ? shellOptions(bundle0, sh.innerDiameter_m, pitch, layout, view, method, c.maxTubeLength_m) : null;
              done.fill(0);
              let left = materials.length;
              for (let m = 0; m < materials.length; m++) if (thin[m]) { done[m] = 1; left--; }
              // closest spacing that is not leaky first: each material keeps the first spacing that meets every limit
              for (let o = 0; o < (options ? options.count : 1); o++) {
                const opt = options?.get(o);
                bundle0.kWall = ref.conductivity;
                const base = solveBase(ctx, view, bundle0, opt, ntus);
                if (!base) break;
                for (let m = 0; m < materials.length; m++) {
                  if (done[m]) continue;
                  const matId = materials[m]!;
                  const mat = mats[m]!;
                  const bundle = scratch;
                  bundle.dInner = dInner; bundle.count = count; bundle.passes = passes; bundle.dOuter = od;
                  bundle.kWall = mat.conductivity;
                  bundle.copperAlloy = mat.copperAlloy;
                  st.evaluated++;
                  const r = solveCandidate(st, ctx, view, bundle, base, ref.conductivity, opt, ntus, maxShellDp, sh.innerDiameter_m);
                  if (!r.ok) continue;
                  done[m] = 1;
                  left--;
                  const tubeV = tubeVelocity(bundle, tube.massFlow_kg_s, tubeBulk.density);
                  const tubeRe = (4 * tube.massFlow_kg_s * passes) / (count * Math.PI * dInner * tubeBulk.viscosity);
                  const laminarTube = sides.length > 1 && tube.fluid.phase === 'liquid' && tubeRe < RE_LAMINAR_LIMIT;
                  let findings = 0;
                  if (tube.aqueous && (tubeV < TUBE_WATER_VELOCITY_MIN || tubeV > TUBE_WATER_VELOCITY_MAX)) findings++;
                  if (opt && shellLiquid && (opt.velocity < SHELL_LIQUID_VELOCITY[0] || opt.velocity > SHELL_LIQUID_VELOCITY[1])) findings++;
                  const input: PreInput = {
                    tubeCount: count, tubeLength_m: r.length, tubeOuterDiameter_m: od, tubeWall_m: wall.wall_m, tubeWallLabel: wall.label, tubeMaterial: matId,
                    shellInnerDiameter_m: sh.innerDiameter_m, shellWall_m: shellWall, shellLabel: sh.label, baffleSpacing_m: opt?.shell.baffleSpacing,
                    baffleCut: opt?.shell.baffleCut ?? DEFAULT_BAFFLE_CUT, tubePasses: passes, layout, tubePitch_m: pitch, processSide: side, shellsInSeries: r.shells,
                  };
                  const cost = st.costOf(input);
                  st.pre.push({
                    cost, rank: rankOf(cost, findings, laminarTube), input, bundle: { ...bundle, length: r.length }, shell: opt?.shell, view,
                    ntu: r.ntu, requiredLength: r.required, tubeDp: r.tubeDp, shellDp: r.shellDp, hIn: base.hIn, hOut: base.hOut, holds,
                  });
                }
                if (left === 0) break;
              }
            }
          }
        }
      }
    }
  }
}

/** Total NTU the duty needs with N = 1…maxN shells (index N − 1); Infinity where F < 0.75 or unreachable. */
function ntuByShells(ctx: DutyContext, passes: number, maxN: number): number[] {
  if (!ctx.coolant) return [ctx.wall!.ntu];
  const k = ctx.coolant;
  const eps = (ctx.s.massFlow_kg_s * ctx.cpEff * (ctx.tIn - ctx.tOut)) / (k.cmin * (ctx.tIn - k.tCin));
  const out: number[] = [];
  for (let n = 1; n <= maxN; n++) {
    const ntu = ntuShells(eps, k.cr, passes, n);
    out.push(Number.isFinite(ntu) && lmtdCorrectionShells(ntu, k.cr, passes, n) >= MIN_LMTD_CORRECTION ? ntu : Infinity);
  }
  return out;
}

/**
 * Central spacings across the TEMA window (cut 25 %), each rated once at a nominal length: the
 * shell-side h and ΔP per metre. Closest spacing first (highest h). The span limit is taken for
 * copper alloys (TEMA group B, the shorter one), so every material in the search may use it.
 */
function shellOptions(b: Bundle, dShell: number, pitch: number, layout: Layout, v: SideView, method: ReturnType<typeof shellMethod>, maxLength: number) {
  const spacings = searchBaffleSpacings(baffleSpacingWindow(dShell, b.dOuter, 'copper'));
  const nominal = Math.min(maxLength, Math.max(1, 8 * dShell));
  // every spacing rated once (a shell-side call is well under a microsecond), then ordered: the
  // closest spacing that is not leaky first, leaky ones (J_l < LEAKY_JL) only after all others
  const all: ShellOption[] = spacings.map((spacing) => {
    const shell: ShellGeometry = { dShell, baffleSpacing: spacing, baffleCut: DEFAULT_BAFFLE_CUT, pitch, layout };
    const r = method.rate(prepareFor({ ...b, length: nominal }, shell), v.shell.massFlow_kg_s, v.shellBulk, v.shellBulk.viscosity);
    return { shell, h0: r.h, dpPerM: r.dp.total_Pa / nominal, velocity: r.velocity, leaky: r.corrections.Jl < LEAKY_JL };
  });
  const ordered = [...all.filter((o) => !o.leaky), ...all.filter((o) => o.leaky)];
  return {
    count: ordered.length,
    get: (i: number): ShellOption => ordered[i]!,
  };
}

interface Base {
  /** one shell's length for the first feasible shell count, m */
  length: number;
  first: number;
  u: number;
  hIn: number;
  hOut: number;
}

/** The required length with the reference material (the first in the list): one fixed point per geometry and spacing. */
function solveBase(ctx: DutyContext, view: SideView | undefined, b: Bundle, opt: ShellOption | undefined, ntus: number[]): Base | null {
  const first = ntus.findIndex(Number.isFinite);
  const r = (view ? requiredLengthCoolant(ctx, view, b, ntus[first]!, first + 1, opt!.h0) : { length: requiredLengthWall(ctx, b), u: 0, hIn: 0, hOut: 0 }) as Base;
  r.first = first;
  return Number.isFinite(r.length) ? r : null;
}

/**
 * Limits for one material: its length follows from the reference solution in closed form (only the
 * wall resistance differs: `1/U = 1/U_ref + d_o ln(d_o/d_i)/2 (1/k − 1/k_ref)`; length ∝ 1/U), then
 * the fewest shells in series whose tubes fit the length limit and L/D_s ≤ 15.
 */
/** Rounds a length up to the shop's step, m. */
export function roundUp(x: number, step: number): number {
  return Math.round(Math.ceil(x / step - 1e-9) * step * 1e9) / 1e9;
}

function solveCandidate(st: SearchState, ctx: DutyContext, view: SideView | undefined, b: Bundle, base: Base, kRef: number, opt: ShellOption | undefined, ntus: number[], maxShellDp: number, dShell: number) {
  const c = st.req.constraints;
  const step = st.step;
  const first = base.first;
  let required = base.length;
  if (view && b.kWall !== kRef) required *= 1 + base.u * ((b.dOuter * Math.log(b.dOuter / b.dInner)) / 2) * (1 / b.kWall - 1 / kRef);
  const margin = st.margin ?? 1;
  required *= margin; // sized for the required length × (1 + margin); divided out again below
  let n = first + 1;
  const longest = Math.min(c.maxTubeLength_m, SHELL_ASPECT[1] * dShell);
  if (view && roundUp(required, step) > longest + 1e-9) {
    const total = required * n;
    let m = n;
    while (m < ntus.length && !(Number.isFinite(ntus[m]!) && (total * ntus[m]!) / ntus[first]! / (m + 1) <= longest * 0.98)) m++;
    if (m < ntus.length) {
      n = m + 1;
      required = (total * ntus[m]!) / ntus[first]! / n;
    }
  }
  const length = Math.max(roundUp(required, step), st.minLength ?? 0);
  const out = { ok: false, required: required / margin, length, shells: n, ntu: ntus[n - 1]!, tubeDp: 0, shellDp: 0 };
  if (!(length <= c.maxTubeLength_m + 1e-9)) { st.reasons.length++; return out; }
  if (view && (length / dShell < SHELL_ASPECT[0] || length / dShell > SHELL_ASPECT[1])) { st.reasons['shell-aspect']++; return out; }
  const tube = view?.tube ?? ctx.s;
  const l0 = b.length;
  b.length = length;
  out.tubeDp = n * tubePressureDrop(b, tube.massFlow_kg_s, view?.tubeBulk ?? ctx.bulk).total_Pa;
  b.length = l0;
  if (out.tubeDp > c.maxPressureDrop_Pa) { st.reasons['pressure-drop']++; return out; }
  if (opt) {
    out.shellDp = n * opt.dpPerM * length;
    if (out.shellDp > maxShellDp) { st.reasons['shell-pressure-drop']++; return out; }
  }
  out.ok = true;
  return out;
}

/**
 * Shells whose laid-out tube count gives tube velocities inside the window widened to `lowScale`
 * of its lower end, leaving out those already offered at `prevScale`.
 */
function shellsInWindow(list: ShellList, countOf: (i: number) => number, passes: number, dInner: number, w: { nMin: (a: number) => number; nMax: (a: number) => number }, lowScale: number, prevScale: number) {
  const area = (Math.PI * dInner * dInner) / 4;
  const nMin = Math.max(passes, w.nMin(area) * passes);
  const nMax = (w.nMax(area) / lowScale) * passes;
  const nPrev = (w.nMax(area) / prevScale) * passes;
  const out: { sh: ShellList[number]; count: number; holds: number }[] = [];
  for (let i = 0; i < list.length; i++) {
    const count = countOf(i);
    if (count > nMax) {
      // too slow even in the smallest shell that holds enough: offer that one shell once
      if (out.length === 0 && prevScale === Infinity && count >= nMin && (i === 0 || countOf(i - 1) < nMin)) out.push({ sh: list[i]!, count, holds: count });
      break;
    }
    if (count >= nMin && count > nPrev) out.push({ sh: list[i]!, count, holds: count });
  }
  return out;
}

export { shells as searchShells };
