/**
 * Evaluates a geometry someone chose by hand (a sales engineer's edit) against a duty: rates it as
 * given and finds the length the same bundle would need to just reach the target outlet, so the
 * margin (over-surface) can be shown beside the hand-made design, exactly as for a sized one.
 * Pure; used by the server (authority) and by the workspace for an instant preview.
 */
import type { Design, ProcessSide, RateRequest, RateResult, SizeRequest } from '../schemas/thermal';
import { allocationReason, foulingFor } from './allocation';
import { costProxy, type CostInput } from './cost-proxy';
import { checkWalls, designWallFields, wallSides } from './checks/walls';
import { constructionFor } from './checks/construction';
import { designNozzles } from './checks/nozzles';
import { ThermalInputError } from './errors';
import { defaultBaffleSpacing } from './exchanger/shell-side';
import { resolveStream } from './exchanger/streams';
import { bafflePlan, DEFAULT_BAFFLE_CUT } from './geometry/baffles';
import { STANDARD_SHELLS } from './geometry/shells';
import { MIN_PITCH_RATIO, tubeSizeOf } from './geometry/tubes';
import { designTieRods, type Layout } from './geometry/layout';
import { rateParsed } from './rate';
import { rateAllCases } from './size-cases';

export interface GeometryChoice {
  tubeCount: number;
  tubeLength_m: number;
  tubeOuterDiameter_m: number;
  tubeWall_m: number;
  tubeMaterial: string;
  tubePasses: number;
  layout: Layout;
  shellInnerDiameter_m: number;
  baffleSpacing_m?: number;
  tubePitch_m?: number;
  /** issue 10; absent on designs stored before it: process in the tubes, one shell, 25 % cut */
  processSide?: ProcessSide;
  shellsInSeries?: number;
  baffleCut?: number;
  inletBaffleSpacing_m?: number;
  outletBaffleSpacing_m?: number;
}

/** The rate request that puts `g` under the duty's streams, boundary, fouling and correlation. */
export function rateRequestFor(duty: SizeRequest, g: GeometryChoice, length = g.tubeLength_m): RateRequest {
  const { outletTemp_C: _target, ...process } = duty.process;
  const pitch = g.tubePitch_m ?? MIN_PITCH_RATIO * g.tubeOuterDiameter_m;
  const b = duty.boundary;
  const side = g.processSide ?? 'tubes';
  // fouling per side as the search uses it: the request's values, else each fluid's default
  const fouling = b.kind === 'coolant' ? foulingFor(duty, resolveStream(duty.process, 'process'), resolveStream(b, 'boundary'), side) : undefined;
  const boundary: RateRequest['boundary'] =
    b.kind === 'wall'
      ? b
      : {
          ...b,
          shellInnerDiameter_m: g.shellInnerDiameter_m,
          baffleSpacing_m: g.baffleSpacing_m ?? b.baffleSpacing_m,
          baffleCut: g.baffleCut ?? b.baffleCut,
          inletBaffleSpacing_m: g.inletBaffleSpacing_m ?? b.inletBaffleSpacing_m,
          outletBaffleSpacing_m: g.outletBaffleSpacing_m ?? b.outletBaffleSpacing_m,
          tubePitch_m: pitch,
          layout: g.layout,
          foulingInside_m2K_W: fouling!.inside,
          foulingOutside_m2K_W: fouling!.outside,
        };
  return {
    process,
    boundary,
    geometry: {
      tubeOuterDiameter_m: g.tubeOuterDiameter_m,
      tubeWall_m: g.tubeWall_m,
      tubeCount: g.tubeCount,
      tubeLength_m: length,
      tubePasses: g.tubePasses,
      roughness_m: 1.5e-6,
      tubeMaterial: g.tubeMaterial,
      processSide: side,
      shellsInSeries: g.shellsInSeries ?? 1,
    },
    correlation: duty.correlation,
    shellMethod: duty.shellMethod,
  };
}

/**
 * Length at which this bundle just reaches the duty's target outlet, by bisection on the rating
 * (the outlet falls monotonically with length). `Infinity` when even 200 m would not reach it.
 */
export function requiredLengthOf(duty: SizeRequest, g: GeometryChoice): number {
  const target = duty.process.outletTemp_C;
  const outletAt = (L: number) => rateParsed(rateRequestFor(duty, g, L), { profilePoints: 0 }).outletTemp_C;
  let hi = Math.max(g.tubeLength_m, 0.05);
  while (outletAt(hi) > target) {
    hi *= 2;
    if (hi > 200) return Infinity;
  }
  let lo = 0;
  for (let i = 0; i < 60 && hi - lo > 1e-5; i++) {
    const mid = 0.5 * (lo + hi);
    if (outletAt(mid) > target) lo = mid;
    else hi = mid;
  }
  return hi;
}

const wallLabel = (od: number, wall: number) =>
  tubeSizeOf(od)?.walls.find((w) => Math.abs(w.wall_m - wall) < 2e-5)?.label ?? `${(wall * 1000).toFixed(2)} mm`;
const shellLabel = (d: number) =>
  STANDARD_SHELLS.find((s) => Math.abs(s.innerDiameter_m - d) < 5e-4)?.label ?? `${Math.round(d * 1000)} mm ID`;

/** A full `Design` (rating, area, margin, cost) for a hand-chosen geometry under a duty. */
export function evaluateDesign(duty: SizeRequest, g: GeometryChoice, costOf: (d: CostInput) => number = costProxy): Design {
  if (g.tubeCount % g.tubePasses !== 0) {
    throw new ThermalInputError('tube-count-passes', `${g.tubeCount} tubes cannot be shared evenly among ${g.tubePasses} passes.`, 'design.tubeCount');
  }
  const rating: RateResult = rateParsed(rateRequestFor(duty, g));
  const required = requiredLengthOf(duty, g);
  const reachable = Number.isFinite(required);
  if (!reachable) {
    rating.warnings.push({
      code: 'cannot-reach-target',
      message: `This bundle cannot reach the target outlet ${duty.process.outletTemp_C} °C at any practical length: more tubes per pass, another coolant flow or another layout is needed.`,
    });
  } else if (rating.outletTemp_C > duty.process.outletTemp_C + 0.05) {
    rating.warnings.push({
      code: 'short-of-target',
      message: `At ${g.tubeLength_m} m the outlet is ${rating.outletTemp_C.toFixed(1)} °C, warmer than the target ${duty.process.outletTemp_C} °C: the tubes need about ${required.toFixed(2)} m.`,
    });
  }
  const base = {
    tubeCount: g.tubeCount,
    tubeLength_m: g.tubeLength_m,
    tubePasses: g.tubePasses,
    tubeOuterDiameter_m: g.tubeOuterDiameter_m,
    tubeWall_m: g.tubeWall_m,
    tubeWallLabel: wallLabel(g.tubeOuterDiameter_m, g.tubeWall_m),
    tubeMaterial: g.tubeMaterial,
    layout: g.layout,
    tubePitch_m: g.tubePitch_m ?? MIN_PITCH_RATIO * g.tubeOuterDiameter_m,
    shellInnerDiameter_m: g.shellInnerDiameter_m,
    shellLabel: shellLabel(g.shellInnerDiameter_m),
    baffleSpacing_m: g.baffleSpacing_m ?? defaultBaffleSpacing(g.shellInnerDiameter_m, g.tubeLength_m),
    processSide: g.processSide ?? 'tubes',
    shellsInSeries: g.shellsInSeries ?? 1,
    ...(duty.boundary.kind === 'coolant'
      ? {
          baffleCut: g.baffleCut ?? DEFAULT_BAFFLE_CUT,
          baffleCount: rating.baffleCount ?? bafflePlan(g.tubeLength_m, g.baffleSpacing_m ?? defaultBaffleSpacing(g.shellInnerDiameter_m, g.tubeLength_m), g.shellInnerDiameter_m).count,
          inletBaffleSpacing_m: rating.inletBaffleSpacing_m,
          outletBaffleSpacing_m: rating.outletBaffleSpacing_m,
        }
      : {}),
  };
  // walls for pressure: a hand-set wall thinner than its side needs keeps the design, with the hard finding
  const walls = checkWalls(base, wallSides(duty, base.processSide));
  rating.warnings.push(...walls.findings);
  const allocation =
    duty.boundary.kind === 'coolant'
      ? allocationReason(resolveStream(duty.process, 'process'), resolveStream(duty.boundary, 'boundary'), { side: base.processSide, tubeH: rating.htc_W_m2K, shellH: rating.shellHtc_W_m2K ?? 0, tubeRe: rating.reynolds })
      : 'The process is in the tubes: a wall boundary (a bath or a condensing/boiling shell side) cools the tubes.';
  const design: Design = {
    ...base,
    ...designWallFields(walls),
    ...(duty.boundary.kind === 'coolant' ? designTieRods(base) : {}),
    // nozzles and construction (issue 11): a nozzle wider than half the shell stays as a hard finding in the warnings
    ...(rating.nozzles ? { nozzles: designNozzles(rating.nozzles) } : {}),
    ...constructionFor(duty, { processSide: base.processSide, tubePasses: g.tubePasses, rating }),
    area_m2: rating.area_m2,
    // an unreachable target is reported as a margin of −100 % with the warning above
    requiredLength_m: reachable ? required : g.tubeLength_m * 100,
    overSurface_pct: reachable ? (g.tubeLength_m / required - 1) * 100 : -100,
    cost: costOf(base),
    allocationReason: allocation,
    rating,
  };
  // operating cases (issue 11): the hand-set design rated under the design point and each case
  if (duty.cases?.length) design.cases = rateAllCases(duty, design);
  return design;
}
