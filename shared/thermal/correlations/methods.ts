/**
 * The one table of tube-side heat-transfer methods. `auto` selection and a user's forced choice
 * both evaluate entries of this table, so the label a result reports is the function that ran.
 */
import type { ThermalWarning } from '../errors';
import { entranceFactorGnielinski, propertyRatioCorrectionLiquidGnielinski, temperatureRatioCorrectionGasGnielinski, viscosityCorrectionSiederTate } from './corrections';
import { nusseltLaminarEntryHausen, nusseltLaminarEntrySiederTate, nusseltLaminarFullyDevelopedShahLondon } from './laminar';
import { nusseltTransitionGnielinski, RE_LAMINAR_LIMIT, RE_TURBULENT_LIMIT } from './transition';
import { nusseltTurbulentDittusBoelter, nusseltTurbulentGnielinski, nusseltTurbulentSiederTate } from './turbulent';

/** Everything any method may need, SI. */
export interface ConvectionInputs {
  re: number;
  pr: number;
  /** inner diameter, m */
  dInner: number;
  /** heated length over which the boundary layers develop (one pass), m */
  length: number;
  /** μ_bulk / μ_wall */
  muRatio: number;
  /** Prandtl number at the wall temperature */
  prWall: number;
  /** bulk and wall temperatures, K */
  tBulk_K: number;
  tWall_K: number;
  /** true when the tube-side fluid is heated */
  heating: boolean;
  boundary: 'wall' | 'flux';
  phase: 'liquid' | 'gas';
}

export interface ValidityRange {
  quantity: string;
  value: (i: ConvectionInputs) => number;
  min: number;
  max: number;
}

export interface MethodEntry {
  label: string;
  name: string;
  /** the function that implements the published method */
  fn: (...args: never[]) => number;
  /** calls the given implementation `f` with the arguments it takes from the inputs */
  apply: (f: (...args: never[]) => number, i: ConvectionInputs) => number;
  /** `apply(fn, i)` */
  evaluate: (i: ConvectionInputs) => number;
  validity: ValidityRange[];
}

function entry<F extends (...args: never[]) => number>(def: {
  label: string;
  name: string;
  fn: F;
  apply: (f: F, i: ConvectionInputs) => number;
  validity: ValidityRange[];
}): MethodEntry {
  const { fn, apply } = def;
  return { label: def.label, name: def.name, fn, apply: apply as MethodEntry['apply'], evaluate: (i) => apply(fn, i), validity: def.validity };
}

const reRange = (min: number, max: number): ValidityRange => ({ quantity: 'Re', value: (i) => i.re, min, max });
const prRange = (min: number, max: number): ValidityRange => ({ quantity: 'Pr', value: (i) => i.pr, min, max });
const lOverD = (min: number): ValidityRange => ({ quantity: 'L/D', value: (i) => i.length / i.dInner, min, max: Infinity });
const muRange: ValidityRange = { quantity: 'μ/μw', value: (i) => i.muRatio, min: 0.0044, max: 9.75 };

// The transition interpolates the laminar and turbulent values at its two ends: the inputs there
// are the same but for Re. Two scratch objects, refilled per call, save two allocations each time
// an iteration asks (nothing keeps them: the methods return numbers).
const laminarEnd = emptyInputs();
const turbulentEnd = emptyInputs();

function emptyInputs(): ConvectionInputs {
  return { re: 0, pr: 0, dInner: 0, length: 0, muRatio: 0, prWall: 0, tBulk_K: 0, tWall_K: 0, heating: false, boundary: 'wall', phase: 'liquid' };
}

/** Copies every field of `ConvectionInputs` (a field added there must be added here) and sets Re. */
function atRe(to: ConvectionInputs, i: ConvectionInputs, re: number): ConvectionInputs {
  to.re = re;
  to.pr = i.pr;
  to.dInner = i.dInner;
  to.length = i.length;
  to.muRatio = i.muRatio;
  to.prWall = i.prWall;
  to.tBulk_K = i.tBulk_K;
  to.tWall_K = i.tWall_K;
  to.heating = i.heating;
  to.boundary = i.boundary;
  to.phase = i.phase;
  return to;
}

/** Nusselt-number methods. Labels are stable: results and requests use them. */
export const nusseltMethods = {
  'laminar-fully-developed': entry({
    label: 'laminar-fully-developed',
    name: 'Laminar fully developed, Nu = 3.66 / 4.36 (Shah & London 1978)',
    fn: nusseltLaminarFullyDevelopedShahLondon,
    apply: (f, i) => f(i.boundary),
    validity: [reRange(0, RE_LAMINAR_LIMIT), { quantity: 'L/(0.05 Re Pr D)', value: (i) => i.length / (0.05 * i.re * i.pr * i.dInner), min: 1, max: Infinity }],
  }),
  hausen: entry({
    label: 'hausen',
    name: 'Laminar thermal entry (Hausen 1943)',
    fn: nusseltLaminarEntryHausen,
    apply: (f, i) => f(i.re, i.pr, i.dInner, i.length),
    validity: [reRange(0, RE_LAMINAR_LIMIT)],
  }),
  'sieder-tate-laminar': entry({
    label: 'sieder-tate-laminar',
    name: 'Laminar combined entry (Sieder & Tate 1936)',
    fn: nusseltLaminarEntrySiederTate,
    apply: (f, i) => f(i.re, i.pr, i.dInner, i.length, i.muRatio),
    validity: [
      reRange(0, RE_LAMINAR_LIMIT),
      prRange(0.48, 16700),
      muRange,
      { quantity: '(Re Pr D/L)^(1/3) (μ/μw)^0.14', value: (i) => Math.cbrt((i.re * i.pr * i.dInner) / i.length) * Math.pow(i.muRatio, 0.14), min: 2, max: Infinity },
    ],
  }),
  gnielinski: entry({
    label: 'gnielinski',
    name: 'Turbulent (Gnielinski 1976, Petukhov f)',
    fn: nusseltTurbulentGnielinski,
    apply: (f, i) => f(i.re, i.pr),
    validity: [reRange(3000, 5e6), prRange(0.5, 2000)],
  }),
  'dittus-boelter': entry({
    label: 'dittus-boelter',
    name: 'Turbulent (Dittus–Boelter 1930, McAdams form)',
    fn: nusseltTurbulentDittusBoelter,
    apply: (f, i) => f(i.re, i.pr, i.heating),
    validity: [reRange(1e4, Infinity), prRange(0.6, 160), lOverD(10)],
  }),
  'sieder-tate-turbulent': entry({
    label: 'sieder-tate-turbulent',
    name: 'Turbulent with property variation (Sieder & Tate 1936)',
    fn: nusseltTurbulentSiederTate,
    apply: (f, i) => f(i.re, i.pr, i.muRatio),
    validity: [reRange(1e4, Infinity), prRange(0.7, 16700), lOverD(10), muRange],
  }),
  'gnielinski-transition': entry({
    label: 'gnielinski-transition',
    name: 'Transition interpolation 2300–10⁴ (Gnielinski 1995)',
    fn: nusseltTransitionGnielinski,
    apply: (f, i) => f(i.re, autoLaminar(atRe(laminarEnd, i, RE_LAMINAR_LIMIT)), autoTurbulent(atRe(turbulentEnd, i, RE_TURBULENT_LIMIT))),
    validity: [reRange(RE_LAMINAR_LIMIT, RE_TURBULENT_LIMIT)],
  }),
} satisfies Record<string, MethodEntry>;

/** Multiplicative corrections `auto` applies; forced methods never get them. */
export const correctionMethods = {
  'entrance-gnielinski': entry({
    label: 'entrance-gnielinski',
    name: 'Turbulent entrance factor 1 + (D/L)^(2/3) (Gnielinski 1976)',
    fn: entranceFactorGnielinski,
    apply: (f, i) => f(i.dInner, i.length),
    validity: [lOverD(1)],
  }),
  'viscosity-sieder-tate': entry({
    label: 'viscosity-sieder-tate',
    name: 'Viscosity ratio (μ/μw)^0.14 (Sieder & Tate 1936)',
    fn: viscosityCorrectionSiederTate,
    apply: (f, i) => f(i.muRatio),
    validity: [muRange],
  }),
  'property-ratio-liquid': entry({
    label: 'property-ratio-liquid',
    name: 'Liquid property ratio (Pr/Prw)^0.11 (Gnielinski, VDI Heat Atlas)',
    fn: propertyRatioCorrectionLiquidGnielinski,
    apply: (f, i) => f(i.pr, i.prWall),
    validity: [{ quantity: 'Pr/Prw', value: (i) => i.pr / i.prWall, min: 0.05, max: 20 }],
  }),
  'temperature-ratio-gas': entry({
    label: 'temperature-ratio-gas',
    name: 'Gas temperature ratio (T/Tw)^n (Gnielinski, VDI Heat Atlas)',
    fn: temperatureRatioCorrectionGasGnielinski,
    apply: (f, i) => f(i.tBulk_K, i.tWall_K),
    validity: [{ quantity: 'T/Tw', value: (i) => i.tBulk_K / i.tWall_K, min: 0.5, max: 1.5 }],
  }),
} satisfies Record<string, MethodEntry>;

export type NusseltMethodLabel = keyof typeof nusseltMethods;

/** Laminar value `auto` uses: Hausen thermal entry, liquids corrected by (μ/μw)^0.14. */
function autoLaminar(i: ConvectionInputs): number {
  const nu = nusseltMethods.hausen.evaluate(i);
  return i.phase === 'liquid' ? nu * correctionMethods['viscosity-sieder-tate'].evaluate(i) : nu;
}

/** Turbulent value `auto` uses: Gnielinski × entrance factor × property correction (Sieder–Tate above Pr 2000). */
function autoTurbulent(i: ConvectionInputs): number {
  if (i.pr > 2000) return nusseltMethods['sieder-tate-turbulent'].evaluate(i) * correctionMethods['entrance-gnielinski'].evaluate(i);
  const property = i.phase === 'liquid' ? correctionMethods['property-ratio-liquid'] : correctionMethods['temperature-ratio-gas'];
  return nusseltMethods.gnielinski.evaluate(i) * correctionMethods['entrance-gnielinski'].evaluate(i) * property.evaluate(i);
}

/** Which methods and corrections `auto` runs for these inputs (same order as `autoNusselt`). */
export function autoPlan(i: ConvectionInputs): { method: NusseltMethodLabel; corrections: string[] } {
  if (i.re < RE_LAMINAR_LIMIT) return { method: 'hausen', corrections: i.phase === 'liquid' ? ['viscosity-sieder-tate'] : [] };
  if (i.re < RE_TURBULENT_LIMIT) return { method: 'gnielinski-transition', corrections: [] };
  if (i.pr > 2000) return { method: 'sieder-tate-turbulent', corrections: ['entrance-gnielinski'] };
  return { method: 'gnielinski', corrections: ['entrance-gnielinski', i.phase === 'liquid' ? 'property-ratio-liquid' : 'temperature-ratio-gas'] };
}

/** The `auto` Nusselt number: laminar, Gnielinski 1995 transition, or turbulent by Re. */
export function autoNusselt(i: ConvectionInputs): number {
  if (i.re < RE_LAMINAR_LIMIT) return autoLaminar(i);
  if (i.re < RE_TURBULENT_LIMIT) return nusseltMethods['gnielinski-transition'].evaluate(i);
  return autoTurbulent(i);
}

/** Warnings for inputs outside an entry's validity ranges. */
export function rangeWarnings(e: MethodEntry, i: ConvectionInputs): ThermalWarning[] {
  const out: ThermalWarning[] = [];
  for (const r of e.validity) {
    const v = r.value(i);
    if (!(v >= r.min && v <= r.max)) {
      const range = r.max === Infinity ? `≥ ${r.min}` : `${r.min}–${r.max}`;
      out.push({ code: 'correlation-range', message: `${e.name}: ${r.quantity} = ${v.toPrecision(3)} is outside its validity range (${range}).` });
    }
  }
  return out;
}
