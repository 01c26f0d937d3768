/**
 * Operating cases (issue 11): a duty may carry up to four cases besides its design point (summer and
 * winter coolant, clean and fouled, turndown flow), each a partial override of the design duty.
 *
 * How the governing case is found and the design chosen: the design point is sized by the full
 * search; each candidate's tube length is then raised to the longest any case needs (its required
 * length from the NTU that case needs, times the design margin, rounded up), the case that set it
 * is the governing case, and a candidate that then breaks a limit in any case is dropped
 * (`sizeWithCases`). The geometry (tubes, shell, baffles) stays the one the design point chose.
 */
import type { CaseResult, Design, OperatingCase, SizeRequest, SizeResult } from '../schemas/thermal';
import { rateRequestFor, type GeometryChoice } from './evaluate';
import { ThermalInputError } from './errors';
import { ntuShellsInSeries } from './exchanger/effectiveness';
import { resolveStream, type StreamInput } from './exchanger/streams';
import { FLOW_FIELDS, type StreamFlow } from './flow-units';
import { rateParsed } from './rate';

/** The name the design point goes by in the case list. */
export const DESIGN_POINT_NAME = 'Design point';

/** 0.05 K: an outlet this close above its target counts as met (the ratings' own solver tolerance is far tighter). */
const OUTLET_TOLERANCE_K = 0.05;

const NO_FLOW: StreamFlow = { massFlow_kg_s: undefined, volumeFlow_m3_s: undefined, standardVolumeFlow_m3_s: undefined, standardReference: undefined };

/**
 * A case's flow for one stream (issue 12): the case's own when it gives one, else the design point's
 * mass flow (a design point given as a volume flow keeps its kg/s, not its m³/h, when a case
 * changes the inlet temperature or pressure).
 */
function caseFlow(base: StreamInput, field: string, override: StreamFlow): StreamFlow {
  const own = Object.values(FLOW_FIELDS).some((f) => override[f] !== undefined);
  if (own) return { ...NO_FLOW, ...Object.fromEntries(Object.entries(override).filter(([, v]) => v !== undefined)) };
  if (base.massFlow_kg_s !== undefined) return {};
  return { ...NO_FLOW, massFlow_kg_s: resolveStream(base, field).massFlow_kg_s };
}

/** Drops the keys set to undefined (a flow the case replaced). */
function defined<T extends object>(o: T): T {
  return Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined)) as T;
}

/** The duty with one case's overrides applied (no cases of its own). */
export function caseDuty(req: SizeRequest, c: OperatingCase): SizeRequest {
  const { cases: _cases, ...base } = req;
  void _cases;
  const b = c.boundary ?? {};
  const boundary: SizeRequest['boundary'] =
    req.boundary.kind === 'wall'
      ? { ...req.boundary, ...(b.wallTemp_C !== undefined ? { wallTemp_C: b.wallTemp_C } : {}) }
      : defined({
          ...req.boundary,
          ...caseFlow(req.boundary, 'boundary', b),
          ...(b.inletTemp_C !== undefined ? { inletTemp_C: b.inletTemp_C } : {}),
          ...(b.pressure_Pa !== undefined ? { pressure_Pa: b.pressure_Pa } : {}),
          ...(b.foulingInside_m2K_W !== undefined ? { foulingInside_m2K_W: b.foulingInside_m2K_W } : {}),
          ...(b.foulingOutside_m2K_W !== undefined ? { foulingOutside_m2K_W: b.foulingOutside_m2K_W } : {}),
        });
  const { massFlow_kg_s, volumeFlow_m3_s, standardVolumeFlow_m3_s, standardReference, ...rest } = c.process ?? {};
  const p = Object.fromEntries(Object.entries(rest).filter(([, v]) => v !== undefined));
  const flow = caseFlow(req.process, 'process', { massFlow_kg_s, volumeFlow_m3_s, standardVolumeFlow_m3_s, standardReference });
  return { ...base, process: defined({ ...req.process, ...flow, ...p }), boundary };
}

/** The design point and each case as sizing requests. */
export function allCases(req: SizeRequest): { name: string; duty: SizeRequest }[] {
  const { cases, ...base } = req;
  return [{ name: DESIGN_POINT_NAME, duty: base }, ...(cases ?? []).map((c) => ({ name: c.name, duty: caseDuty(req, c) }))];
}

/** Rates a design under one case's duty: outlet, pressure drops, band, and whether it meets the case. */
export function rateCase(name: string, duty: SizeRequest, d: Design): CaseResult {
  const r = rateParsed(rateRequestFor(duty, d as GeometryChoice), { profilePoints: 0 });
  const c = duty.constraints;
  const maxShell = c.maxShellPressureDrop_Pa ?? c.maxPressureDrop_Pa;
  const meets =
    r.outletTemp_C <= duty.process.outletTemp_C + OUTLET_TOLERANCE_K &&
    r.pressureDrop.total_Pa <= c.maxPressureDrop_Pa &&
    (r.shellPressureDrop_Pa ?? 0) <= maxShell;
  return {
    name,
    outletTemp_C: r.outletTemp_C,
    pressureDrop_Pa: r.pressureDrop.total_Pa,
    ...(r.shellPressureDrop_Pa !== undefined ? { shellPressureDrop_Pa: r.shellPressureDrop_Pa } : {}),
    ...(r.outletUncertainty_K !== undefined ? { outletUncertainty_K: r.outletUncertainty_K } : {}),
    targetOutletTemp_C: duty.process.outletTemp_C,
    ...(duty.boundary.kind === 'coolant' ? { coolantInletTemp_C: duty.boundary.inletTemp_C } : {}),
    meets,
  };
}

/** Rates a design under every case; a case the bundle cannot run (e.g. the coolant would boil) is reported as not met. */
export function rateAllCases(req: SizeRequest, d: Design): CaseResult[] {
  return allCases(req).map(({ name, duty }) => {
    try {
      return rateCase(name, duty, d);
    } catch (err) {
      if (!(err instanceof ThermalInputError)) throw err;
      // not runnable: reported at the process inlet (no cooling) and not met
      return { name, outletTemp_C: duty.process.inletTemp_C, pressureDrop_Pa: 0, targetOutletTemp_C: duty.process.outletTemp_C, meets: false };
    }
  });
}

/**
 * Length at which design `d` just reaches one case's target, m: from its rating at `length`, the
 * effectiveness the target needs (`ε_req = ε (T_in − T_target)/(T_in − T_out)`, the Cmin stream's
 * temperature change scales with the duty), its NTU through the arrangement's relation (shells in
 * series of 1-n passes; a wall: `ln((T_in − T_w)/(T_target − T_w))`), and the length scaled by
 * NTU_req/NTU (U taken as independent of length), three times. `Infinity` when unreachable.
 */
export function caseRequiredLength(duty: SizeRequest, d: Design): number {
  const target = duty.process.outletTemp_C;
  const tIn = duty.process.inletTemp_C;
  let length = d.tubeLength_m;
  for (let it = 0; it < 3; it++) {
    const r = rateParsed(rateRequestFor(duty, d as GeometryChoice, length), { profilePoints: 0 });
    const ntu = r.ntu ?? 0;
    if (!(ntu > 0) || !(tIn - r.outletTemp_C > 0)) return Infinity;
    let need: number;
    if (duty.boundary.kind === 'wall') {
      const tw = duty.boundary.wallTemp_C;
      if (target <= tw) return Infinity;
      need = Math.log((tIn - tw) / (target - tw));
    } else {
      const dh = tIn - r.outletTemp_C;
      const dc = (r.coolantOutletTemp_C ?? duty.boundary.inletTemp_C) - duty.boundary.inletTemp_C;
      const cr = dc > 0 ? Math.min(dh, dc) / Math.max(dh, dc) : 0;
      const eps = (r.effectiveness ?? 0) * ((tIn - target) / dh);
      need = eps >= 1 ? Infinity : ntuShellsInSeries(eps, cr, d.tubePasses, d.shellsInSeries ?? 1);
    }
    if (!Number.isFinite(need)) return Infinity;
    const next = (length * need) / ntu;
    if (Math.abs(next - length) < 1e-4 * length) return next;
    length = next;
  }
  return length;
}

/** The design `d` re-rated at a longer tube length under the design point (walls do not depend on length). */
function atLength(duty: SizeRequest, d: Design, length: number, required: number, costOf: (d: Design) => number): Design {
  const rating = rateParsed(rateRequestFor(duty, d as GeometryChoice, length), { profilePoints: 21 });
  rating.warnings.push(...d.rating.warnings.filter((w) => /wall/.test(w.code)));
  const out: Design = {
    ...d,
    tubeLength_m: length,
    rating,
    area_m2: rating.area_m2,
    requiredLength_m: required,
    overSurface_pct: (length / required - 1) * 100,
    ...(rating.baffleCount !== undefined ? { baffleCount: rating.baffleCount, inletBaffleSpacing_m: rating.inletBaffleSpacing_m, outletBaffleSpacing_m: rating.outletBaffleSpacing_m } : {}),
  };
  out.cost = costOf(out);
  return out;
}

export interface CaseSizing {
  /** sizes one case-free request (size.ts) */
  sizeOne: (r: SizeRequest) => SizeResult;
  /** the cost function the search ranked with */
  costOf: (d: Design) => number;
  /** the shop's length step, m */
  step: number;
  /** 1 + the design margin */
  margin: number;
}

/**
 * Sizes a duty with operating cases (steps 1–4 in the header, as implemented):
 * 1. The design point is sized (size.ts, with the margin).
 * 2. For each candidate, each case's required length is found (`caseRequiredLength`); the
 *    candidate's tube length becomes the longest of them × (1 + margin), rounded up to the shop's
 *    step (never shorter than it was); the case that set it is that candidate's governing case.
 * 3. A lengthened candidate is re-rated under the design point (evaluate.ts) and dropped when it
 *    breaks the length limit, L/D_s, a pressure-drop limit in any case, or the vibration screen.
 * 4. The first surviving candidate in the search's order is recommended; every candidate carries
 *    `cases`. No survivor: a 422 naming the case that ruled most candidates out.
 */
export function sizeWithCases(req: SizeRequest, how: CaseSizing): SizeResult {
  const cases = allCases(req);
  const base = how.sizeOne(cases[0]!.duty);
  const c = req.constraints;
  const out: Design[] = [];
  const blame = new Map<number, number>();
  const fail = (i: number) => blame.set(i, (blame.get(i) ?? 0) + 1);
  for (const d0 of base.candidates) {
    const need = cases.map(({ duty }) => {
      try {
        return caseRequiredLength(duty, d0);
      } catch (err) {
        if (err instanceof ThermalInputError) return Infinity;
        throw err;
      }
    });
    const worst = need.reduce((w, x, i) => (x > need[w]! ? i : w), 0);
    if (!Number.isFinite(need[worst]!)) { fail(worst); continue; }
    const length = Math.max(d0.tubeLength_m, Math.round(Math.ceil((need[worst]! * how.margin) / how.step - 1e-9) * how.step * 1e9) / 1e9);
    if (length > c.maxTubeLength_m + 1e-9 || (d0.shellInnerDiameter_m && length / d0.shellInnerDiameter_m > 15)) { fail(worst); continue; }
    let d = d0;
    if (length > d0.tubeLength_m + 1e-9) {
      try {
        d = atLength(cases[0]!.duty, d0, length, need[0]!, how.costOf);
      } catch (err) {
        if (err instanceof ThermalInputError) { fail(worst); continue; }
        throw err;
      }
      if (d.rating.vibration && !d.rating.vibration.ok) { fail(worst); continue; }
    }
    const rs = rateAllCases(req, d);
    const bad = rs.findIndex((r) => !r.meets);
    if (bad >= 0) { fail(bad); continue; }
    out.push({ ...d, cases: rs, governingCase: cases[worst]!.name });
  }
  if (out.length === 0) {
    const [i] = [...blame.entries()].sort((a, b) => b[1] - a[1])[0] ?? [0];
    const name = cases[i]!.name;
    throw new ThermalInputError(
      'no-feasible-design',
      `No design meets operating case '${name}' within the limits (${base.candidates.length} designs sized for the design point tried, lengthened as far as the limits allow): relax the case or the limits.`,
      i > 0 ? `cases.${i - 1}` : 'process.outletTemp_C',
    );
  }
  const chosen = out[0]!;
  chosen.recommendedReason = `${base.recommended.recommendedReason ?? ''} Operating cases: ${chosen.governingCase === DESIGN_POINT_NAME ? 'the design point governs' : `'${chosen.governingCase}' governs (it needs the longest tubes; the length was raised for it)`}, and the design is rated under all ${cases.length}.`.trim();
  return { recommended: chosen, candidates: out, evaluated: base.evaluated, feasible: base.feasible, warnings: base.warnings, cases: chosen.cases, governingCase: chosen.governingCase };
}
