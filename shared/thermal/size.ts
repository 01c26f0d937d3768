/**
 * Sizing (issue 3, `POST /api/thermal/size`): search tube OD × wall × material × layout × passes ×
 * shell (tube count = what the shell's laid-out tubesheet holds, shells chosen from the velocity
 * window), solve each candidate's required length, round it up to the shop's length step, rate the
 * rounded design, keep those within every limit and rank them by a cost function.
 *
 * Speed: required lengths are closed-form in NTU with a short fixed point for entrance effects;
 * only candidates that pass the limits on the solved length are rated, cheapest first, until
 * `maxCandidates` rated designs are kept.
 */
import type { Design, SizeRequest, SizeRequestInput, SizeResult } from '../schemas/thermal';
import { sizeRequestSchema } from '../schemas/thermal';
import { costProxy, type CostInput } from './cost-proxy';
import { ThermalInputError, type ThermalWarning } from './errors';
import { ntuCounterflow, ntuFromEffectiveness } from './exchanger/effectiveness';
import { MIN_LMTD_CORRECTION, rateCoolant } from './exchanger/rate-coolant';
import { rateWall } from './exchanger/rate-wall';
import { requiredLengthCoolant, requiredLengthWall, type DutyContext } from './exchanger/required-length';
import { defaultBaffleSpacing, shellPressureDropKern, shellSideKern, type ShellGeometry } from './exchanger/shell-side';
import { tubePressureDrop, type Bundle } from './exchanger/tube-side';
import { tubeCountInShell, type Layout } from './geometry/layout';
import { tubeMaterial } from './geometry/materials';
import { STANDARD_SHELLS } from './geometry/shells';
import { BWG_WALL_M, DEFAULT_SEARCH_ODS_M, MIN_PITCH_RATIO, tubeSizeOf } from './geometry/tubes';
import { dutyContext, velocityWindow } from './size-duty';

export interface SizeOptions {
  /** ranks feasible designs, lower is better; default `costProxy` */
  costOf?: (design: CostInput) => number;
  /** shop's length increment, m; default 0.1 m (request's `constraints.lengthStep_m` wins) */
  lengthStep_m?: number;
  /** rated designs returned in `candidates`; default 25 */
  maxCandidates?: number;
}

/** 0.1 m: default length step, a common cut-length increment for tube bundles (common practice). */
export const DEFAULT_LENGTH_STEP_M = 0.1;
const DEFAULT_MATERIALS = ['carbon-steel', 'stainless-304', 'copper', 'cuni-90-10'];
const DEFAULT_LAYOUTS: Layout[] = [30, 60, 90, 45];
const DEFAULT_PASSES = [1, 2, 4];

type Reason = 'length' | 'pressure-drop' | 'shell-pressure-drop' | 'lmtd-correction' | 'shell-size';
const RELAX: Record<Reason, [string, string]> = {
  length: ['constraints.maxTubeLength_m', 'the maximum tube length (or allow larger shells / more tubes)'],
  'pressure-drop': ['constraints.maxPressureDrop_Pa', 'the tube-side pressure-drop limit (or allow larger tubes / fewer passes)'],
  'shell-pressure-drop': ['constraints.maxShellPressureDrop_Pa', 'the shell-side pressure-drop limit (or lower the coolant flow)'],
  'lmtd-correction': ['constraints.tubePasses', 'the pass arrangement: allow 1 tube pass (counterflow), or accept a larger temperature approach'],
  'shell-size': ['constraints.maxShellInnerDiameter_m', 'the maximum shell diameter'],
};

interface Pre {
  cost: number;
  input: CostInput & { tubePasses: number; layout: Layout; tubePitch_m: number; shellLabel: string; tubeWallLabel: string };
  bundle: Bundle;
  shell?: ShellGeometry;
  requiredLength: number;
}

export function sizeParsed(req: SizeRequest, opts: SizeOptions = {}): SizeResult {
  const c = req.constraints;
  const ctx = dutyContext(req);
  const step = c.lengthStep_m ?? opts.lengthStep_m ?? DEFAULT_LENGTH_STEP_M;
  const costOf = opts.costOf ?? costProxy;
  const window = velocityWindow(ctx.s, ctx.bulk.density);
  const shells = STANDARD_SHELLS.filter((sh) => sh.innerDiameter_m <= (c.maxShellInnerDiameter_m ?? Infinity));
  if (shells.length === 0) throw new ThermalInputError('no-feasible-design', 'No standard shell is as small as the maximum shell diameter.', 'constraints.maxShellInnerDiameter_m');
  const reasons: Record<Reason, number> = { length: 0, 'pressure-drop': 0, 'shell-pressure-drop': 0, 'lmtd-correction': 0, 'shell-size': 0 };
  let pre: Pre[] = [];
  let evaluated = 0;
  const warnings: ThermalWarning[] = [];
  // the velocity window first; if nothing fits, slower tubes (more of them) before giving up
  const counts = new Map<string, (i: number) => number>();
  /** tube counts of each shell for this tube field, divisible by the passes, laid out on first use */
  const countsFor = (od: number, pitch: number, layout: Layout, passes: number) => {
    const key = `${od}|${layout}|${passes}`;
    let f = counts.get(key);
    if (!f) {
      const memo = new Int32Array(shells.length).fill(-1);
      f = (i: number) => {
        if (memo[i]! < 0) memo[i] = Math.floor(tubeCountInShell({ shellInnerDiameter_m: shells[i]!.innerDiameter_m, tubeOuterDiameter_m: od, tubePitch_m: pitch, layout, tubePasses: passes }) / passes) * passes;
        return memo[i]!;
      };
      counts.set(key, f);
    }
    return f;
  };
  let prevScale = Infinity;
  for (const lowScale of [1, 0.5, 0.25, 0.1]) {
    search(lowScale, prevScale);
    prevScale = lowScale;
    if (pre.length > 0) {
      if (lowScale < 1) warnings.push({ code: 'velocity-window-relaxed', message: `No design inside the tube velocity window met the limits; the search allowed velocities down to ${Math.round(lowScale * 100)} % of the window's lower end (expect more fouling).` });
      break;
    }
  }
  function search(lowScale: number, prevScale: number) {
    const ntuFor = (passes: number) => {
      if (!ctx.coolant) return ctx.wall!.ntu;
      const k = ctx.coolant;
      const eps = (ctx.s.massFlow_kg_s * ctx.cpEff * (ctx.tIn - ctx.tOut)) / (k.cmin * (ctx.tIn - k.tCin));
      return ntuFromEffectiveness(eps, k.cr, passes);
    };
    for (const passes of c.tubePasses ?? DEFAULT_PASSES) {
      const ntu = ntuFor(passes);
      if (ctx.coolant && passes > 1) {
        const eps = (ctx.s.massFlow_kg_s * ctx.cpEff * (ctx.tIn - ctx.tOut)) / (ctx.coolant.cmin * (ctx.tIn - ctx.coolant.tCin));
        const f = Number.isFinite(ntu) ? ntuCounterflow(eps, ctx.coolant.cr) / ntu : 0;
        if (f < MIN_LMTD_CORRECTION) { reasons['lmtd-correction']++; continue; }
      }
      for (const od of c.tubeOuterDiameters_m ?? DEFAULT_SEARCH_ODS_M) {
        const walls = tubeSizeOf(od)?.walls ?? [14, 16, 18].map((g) => ({ label: `BWG ${g}`, wall_m: BWG_WALL_M[g]! }));
        const pitch = MIN_PITCH_RATIO * od;
        for (const layout of c.layouts ?? DEFAULT_LAYOUTS) {
          for (const wall of walls) {
            const dInner = od - 2 * wall.wall_m;
            if (dInner <= 0) continue;
            const fitting = shellsInWindow(shells, countsFor(od, pitch, layout, passes), passes, dInner, window, lowScale, prevScale);
            if (fitting.length === 0) { reasons['shell-size']++; continue; }
            for (const { sh, count } of fitting) {
              const shell = ctx.coolant ? { dShell: sh.innerDiameter_m, baffleSpacing: defaultBaffleSpacing(sh.innerDiameter_m, c.maxTubeLength_m), baffleCut: 0.25, pitch, layout } : undefined;
              const shellH0 = shell ? shellSideKern(shell, od, ctx.coolant!.c.massFlow_kg_s, ctx.coolant!.cold, ctx.coolant!.cold.viscosity).h : 0;
              let guess = 3;
              for (const matId of c.materials ?? DEFAULT_MATERIALS) {
                const mat = tubeMaterial(matId)!;
                const bundle: Bundle = { dOuter: od, dInner, count, length: guess, passes, roughness: 1.5e-6, kWall: mat.conductivity, copperAlloy: mat.copperAlloy };
                evaluated++;
                const required = shell ? requiredLengthCoolant(ctx, bundle, shell, ntu, shellH0) : requiredLengthWall(ctx, bundle);
                if (Number.isFinite(required)) guess = required;
                const length = Math.round(Math.ceil(required / step - 1e-9) * step * 1e9) / 1e9;
                if (!(length <= c.maxTubeLength_m + 1e-9)) { reasons.length++; continue; }
                bundle.length = length;
                if (tubePressureDrop(bundle, ctx.s.massFlow_kg_s, ctx.bulk).total_Pa > c.maxPressureDrop_Pa) { reasons['pressure-drop']++; continue; }
                if (shell && c.maxShellPressureDrop_Pa !== undefined) {
                  const k = ctx.coolant!;
                  const side = shellSideKern(shell, od, k.c.massFlow_kg_s, k.cold, k.cold.viscosity);
                  if (shellPressureDropKern(shell, side, length, k.cold, k.cold.viscosity) > c.maxShellPressureDrop_Pa) { reasons['shell-pressure-drop']++; continue; }
                }
                const input = { tubeCount: count, tubeLength_m: length, tubeOuterDiameter_m: od, tubeWall_m: wall.wall_m, tubeWallLabel: wall.label, tubeMaterial: matId, shellInnerDiameter_m: sh.innerDiameter_m, shellWall_m: sh.wall_m, shellLabel: sh.label, baffleSpacing_m: shell?.baffleSpacing, tubePasses: passes, layout, tubePitch_m: pitch };
                pre.push({ cost: costOf(input), input, bundle, shell, requiredLength: required });
              }
            }
          }
        }
      }
    }
  }
  pre.sort((a, b) => a.cost - b.cost);
  const maxKeep = opts.maxCandidates ?? 25;
  const designs: Design[] = [];
  for (const p of pre) {
    if (designs.length >= maxKeep) break;
    const d = rateCandidate(req, ctx, p, step);
    if (d) designs.push(d);
  }
  if (designs.length === 0) throw noFeasible(reasons, evaluated);
  if (designs[0]!.rating.warnings.length) warnings.push(...designs[0]!.rating.warnings);
  return { recommended: designs[0]!, candidates: designs, evaluated, feasible: pre.length, warnings };
}

type ShellList = typeof STANDARD_SHELLS;

/**
 * Shells whose laid-out tube count gives tube velocities inside the window widened to `lowScale`
 * of its lower end, leaving out those already offered at `prevScale`.
 */
function shellsInWindow(shells: ShellList, countOf: (i: number) => number, passes: number, dInner: number, w: { nMin: (a: number) => number; nMax: (a: number) => number }, lowScale: number, prevScale: number) {
  const area = (Math.PI * dInner * dInner) / 4;
  const nMin = Math.max(passes, w.nMin(area) * passes);
  const nMax = (w.nMax(area) / lowScale) * passes;
  const nPrev = (w.nMax(area) / prevScale) * passes;
  const out: { sh: ShellList[number]; count: number }[] = [];
  for (let i = 0; i < shells.length; i++) {
    const count = countOf(i);
    if (count > nMax) {
      // too slow even in the smallest shell that holds enough: offer that one shell once
      if (out.length === 0 && prevScale === Infinity && count >= nMin && (i === 0 || countOf(i - 1) < nMin)) out.push({ sh: shells[i]!, count });
      break;
    }
    if (count >= nMin && count > nPrev) out.push({ sh: shells[i]!, count });
  }
  return out;
}

function rateCandidate(req: SizeRequest, ctx: DutyContext, p: Pre, step: number): Design | null {
  for (let extra = 0; extra < 2; extra++) {
    const bundle = { ...p.bundle, length: Math.round((p.bundle.length + extra * step) * 1e9) / 1e9 };
    let rating;
    try {
      rating = p.shell
        ? rateCoolant(ctx.s, ctx.coolant!.c, bundle, p.shell, ctx.coolant!.fouling, req.correlation, { profilePoints: 21 })
        : rateWall(ctx.s, ctx.wall!.temp, bundle, req.correlation, { profilePoints: 21 });
    } catch {
      return null;
    }
    if (rating.outletTemp_C > ctx.tOut + 1e-6) continue;
    if (rating.pressureDrop.total_Pa > req.constraints.maxPressureDrop_Pa) return null;
    if (req.constraints.maxShellPressureDrop_Pa !== undefined && (rating.shellPressureDrop_Pa ?? 0) > req.constraints.maxShellPressureDrop_Pa) return null;
    if (bundle.length > req.constraints.maxTubeLength_m + 1e-9) return null;
    const area = p.shell ? rating.area_m2 : bundle.count * Math.PI * bundle.dInner * bundle.length;
    return { ...p.input, tubeLength_m: bundle.length, area_m2: area, requiredLength_m: p.requiredLength, overSurface_pct: (bundle.length / p.requiredLength - 1) * 100, cost: p.cost, rating };
  }
  return null;
}

function noFeasible(reasons: Record<Reason, number>, evaluated: number): ThermalInputError {
  const ranked = (Object.entries(reasons) as [Reason, number][]).filter(([, n]) => n > 0).sort((a, b) => b[1] - a[1]);
  const binding = ranked[0]?.[0] ?? 'length';
  const counts = ranked.map(([r, n]) => `${n} × ${r}`).join(', ');
  return new ThermalInputError(
    'no-feasible-design',
    `No design meets every limit (${evaluated} candidates solved; excluded: ${counts || 'none in the velocity window'}). ` +
      `The binding limit is ${binding}: relax ${RELAX[binding][1]}.`,
    RELAX[binding][0],
  );
}

/** Sizes a request body (validated here; a malformed body throws the zod error). */
export function size(request: SizeRequestInput, opts: SizeOptions = {}): SizeResult {
  return sizeParsed(sizeRequestSchema.parse(request), opts);
}

