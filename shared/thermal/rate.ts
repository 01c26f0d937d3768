/**
 * Rating: a given geometry → outlet temperatures, duty, pressure drops (issue 3, `POST /api/thermal/rate`).
 *
 * The product sizes coolers: the process stream is the hot one, in the tubes (default) or on the
 * shell side (`geometry.processSide`), in one to four shells in series. A wall boundary keeps the
 * process in the tubes. A wall or coolant at or above the process inlet (a heating duty) is refused
 * with `not-a-cooler` rather than computed. Fouling given on the boundary is per side (inside = tube
 * side, outside = shell side, whichever fluid is there); absent, each side takes its fluid's default
 * (allocation.ts, domain brief 2.3), as the sizing search does.
 */
import type { RateRequest, RateRequestInput, RateResult } from '../schemas/thermal';
import { rateRequestSchema } from '../schemas/thermal';
import { ThermalInputError } from './errors';
import { defaultFouling } from './allocation';
import { rateCoolant } from './exchanger/rate-coolant';
import { rateWall, type RateOptions } from './exchanger/rate-wall';
import { defaultBaffleSpacing, type ShellGeometry } from './exchanger/shell-side';
import { DEFAULT_BAFFLE_CUT } from './geometry/baffles';
import { requireFinite, resolveStream, type Stream } from './exchanger/streams';
import type { Bundle } from './exchanger/tube-side';
import { MIN_PITCH_RATIO } from './geometry/tubes';
import { tubeCountInShell, type Layout } from './geometry/layout';
import { tubeMaterial } from './geometry/materials';
import { STANDARD_SHELLS } from './geometry/shells';

export type { RateOptions };

export function bundleOf(g: RateRequest['geometry']): Bundle {
  const material = tubeMaterial(g.tubeMaterial);
  if (!material) throw new ThermalInputError('unknown-material', `Unknown tube material '${g.tubeMaterial}'.`, 'geometry.tubeMaterial');
  return {
    dOuter: g.tubeOuterDiameter_m,
    dInner: g.tubeOuterDiameter_m - 2 * g.tubeWall_m,
    count: g.tubeCount,
    length: g.tubeLength_m,
    passes: g.tubePasses,
    roughness: g.roughness_m,
    kWall: material.conductivity,
    copperAlloy: material.copperAlloy,
    nozzleDiameter: g.nozzleDiameter_m,
  };
}

/** Refuses a heating duty: the process (tube side) must enter hotter than the wall or coolant. */
export function requireCooling(processInlet_C: number, sinkTemp_C: number, sinkField: string, what: string): void {
  if (!(processInlet_C > sinkTemp_C)) {
    throw new ThermalInputError(
      'not-a-cooler',
      `The process enters at ${processInlet_C} °C, not above the ${what} at ${sinkTemp_C} °C: nothing would be cooled. ` +
        'This engine sizes coolers; the process stream must be the hot one.',
      sinkField,
    );
  }
}

type Coolant = Extract<RateRequest['boundary'], { kind: 'coolant' }>;

/** Shell data for a coolant boundary: the request's, or defaults (30°, pitch 1.25 OD, smallest shell that holds the tubes). */
export function shellOf(cb: Coolant, b: Bundle): ShellGeometry {
  const layout: Layout = cb.layout ?? 30;
  const pitch = cb.tubePitch_m ?? MIN_PITCH_RATIO * b.dOuter;
  if (pitch < b.dOuter * (MIN_PITCH_RATIO - 1e-6)) {
    throw new ThermalInputError('pitch-too-small', `A tube pitch of ${(pitch * 1000).toFixed(1)} mm is below 1.25 × OD (TEMA minimum): the tubesheet ligaments would be too thin.`, 'boundary.tubePitch_m');
  }
  let dShell = cb.shellInnerDiameter_m;
  if (dShell === undefined) {
    const fits = STANDARD_SHELLS.find((sh) => tubeCountInShell({ shellInnerDiameter_m: sh.innerDiameter_m, tubeOuterDiameter_m: b.dOuter, tubePitch_m: pitch, layout, tubePasses: b.passes }) >= b.count);
    if (!fits) throw new ThermalInputError('no-shell', `No standard shell up to 1.5 m holds ${b.count} tubes of this size and pitch; give shellInnerDiameter_m.`, 'geometry.tubeCount');
    dShell = fits.innerDiameter_m;
  }
  return {
    dShell, baffleSpacing: cb.baffleSpacing_m ?? defaultBaffleSpacing(dShell, b.length), baffleCut: cb.baffleCut ?? DEFAULT_BAFFLE_CUT, pitch, layout,
    inletSpacing: cb.inletBaffleSpacing_m, outletSpacing: cb.outletBaffleSpacing_m,
  };
}

/** Rates a parsed request (`rateRequestSchema` output). Throws ThermalInputError for impossible input. */
export function rateParsed(req: RateRequest, opts: RateOptions = {}): RateResult {
  const s: Stream = resolveStream(req.process, 'process');
  const b = bundleOf(req.geometry);
  if (req.boundary.kind === 'wall') {
    if (req.geometry.processSide === 'shell') {
      throw new ThermalInputError('wall-needs-tubes', 'A wall boundary (a bath or a condensing/boiling shell side) cools the tubes: the process must be in the tubes.', 'geometry.processSide');
    }
    if ((req.geometry.shellsInSeries ?? 1) > 1) {
      throw new ThermalInputError('wall-one-bundle', 'A wall boundary rates one bundle; shells in series need a coolant.', 'geometry.shellsInSeries');
    }
    requireFinite(req.boundary.wallTemp_C, 'boundary.wallTemp_C', 'The wall temperature');
    requireCooling(s.inletTemp_C, req.boundary.wallTemp_C, 'boundary.wallTemp_C', 'wall');
    s.properties(s.inletTemp_C);
    return rateWall(s, req.boundary.wallTemp_C, b, req.correlation, opts);
  }
  const c = resolveStream(req.boundary, 'boundary');
  requireCooling(s.inletTemp_C, c.inletTemp_C, 'boundary.inletTemp_C', 'coolant');
  s.properties(s.inletTemp_C);
  c.properties(c.inletTemp_C);
  const shell = shellOf(req.boundary, b);
  const holds = tubeCountInShell({ shellInnerDiameter_m: shell.dShell, tubeOuterDiameter_m: b.dOuter, tubePitch_m: shell.pitch, layout: shell.layout, tubePasses: b.passes });
  const side = req.geometry.processSide ?? 'tubes';
  const fouling = {
    inside: req.boundary.foulingInside_m2K_W ?? defaultFouling(side === 'tubes' ? s : c),
    outside: req.boundary.foulingOutside_m2K_W ?? defaultFouling(side === 'tubes' ? c : s),
  };
  const r = rateCoolant(s, c, b, shell, fouling, req.correlation, opts, {
    processSide: side,
    shells: req.geometry.shellsInSeries ?? 1,
    method: req.shellMethod,
    holds: holds >= b.count ? holds : undefined,
    tubeMaterial: req.geometry.tubeMaterial,
  });
  if (req.boundary.shellInnerDiameter_m !== undefined) {
    if (holds < b.count) r.warnings.push({ code: 'shell-too-small', message: `A ${Math.round(shell.dShell * 1000)} mm shell holds ${holds} tubes at this pitch and layout, fewer than the ${b.count} rated.` });
  }
  return r;
}

/** Rates a request body (validated here; a malformed body throws the zod error). */
export function rate(request: RateRequestInput, opts: RateOptions = {}): RateResult {
  return rateParsed(rateRequestSchema.parse(request), opts);
}
