/**
 * Operating cases (issue 11): a duty may carry up to four cases besides its design point (summer and
 * winter coolant, clean and fouled, turndown flow), each a partial override of the design duty.
 *
 * How the governing case is found and the design chosen:
 * 1. The design point and each case are sized on their own (the full search of size.ts).
 * 2. The governing case is the one whose recommended design has the largest area.
 * 3. Every candidate of the governing sizing (then of the others, largest area first) is rated under
 *    the design point and every case; the first, in the governing sizing's cost order, whose outlet
 *    reaches each case's target within the pressure-drop limits is recommended. A design larger
 *    than the governing case needs is not searched for: when no candidate meets all, the governing
 *    case's recommended design is returned with a `case-not-met` warning naming the cases it misses.
 * 4. The recommended design (and each candidate) carries `cases`: its outlet, pressure drops and
 *    outlet band under the design point and each case.
 */
import type { CaseResult, Design, OperatingCase, SizeRequest, SizeResult } from '../schemas/thermal';
import { rateRequestFor, type GeometryChoice } from './evaluate';
import { ThermalInputError } from './errors';
import { rateParsed } from './rate';

/** The name the design point goes by in the case list. */
export const DESIGN_POINT_NAME = 'Design point';

/** 0.05 K: an outlet this close above its target counts as met (the ratings' own solver tolerance is far tighter). */
const OUTLET_TOLERANCE_K = 0.05;

/** The duty with one case's overrides applied (no cases of its own). */
export function caseDuty(req: SizeRequest, c: OperatingCase): SizeRequest {
  const { cases: _cases, ...base } = req;
  void _cases;
  const b = c.boundary ?? {};
  const boundary: SizeRequest['boundary'] =
    req.boundary.kind === 'wall'
      ? { ...req.boundary, ...(b.wallTemp_C !== undefined ? { wallTemp_C: b.wallTemp_C } : {}) }
      : {
          ...req.boundary,
          ...(b.massFlow_kg_s !== undefined ? { massFlow_kg_s: b.massFlow_kg_s } : {}),
          ...(b.inletTemp_C !== undefined ? { inletTemp_C: b.inletTemp_C } : {}),
          ...(b.pressure_Pa !== undefined ? { pressure_Pa: b.pressure_Pa } : {}),
          ...(b.foulingInside_m2K_W !== undefined ? { foulingInside_m2K_W: b.foulingInside_m2K_W } : {}),
          ...(b.foulingOutside_m2K_W !== undefined ? { foulingOutside_m2K_W: b.foulingOutside_m2K_W } : {}),
        };
  const p = Object.fromEntries(Object.entries(c.process ?? {}).filter(([, v]) => v !== undefined));
  return { ...base, process: { ...req.process, ...p }, boundary };
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
 * Sizes a duty with operating cases (steps 1–4 above). `sizeOne` sizes one case-free request.
 */
export function sizeWithCases(req: SizeRequest, sizeOne: (r: SizeRequest) => SizeResult): SizeResult {
  const cases = allCases(req);
  const sized = cases.map(({ name, duty }, i) => {
    try {
      return { name, result: sizeOne(duty) };
    } catch (err) {
      if (err instanceof ThermalInputError && i > 0) {
        throw new ThermalInputError(err.code, `Operating case '${name}': ${err.message}`, `cases.${i - 1}`);
      }
      throw err;
    }
  });
  const order = [...sized].sort((a, b) => b.result.recommended.area_m2 - a.result.recommended.area_m2);
  const governing = order[0]!;
  let chosen: Design | undefined;
  let chosenFrom = governing;
  for (const s of order) {
    for (const d of s.result.candidates) {
      const rs = rateAllCases(req, d);
      if (rs.every((r) => r.meets)) {
        chosen = { ...d, cases: rs };
        chosenFrom = s;
        break;
      }
    }
    if (chosen) break;
  }
  const warnings = [...governing.result.warnings];
  if (!chosen) {
    const d = governing.result.recommended;
    const rs = rateAllCases(req, d);
    chosen = { ...d, cases: rs };
    const missed = rs.filter((r) => !r.meets).map((r) => `'${r.name}'`).join(', ');
    warnings.push({ code: 'case-not-met', message: `No design the search found meets every operating case: the design sized for the governing case '${governing.name}' misses ${missed} (outlet above its target or a pressure drop over its limit).` });
  }
  chosen.governingCase = governing.name;
  chosen.recommendedReason = `${chosen.recommendedReason ?? ''} Sized for the governing operating case '${governing.name}' (the one needing the largest area, ${governing.result.recommended.area_m2.toFixed(1)} m²) and rated under all ${cases.length}.`.trim();
  const others = chosenFrom.result.candidates.filter((d) => d.cost !== chosen!.cost || d.tubeLength_m !== chosen!.tubeLength_m || d.tubeCount !== chosen!.tubeCount);
  const candidates = [chosen, ...others.map((d) => ({ ...d, cases: rateAllCases(req, d), governingCase: governing.name }))];
  return {
    recommended: chosen,
    candidates,
    evaluated: sized.reduce((n, s) => n + s.result.evaluated, 0),
    feasible: sized.reduce((n, s) => n + s.result.feasible, 0),
    warnings,
    cases: chosen.cases,
    governingCase: governing.name,
  };
}
