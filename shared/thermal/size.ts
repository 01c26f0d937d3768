/**
 * Sizing (`POST /api/thermal/size`): the enumeration in size-search.ts (process side × passes ×
 * tube OD × layout × wall × shell × baffle spacing × material × shells in series, lengths solved in
 * closed form, limits on both sides), then only the best few per allocation × shells and the
 * trade-off extremes are refined (baffle cut 20–35 %) and rated; the rated designs are ranked by
 * the cost function (with a soft penalty for velocities outside their windows), de-duplicated, and
 * the recommended one says why it and its allocation won.
 */
import type { Design, ProcessSide, SizeRequest, SizeRequestInput, SizeResult } from '../schemas/thermal';
import { sizeRequestSchema } from '../schemas/thermal';
import { allocationReason, processSides } from './allocation';
import { costProxy, type CostInput } from './cost-proxy';
import { ThermalInputError, type ThermalWarning } from './errors';
import { checkWalls, designWallFields, wallSides } from './checks/walls';
import { constructionFor } from './checks/construction';
import { designNozzles } from './checks/nozzles';
import { prepareFor, rateCoolant } from './exchanger/rate-coolant';
import { rateWall } from './exchanger/rate-wall';
import { requiredLengthCoolant, type DutyContext } from './exchanger/required-length';
import { shellMethod } from './exchanger/shell-methods';
import { SHELL_ASPECT } from './exchanger/shell-side';
import { bafflePlan, SEARCH_BAFFLE_CUTS } from './geometry/baffles';
import { designTieRods } from './geometry/layout';
import { sizeWithCases } from './size-cases';
import { assertDutyWithinShop, beyondShopShell, shopShellBinds, withinShop, type ShopLimits } from './shop-limits';
import { dutyContext } from './size-duty';
import { distinct, distinctKey, spanning } from './size-pick';
import { rankOf, search, searchShells, type Pre, type Reason, type SearchState } from './size-search';

export interface SizeOptions {
  /** ranks feasible designs, lower is better; default `costProxy` */
  costOf?: (design: CostInput) => number;
  /** shop's length increment, m; default 0.1 m (request's `constraints.lengthStep_m` wins) */
  lengthStep_m?: number;
  /** distinct designs returned in `candidates`; default 12 */
  maxCandidates?: number;
  /** the fabricator's design margin on area, % (price book `designMargin_pct`); the request may ask for more, never less */
  designMargin_pct?: number;
  /** the shop's shortest bundle and largest shell (price book, issue 12): a duty below them is refused, no design outside them offered */
  shop?: ShopLimits;
}

/** 0.1 m: default length step, a common cut-length increment for tube bundles (common practice). */
export const DEFAULT_LENGTH_STEP_M = 0.1;
/** 200: candidates rated beyond the spanning set when all of those fail the vibration screen (bounds the time). */
const VIBRATION_RETRIES = 200;
/** 12: alternatives returned by default (enough to span the trade-offs, few enough to read). */
const DEFAULT_MAX_CANDIDATES = 12;

const RELAX: Record<Reason, [string, string]> = {
  length: ['constraints.maxTubeLength_m', 'the maximum tube length (or allow larger shells, more tubes or more shells in series)'],
  'pressure-drop': ['constraints.maxPressureDrop_Pa', 'the tube-side pressure-drop limit (or allow larger tubes / fewer passes)'],
  'shell-pressure-drop': ['constraints.maxShellPressureDrop_Pa', 'the shell-side pressure-drop limit (it defaults to the tube-side limit), or lower the shell-side flow'],
  'lmtd-correction': ['constraints.tubePasses', 'the pass arrangement: allow 1 tube pass (counterflow) or more shells in series, or accept a larger temperature approach'],
  'shell-size': ['constraints.maxShellInnerDiameter_m', 'the maximum shell diameter'],
  vibration: ['constraints.maxShellPressureDrop_Pa', 'the shell-side pressure-drop limit (closer baffles shorten the tube spans) or lower the shell-side flow: the designs within every other limit fail the vibration screen (fluid-elastic instability by Connors or vortex lock-in at a window span)'],
  wall: ['process.design', 'the design pressure (or allow other tube materials, gauges or rolled shells): the walls on offer are too thin for it (ASME VIII-1 UG-27 with corrosion allowance and minimum gauge)'],
  nozzle: ['constraints.maxShellInnerDiameter_m', 'the maximum shell diameter (or lower a flow): the nozzles these flows need are wider than half the shells within every other limit (common practice)'],
  'shell-aspect': ['constraints.maxTubeLength_m', `the length: one shell's tube length over its diameter stays within ${SHELL_ASPECT[0]}–${SHELL_ASPECT[1]} (common practice); allow longer tubes or more shells in series`],
};

/** Sizes a parsed request; with operating cases, for the governing one, rating all (size-cases.ts). */
export function sizeParsed(req: SizeRequest, opts: SizeOptions = {}): SizeResult {
  if (!opts.shop) return sizeAll(req, opts);
  assertDutyWithinShop(req, opts.shop);
  try {
    return sizeAll(withinShop(req, opts.shop), opts);
  } catch (err) {
    if (!(err instanceof ThermalInputError && err.code === 'no-feasible-design' && shopShellBinds(req, opts.shop))) throw err;
    // nothing within the shop's largest shell: when a larger shell would do, say that the shop's limit is what binds
    let wider: SizeResult;
    try {
      wider = sizeAll(req, opts);
    } catch {
      throw err;
    }
    throw beyondShopShell(wider.recommended, opts.shop);
  }
}

function sizeAll(req: SizeRequest, opts: SizeOptions): SizeResult {
  if (req.cases?.length) {
    return sizeWithCases(req, {
      sizeOne: (r) => sizeOne(r, opts),
      costOf: (d) => (opts.costOf ?? costProxy)(d as CostInput),
      step: req.constraints.lengthStep_m ?? opts.lengthStep_m ?? DEFAULT_LENGTH_STEP_M,
      margin: 1 + designMarginOf(req, opts) / 100,
    });
  }
  return sizeOne(req, opts);
}

/** The design margin a sizing applies, %: the request's, at least the fabricator's (`opts`). */
export function designMarginOf(req: SizeRequest, opts: SizeOptions = {}): number {
  return Math.max(req.constraints.designMargin_pct ?? 0, opts.designMargin_pct ?? 0);
}

function sizeOne(req: SizeRequest, opts: SizeOptions): SizeResult {
  const c = req.constraints;
  const ctx = dutyContext(req);
  const marginPct = designMarginOf(req, opts);
  const st: SearchState = {
    req, ctx, step: c.lengthStep_m ?? opts.lengthStep_m ?? DEFAULT_LENGTH_STEP_M, costOf: opts.costOf ?? costProxy, margin: 1 + marginPct / 100,
    minLength: opts.shop?.minTubeLength_m,
    reasons: { length: 0, 'pressure-drop': 0, 'shell-pressure-drop': 0, 'lmtd-correction': 0, 'shell-size': 0, 'shell-aspect': 0, wall: 0, vibration: 0, nozzle: 0 }, evaluated: 0, pre: [],
  };
  if (searchShells(req).length === 0) {
    throw new ThermalInputError('no-feasible-design', 'No standard shell is as small as the maximum shell diameter.', 'constraints.maxShellInnerDiameter_m');
  }
  const alloc = processSides(req, ctx.s);
  const warnings: ThermalWarning[] = [];
  const counts = new Map<string, (i: number) => number>();
  // the velocity window first; if nothing fits, slower tubes (more of them) before giving up
  let prevScale = Infinity;
  for (const lowScale of [1, 0.5, 0.25, 0.1]) {
    search(st, alloc.sides, lowScale, prevScale, counts);
    prevScale = lowScale;
    if (st.pre.length > 0) {
      if (lowScale < 1) warnings.push({ code: 'velocity-window-relaxed', message: `No design inside the tube velocity window met the limits; the search allowed velocities down to ${Math.round(lowScale * 100)} % of the window's lower end (expect more fouling).` });
      break;
    }
  }
  const maxKeep = opts.maxCandidates ?? DEFAULT_MAX_CANDIDATES;
  const pick = (p: Pre) => ({ rank: p.rank, cost: p.cost, side: p.input.processSide, shells: p.input.shellsInSeries, tubeDp: p.tubeDp, shellDp: p.shellDp, length: p.input.tubeLength_m, key: distinctKey(p.input), p });
  const toRate = spanning(distinct(st.pre.map(pick)), Math.max(maxKeep * 2, 24), 3);
  const rated: { d: Design; rank: number; key: string }[] = [];
  const rateInto = (p: Pre) => {
    const d = rateCandidate(st, refineCut(st, p));
    if (!d) return;
    const findings = d.rating.warnings.filter((w) => /velocity-(low|high)$/.test(w.code)).length;
    const tubeLiquid = ((d.processSide ?? 'tubes') === 'tubes' ? ctx.s : ctx.coolant?.c ?? ctx.s).fluid.phase === 'liquid';
    const laminarTube = alloc.sides.length > 1 && tubeLiquid && d.rating.regime === 'laminar';
    rated.push({ d, rank: rankOf(d.cost, findings, laminarTube), key: distinctKey(d) });
  };
  for (const { p } of toRate) rateInto(p);
  // every spanning candidate failed the vibration screen: the next ones by rank (closer spacings among them)
  if (rated.length === 0 && st.reasons.vibration > 0) {
    const tried = new Set(toRate.map((r) => r.p));
    for (const p of st.pre.filter((x) => !tried.has(x)).sort((a, b) => a.rank - b.rank).slice(0, VIBRATION_RETRIES)) {
      rateInto(p);
      if (rated.length >= maxKeep) break;
    }
  }
  if (rated.length === 0) throw noFeasible(st.reasons, st.evaluated);
  const sorted = distinct(rated).map((r) => ({ ...r, side: r.d.processSide ?? 'tubes', shells: r.d.shellsInSeries ?? 1, cost: r.d.cost, tubeDp: r.d.rating.pressureDrop.total_Pa, shellDp: r.d.rating.shellPressureDrop_Pa ?? 0, length: r.d.tubeLength_m }));
  const chosen = spanning(sorted, maxKeep).map((r) => r.d);
  explain(ctx, chosen, alloc.rule, sorted.map((r) => r.d));
  if (marginPct > 0) for (const d of chosen) d.designMargin_pct = marginPct;
  const recommended = chosen[0]!;
  if (recommended.rating.warnings.length) warnings.push(...recommended.rating.warnings);
  return { recommended, candidates: chosen, evaluated: st.evaluated, feasible: st.pre.length, warnings };
}

/**
 * Baffle cut for a candidate about to be rated: each searched cut (20–35 %) at its spacing and
 * rounded length; the one giving the shortest bundle within the shell-side limit wins (ties: the
 * lower shell ΔP).
 */
function refineCut(st: SearchState, p: Pre): Pre {
  if (!p.shell || !p.view) return p;
  const c = st.req.constraints;
  const maxShellDp = c.maxShellPressureDrop_Pa ?? c.maxPressureDrop_Pa;
  const method = shellMethod(st.req.shellMethod);
  const n = p.input.shellsInSeries;
  let best = p;
  let bestLen = Infinity;
  let bestDp = Infinity;
  for (const cut of SEARCH_BAFFLE_CUTS) {
    const shell = { ...p.shell, baffleCut: cut };
    // the shell side at the length it will need (baffle count and end zones follow the length), twice
    let side = method.rate(prepareFor(p.bundle, shell), p.view.shell.massFlow_kg_s, p.view.shellBulk, p.view.shellBulk.viscosity);
    let r = requiredLengthCoolant(st.ctx, p.view, p.bundle, p.ntu, n, side.h);
    if (!Number.isFinite(r.length)) continue;
    // the baffle count is whole, so h steps with the length: iterate to a consistent pair (the longer on a step)
    for (let it = 0; it < 4; it++) {
      side = method.rate(prepareFor({ ...p.bundle, length: r.length }, shell), p.view.shell.massFlow_kg_s, p.view.shellBulk, p.view.shellBulk.viscosity);
      const next = requiredLengthCoolant(st.ctx, p.view, { ...p.bundle, length: r.length }, p.ntu, n, side.h);
      const settled = Math.abs(next.length - r.length) < 1e-5 * r.length;
      if (it === 3 && next.length < r.length) break;
      r = next;
      if (settled) break;
    }
    const length = Math.max(Math.round(Math.ceil((r.length * (st.margin ?? 1)) / st.step - 1e-9) * st.step * 1e9) / 1e9, st.minLength ?? 0);
    const dp = n * side.dp.total_Pa * (length / r.length);
    if (!(length <= c.maxTubeLength_m + 1e-9) || dp > maxShellDp) continue;
    if (r.length < bestLen - 1e-6 || (Math.abs(r.length - bestLen) <= 1e-6 && dp < bestDp)) {
      const input = { ...p.input, baffleCut: cut, tubeLength_m: length };
      best = { ...p, shell, input, bundle: { ...p.bundle, length }, requiredLength: r.length, shellDp: dp, cost: st.costOf(input) };
      bestLen = r.length;
      bestDp = dp;
    }
  }
  return best;
}

function rateCandidate(st: SearchState, p: Pre): Design | null {
  const { req, ctx, step } = st;
  const c = req.constraints;
  const maxShellDp = c.maxShellPressureDrop_Pa ?? c.maxPressureDrop_Pa;
  const n = p.input.shellsInSeries;
  for (let extra = 0; extra < 2; extra++) {
    const bundle = { ...p.bundle, length: Math.round((p.bundle.length + extra * step) * 1e9) / 1e9 };
    let rating;
    try {
      rating = p.shell
        ? rateCoolant(ctx.s, ctx.coolant!.c, bundle, p.shell, p.view!.fouling, req.correlation, { profilePoints: 21 }, { processSide: p.input.processSide, shells: n, method: req.shellMethod, holds: p.holds, tubeMaterial: p.input.tubeMaterial })
        : rateWall(ctx.s, ctx.wall!.temp, bundle, req.correlation, { profilePoints: 21 });
    } catch {
      return null;
    }
    if (rating.outletTemp_C > ctx.tOut + 1e-6) continue;
    if (rating.pressureDrop.total_Pa > c.maxPressureDrop_Pa) return null;
    if (p.shell && (rating.shellPressureDrop_Pa ?? 0) > maxShellDp) return null;
    if (bundle.length > c.maxTubeLength_m + 1e-9) return null;
    if (p.shell && bundle.length / p.shell.dShell > SHELL_ASPECT[1]) return null;
    if (rating.vibration && !rating.vibration.ok) { st.reasons.vibration++; return null; }
    if (rating.nozzlesOk === false) { st.reasons.nozzle++; return null; }
    const area = p.shell ? rating.area_m2 : bundle.count * Math.PI * bundle.dInner * bundle.length;
    const plan = p.shell ? bafflePlan(bundle.length, p.shell.baffleSpacing, p.shell.dShell) : undefined;
    const input = { ...p.input, tubeLength_m: bundle.length, baffleCount: plan?.count };
    const walls = checkWalls(input, wallSides(req, p.input.processSide));
    if (!walls.ok) { st.reasons.wall++; return null; }
    rating.warnings.push(...walls.findings);
    // nozzles and construction (issue 11) before the cost: the price follows them
    const nozzles = rating.nozzles ? designNozzles(rating.nozzles) : undefined;
    const cons = p.shell ? constructionFor(req, { processSide: p.input.processSide, tubePasses: bundle.passes, rating }) : undefined;
    const { shellWall_m: _w, ...design } = input;
    void _w;
    return {
      ...design,
      ...designWallFields(walls),
      ...(p.shell ? designTieRods(input) : {}),
      ...(nozzles ? { nozzles } : {}),
      ...cons,
      ...(plan ? { inletBaffleSpacing_m: plan.inlet, outletBaffleSpacing_m: plan.outlet } : { baffleCut: undefined, baffleCount: undefined }),
      area_m2: area, requiredLength_m: p.requiredLength, overSurface_pct: (bundle.length / p.requiredLength - 1) * 100, cost: st.costOf({ ...input, nozzles, construction: cons?.construction }), rating,
    };
  }
  return null;
}

/** The process-side coefficient of a design: the tube side's if the process is in the tubes, else the shell side's. */
const processH = (d: Design) => ((d.processSide ?? 'tubes') === 'tubes' ? d.rating.htc_W_m2K : (d.rating.shellHtc_W_m2K ?? 0));

/** Writes `allocationReason` on every chosen design and `recommendedReason` on the first. */
function explain(ctx: DutyContext, chosen: Design[], rule: string | undefined, all: Design[]): void {
  if (!ctx.coolant) {
    for (const d of chosen) d.allocationReason = 'The process is in the tubes: a wall boundary (a bath or a condensing/boiling shell side) cools the tubes.';
    chosen[0]!.recommendedReason = `The cheapest of the designs within every limit (${all.length} rated).`;
    return;
  }
  const best = new Map<ProcessSide, Design>();
  for (const d of all) if (!best.has(d.processSide!)) best.set(d.processSide!, d);
  for (const d of chosen) {
    const other = best.get(d.processSide === 'tubes' ? 'shell' : 'tubes');
    d.allocationReason = allocationReason(ctx.s, ctx.coolant.c, { side: d.processSide!, tubeH: d.rating.htc_W_m2K, shellH: d.rating.shellHtc_W_m2K ?? 0, tubeRe: d.rating.reynolds, otherProcessH: other ? processH(other) : undefined }, rule);
  }
  const r = chosen[0]!;
  const other = best.get(r.processSide === 'tubes' ? 'shell' : 'tubes');
  const where = r.processSide === 'tubes' ? 'in the tubes' : 'on the shell side';
  const kpa = (x: number | undefined) => `${((x ?? 0) / 1000).toFixed(0)} kPa`;
  const shells = (r.shellsInSeries ?? 1) > 1 ? ` ${r.shellsInSeries} shells in series keep each shell's tubes within the length limit and L/D_s ≤ 15 with F ≥ 0.75.` : '';
  let why: string;
  if (other) {
    const pct = other.cost !== 0 ? Math.round((1 - r.cost / other.cost) * 100) : 0;
    why = `With the process ${where} it is the cheapest design within every limit: ${pct >= 0 ? `${pct} % below` : `${-pct} % above (the cheaper one breaks a velocity window)`} the best design with the process ${other.processSide === 'tubes' ? 'in the tubes' : 'on the shell side'} ` +
      `(U ${Math.round(r.rating.overallU_W_m2K ?? 0)} against ${Math.round(other.rating.overallU_W_m2K ?? 0)} W/m²K; tube ΔP ${kpa(r.rating.pressureDrop.total_Pa)} against ${kpa(other.rating.pressureDrop.total_Pa)}, shell ΔP ${kpa(r.rating.shellPressureDrop_Pa)} against ${kpa(other.rating.shellPressureDrop_Pa)}).`;
  } else {
    why = `The cheapest design within every limit with the process ${where}${rule ? ` (${rule})` : ''}: U ${Math.round(r.rating.overallU_W_m2K ?? 0)} W/m²K, tube ΔP ${kpa(r.rating.pressureDrop.total_Pa)}, shell ΔP ${kpa(r.rating.shellPressureDrop_Pa)}.`;
  }
  r.recommendedReason = why + shells;
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
