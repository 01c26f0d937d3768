/**
 * Construction (issue 11): the TEMA type of a shell-and-tube cooler from the tube/shell metal
 * temperature difference and which side must be cleaned mechanically, and its TEMA class.
 *
 *  - BEM, fixed tubesheets: the cheapest; the bundle cannot be pulled, so the shell side must stay
 *    clean, and without an expansion joint the tubes and the shell may differ in mean metal
 *    temperature by at most FIXED_TUBESHEET_MAX_DT_K.
 *  - BEU, U-tubes: the bundle pulls out and the tubes expand freely; the U-bends cannot be cleaned
 *    mechanically, so the tube side must be clean, and it needs an even number of tube passes.
 *  - AES, split-ring floating head: pulls out, expands freely, both sides cleanable (the dearest).
 *    The pull-through floating head (AET) is not chosen here; a shop may quote it by hand.
 *
 * Which fluids need mechanical cleaning (common practice): cooling water (here the library's
 * `water`: tower, river or sea water) fouls and scales; glycol loops, oils and gases are closed or
 * clean and are cleaned chemically if at all.
 *
 * Mean metal temperatures (common practice, ignoring fouling and wall): the shell at its fluid's
 * mean temperature (an unheated, usually insulated shell); the tubes at the film-weighted mean
 * t_tube = (h_i T_i + h_o T_o) / (h_i + h_o) of the two fluids' mean temperatures.
 *
 * TEMA class (Standards of the Tubular Exchanger Manufacturers Association, memory): R for severe
 * petroleum and process service, C for general commercial service, B for chemical process service.
 * This trade's coolers default to C; a duty may ask for another (`constraints.temaClass`).
 * An estimate for the quotation: the responsible engineer's design governs.
 */
import type { Construction, ProcessSide, RateResult, SizeRequest, TemaClass } from '../../schemas/thermal';
import type { ThermalWarning } from '../errors';

/** 30 K: largest tube/shell mean metal temperature difference for fixed tubesheets without an expansion joint (common practice: 30–50 K; the lower end taken). */
export const FIXED_TUBESHEET_MAX_DT_K = 30;
/** Default TEMA class of this trade's coolers: C, general commercial service (common practice). */
export const DEFAULT_TEMA_CLASS: TemaClass = 'C';

/** Fluids that foul and must be cleaned mechanically (common practice): cooling water. */
export function needsMechanicalCleaning(fluidId: string | undefined): boolean {
  return fluidId === 'water';
}

export interface ConstructionStreams {
  /** library fluid id, undefined for a customer's constant fluid (taken as clean) */
  processFluid?: string;
  coolantFluid?: string;
  processInlet_C: number;
  coolantInlet_C: number;
}

export interface ConstructionCheck {
  ok: boolean;
  findings: ThermalWarning[];
  construction: Construction;
  temaClass: TemaClass;
  reason: string;
  tubeMetal_C: number;
  shellMetal_C: number;
  metalTempDifference_K: number;
}

/** The film-weighted tube metal temperature, °C: (h_i T_i + h_o T_o) / (h_i + h_o). */
export function tubeMetalTemp(hTube: number, tTube_C: number, hShell: number, tShell_C: number): number {
  return (hTube * tTube_C + hShell * tShell_C) / (hTube + hShell);
}

/** Chooses BEM, BEU or AES for a rated coolant-boundary design (see the module comment). */
export function chooseConstruction(
  d: { processSide?: ProcessSide; tubePasses: number; rating: Pick<RateResult, 'outletTemp_C' | 'coolantOutletTemp_C' | 'htc_W_m2K' | 'shellHtc_W_m2K'> },
  st: ConstructionStreams,
  temaClass: TemaClass = DEFAULT_TEMA_CLASS,
): ConstructionCheck {
  const r = d.rating;
  const inTubes = (d.processSide ?? 'tubes') === 'tubes';
  const processMean = 0.5 * (st.processInlet_C + r.outletTemp_C);
  const coolantMean = 0.5 * (st.coolantInlet_C + (r.coolantOutletTemp_C ?? st.coolantInlet_C));
  const tTube = inTubes ? processMean : coolantMean;
  const tShell = inTubes ? coolantMean : processMean;
  const tubeMetal = tubeMetalTemp(r.htc_W_m2K, tTube, r.shellHtc_W_m2K ?? r.htc_W_m2K, tShell);
  const dT = Math.abs(tubeMetal - tShell);
  const tubeFluid = inTubes ? st.processFluid : st.coolantFluid;
  const shellFluid = inTubes ? st.coolantFluid : st.processFluid;
  const shellDirty = needsMechanicalCleaning(shellFluid);
  const tubeDirty = needsMechanicalCleaning(tubeFluid);
  const tooHot = dT > FIXED_TUBESHEET_MAX_DT_K;
  const metal = `tubes ${tubeMetal.toFixed(0)} °C against shell ${tShell.toFixed(0)} °C mean metal (${dT.toFixed(0)} K; fixed tubesheets take up to ${FIXED_TUBESHEET_MAX_DT_K} K without an expansion joint)`;
  let construction: Construction;
  let reason: string;
  if (!shellDirty && !tooHot) {
    construction = 'BEM';
    reason = `Fixed tubesheets (BEM): the shell-side fluid is clean and ${metal}.`;
  } else {
    const why = shellDirty
      ? `the shell side carries cooling water, which must be cleaned mechanically, so the bundle must come out`
      : `the tubes and the shell differ too much in temperature (${metal})`;
    if (!tubeDirty && d.tubePasses % 2 === 0) {
      construction = 'BEU';
      reason = `U-tubes (BEU): ${why}; the tube-side fluid is clean, so U-bends that cannot be rodded are acceptable, and a U-tube bundle is the cheapest removable one.`;
    } else {
      construction = 'AES';
      reason = `Floating head (AES): ${why}; ${tubeDirty ? 'the tube side carries cooling water and needs straight tubes to clean' : 'one tube pass cannot be bent into U-tubes'}, so a split-ring floating head.`;
    }
  }
  return { ok: true, findings: [], construction, temaClass, reason, tubeMetal_C: tubeMetal, shellMetal_C: tShell, metalTempDifference_K: dT };
}

/** The design's construction fields. */
export function designConstructionFields(c: ConstructionCheck): { construction: Construction; temaClass: TemaClass; constructionReason: string } {
  return { construction: c.construction, temaClass: c.temaClass, constructionReason: c.reason };
}

/**
 * The construction of a rated design under a duty: its streams' fluids and inlets from the request,
 * the class the duty asks for (default C). Undefined for a wall boundary (no shell stream).
 */
export function constructionFor(
  duty: Pick<SizeRequest, 'process' | 'boundary'> & { constraints?: { temaClass?: TemaClass } },
  d: Parameters<typeof chooseConstruction>[0],
): ReturnType<typeof designConstructionFields> | undefined {
  const b = duty.boundary;
  if (b.kind !== 'coolant') return undefined;
  const id = (f: unknown) => (typeof f === 'string' ? f : undefined);
  const c = chooseConstruction(d, { processFluid: id(duty.process.fluid), coolantFluid: id(b.fluid), processInlet_C: duty.process.inletTemp_C, coolantInlet_C: b.inletTemp_C }, duty.constraints?.temaClass ?? DEFAULT_TEMA_CLASS);
  return designConstructionFields(c);
}
