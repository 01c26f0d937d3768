/**
 * Flow-induced vibration screen of the tube bundle (issue 11): fluid-elastic instability by
 * Connors' form, vortex-shedding lock-in and turbulent buffeting (reported) against each span's
 * first natural frequency, at the inlet, central and outlet spans.
 *
 * Spans screened: a segmental-baffle bundle has tubes held by every baffle (in the overlap) and
 * tubes in a baffle window, held only by every second baffle. The window tubes have the longest
 * spans, so both window families are screened (the tubes held by the odd baffles and those held by
 * the even ones): central span 2 × the central spacing; inlet span = inlet spacing + central
 * spacing (a tube in the first baffle's window runs from the tubesheet to the second baffle), the
 * outlet likewise; fewer baffles give longer spans accordingly. End conditions: clamped at a
 * tubesheet, pinned at a baffle.
 *
 * Crossflow velocity at a span: the highest of the compartments the span crosses. A compartment's
 * velocity is the shell-side stream over Bell–Delaware's crossflow area at the bundle centreline
 * S_m (the minimum area between tubes across the row, i.e. the gap velocity Connors' constant is
 * fitted to), with the whole stream counted as crossflow (no deduction for leakage and bypass:
 * conservative); an end compartment's S_m scales with its spacing, so the end-zone velocity is the
 * central one × L_bc/L_bi. The jet under the inlet nozzle itself is not modelled (the nozzle and
 * impingement check covers it).
 */
import type { ThermalWarning } from '../errors';
import type { Layout } from '../geometry/layout';
import { addedMassCoefficient, SPAN_END_CONSTANT, spanNaturalFrequency, tubeMassPerLength, tubeMechanics, tubeSecondMoment, type SpanEnds } from './tube-frequency';

/**
 * Connors' constant K in `v_c = K f_n d_o √(m δ/(ρ d_o²))`: 3.0, the design value Pettigrew & Taylor
 * recommend for all tube patterns with the gap (pitch) velocity ("Fluidelastic instability of heat
 * exchanger tube bundles: review and design recommendations", J. Pressure Vessel Technology 113,
 * 1991; memory); 2.4 for the 45° rotated square, the pattern with the lowest reported thresholds
 * (conservative, memory).
 */
export const CONNORS_K: Readonly<Record<Layout, number>> = { 30: 3.0, 60: 3.0, 90: 3.0, 45: 2.4 };
/** Logarithmic decrement δ of a tube span: about 0.03 in a liquid, 0.01 in a gas (common practice). */
export const LOG_DECREMENT = { liquid: 0.03, gas: 0.01 } as const;
/**
 * Strouhal numbers of tube banks span about 0.2–0.5 with layout and pitch ratio (Chen's charts,
 * 1968, and Weaver's later review; memory). The whole band is screened (conservative).
 */
export const STROUHAL_BAND = [0.2, 0.5] as const;
/** ±20 %: a shedding frequency this close to f_n may lock in (common practice). */
export const LOCK_IN_BAND = 0.2;

export type SpanWhere = 'inlet' | 'central' | 'outlet';

export interface VibrationInput {
  dOuter: number;
  dInner: number;
  tubeMaterial?: string;
  layout: Layout;
  pitch: number;
  /** one shell's tube length between tubesheets, m */
  tubeLength: number;
  centralSpacing: number;
  inletSpacing: number;
  outletSpacing: number;
  /** baffles in one shell */
  baffles: number;
  /** crossflow (gap) velocity at the central spacing, m/s */
  centralVelocity_m_s: number;
  shellDensity: number;
  tubeFluidDensity: number;
  shellLiquid: boolean;
}

export interface VibrationSpan {
  where: SpanWhere;
  span_m: number;
  ends: SpanEnds;
  /** 'window': a tube in a baffle window, held at every second baffle */
  tube: 'window' | 'baffled';
  crossflowVelocity_m_s: number;
  criticalVelocity_m_s: number;
  velocityRatio: number;
  naturalFrequency_Hz: number;
  /** shedding frequency over the Strouhal band, Hz */
  vortexFrequency_Hz: [number, number];
  /** Owen's buffeting frequency, Hz (reported) */
  buffetingFrequency_Hz: number;
  fluidElasticOk: boolean;
  vortexOk: boolean;
  ok: boolean;
}

export interface VibrationCheck {
  ok: boolean;
  findings: ThermalWarning[];
  spans: VibrationSpan[];
  connorsK: number;
  logDecrement: number;
  addedMassCoefficient: number;
  massPerLength_kg_m: number;
}

/** Connors' fluid-elastic critical velocity, m/s: `v_c = K f_n d_o √(m δ/(ρ d_o²))` (Connors, 1970). */
export function connorsCriticalVelocity(k: number, fn_Hz: number, dOuter: number, mass_kg_m: number, logDecrement: number, shellDensity: number): number {
  return k * fn_Hz * dOuter * Math.sqrt((mass_kg_m * logDecrement) / (shellDensity * dOuter * dOuter));
}

/** Vortex-shedding frequency, Hz: `f_vs = St v/d_o`. */
export function vortexSheddingFrequency(strouhal: number, velocity: number, dOuter: number): number {
  return (strouhal * velocity) / dOuter;
}

/**
 * Longitudinal and transverse pitch over d_o by layout (flow normal to the tube rows as drawn in
 * TEMA's layout figures): 30° x_t = p, x_l = 0.866 p; 60° x_t = 1.732 p, x_l = 0.5 p; 90° both p;
 * 45° x_t = 1.414 p, x_l = 0.707 p.
 */
export function pitchComponents(layout: Layout, pitchRatio: number): { xl: number; xt: number } {
  const f: Record<Layout, [number, number]> = { 30: [Math.sqrt(3) / 2, 1], 60: [0.5, Math.sqrt(3)], 90: [1, 1], 45: [Math.SQRT1_2, Math.SQRT2] };
  const [l, t] = f[layout];
  return { xl: l * pitchRatio, xt: t * pitchRatio };
}

/**
 * Owen's turbulent-buffeting frequency, Hz (Owen, 1965, as used in TEMA section 6 V-11, memory):
 * `f_tb = v/(d_o x_l x_t) [3.05 (1 − 1/x_t)² + 0.28]`, x's the pitches over d_o. Reported, not a limit.
 */
export function owenBuffetingFrequency(velocity: number, dOuter: number, xl: number, xt: number): number {
  return (velocity / (dOuter * xl * xt)) * (3.05 * (1 - 1 / xt) ** 2 + 0.28);
}

/** Baffle positions from the inlet tubesheet, m. */
function bafflePositions(v: VibrationInput): number[] {
  const out: number[] = [];
  for (let k = 0; k < v.baffles; k++) out.push(v.inletSpacing + k * v.centralSpacing);
  return out.filter((x) => x > 1e-9 && x < v.tubeLength - 1e-9);
}

interface RawSpan { a: number; b: number; window: boolean }

/** Spans of the two window-tube families (held by odd / by even baffles). */
function windowSpans(v: VibrationInput): RawSpan[] {
  const x = bafflePositions(v);
  const L = v.tubeLength;
  const out: RawSpan[] = [];
  for (const parity of [0, 1]) {
    const supports = x.filter((_, i) => i % 2 === parity);
    const held = [0, ...supports, L];
    for (let i = 1; i < held.length; i++) out.push({ a: held[i - 1]!, b: held[i]!, window: supports.length < x.length });
  }
  return out;
}

export function screenVibration(v: VibrationInput): VibrationCheck {
  const mech = tubeMechanics(v.tubeMaterial);
  const ei = mech.elasticModulus_Pa * tubeSecondMoment(v.dOuter, v.dInner);
  const pitchRatio = v.pitch / v.dOuter;
  const cm = addedMassCoefficient(pitchRatio, v.layout);
  const mass = tubeMassPerLength(v.dOuter, v.dInner, mech.density_kg_m3, v.tubeFluidDensity, v.shellDensity, cm).total_kg_m;
  const k = CONNORS_K[v.layout];
  const delta = v.shellLiquid ? LOG_DECREMENT.liquid : LOG_DECREMENT.gas;
  const { xl, xt } = pitchComponents(v.layout, pitchRatio);
  const L = v.tubeLength;
  const x = bafflePositions(v);
  const first = x[0] ?? L;
  const last = x[x.length - 1] ?? 0;
  const vIn = v.centralVelocity_m_s * (v.centralSpacing / v.inletSpacing);
  const vOut = v.centralVelocity_m_s * (v.centralSpacing / v.outletSpacing);
  const eps = 1e-9;
  const spans: VibrationSpan[] = windowSpans(v).map(({ a, b, window }) => {
    const atStart = a < eps;
    const atEnd = b > L - eps;
    const ends: SpanEnds = atStart && atEnd ? 'clamped-clamped' : atStart || atEnd ? 'clamped-pinned' : 'pinned-pinned';
    let vel = 0;
    if (a < first - eps) vel = Math.max(vel, vIn);
    if (b > first + eps && a < last - eps) vel = Math.max(vel, v.centralVelocity_m_s);
    if (b > last + eps) vel = Math.max(vel, vOut);
    const span = b - a;
    const fn = spanNaturalFrequency(SPAN_END_CONSTANT[ends], span, ei, mass);
    const vc = connorsCriticalVelocity(k, fn, v.dOuter, mass, delta, v.shellDensity);
    const fv: [number, number] = [vortexSheddingFrequency(STROUHAL_BAND[0], vel, v.dOuter), vortexSheddingFrequency(STROUHAL_BAND[1], vel, v.dOuter)];
    // lock-in matters for liquids (low mass-damping); a gas shell side's acoustic resonance is another check
    const vortexOk = !v.shellLiquid || fv[0] > (1 + LOCK_IN_BAND) * fn || fv[1] < (1 - LOCK_IN_BAND) * fn;
    const fluidElasticOk = vel < vc;
    const where: SpanWhere = atStart && !atEnd ? 'inlet' : atEnd && !atStart ? 'outlet' : 'central';
    return {
      where, span_m: span, ends, tube: window ? 'window' : 'baffled', crossflowVelocity_m_s: vel, criticalVelocity_m_s: vc, velocityRatio: vel / vc,
      naturalFrequency_Hz: fn, vortexFrequency_Hz: fv, buffetingFrequency_Hz: owenBuffetingFrequency(vel, v.dOuter, xl, xt),
      fluidElasticOk, vortexOk, ok: fluidElasticOk && vortexOk,
    };
  });
  // one row per place: its worst span (a failing one first, then the highest v/v_c)
  const worst = (['inlet', 'central', 'outlet'] as const).flatMap((where) => {
    const here = spans.filter((s) => s.where === where);
    if (here.length === 0) return [];
    return [here.reduce((w, s) => (Number(s.ok) < Number(w.ok) || (s.ok === w.ok && s.velocityRatio > w.velocityRatio) ? s : w))];
  });
  const findings: ThermalWarning[] = [];
  for (const s of worst) {
    if (!s.fluidElasticOk) {
      findings.push({
        code: 'vibration-fluidelastic',
        message: `Fails: fluid-elastic instability at the ${s.where} span (${(s.span_m * 1000).toFixed(0)} mm, tube in the baffle window), crossflow ${s.crossflowVelocity_m_s.toFixed(2)} m/s against a critical ${s.criticalVelocity_m_s.toFixed(2)} m/s (Connors, K = ${k}, δ = ${delta}). Closer baffles, a smaller end spacing or a lower shell-side velocity fix it.`,
      });
    }
    if (!s.vortexOk) {
      findings.push({
        code: 'vibration-vortex',
        message: `Fails: vortex shedding at the ${s.where} span (${(s.span_m * 1000).toFixed(0)} mm) sheds at ${s.vortexFrequency_Hz[0].toFixed(1)}–${s.vortexFrequency_Hz[1].toFixed(1)} Hz (Strouhal ${STROUHAL_BAND[0]}–${STROUHAL_BAND[1]}), within ±${LOCK_IN_BAND * 100} % of the tube's natural frequency ${s.naturalFrequency_Hz.toFixed(1)} Hz. A shorter span raises the natural frequency.`,
      });
    }
  }
  const ok = spans.every((s) => s.ok);
  return { ok, findings, spans: worst, connorsK: k, logDecrement: delta, addedMassCoefficient: cm, massPerLength_kg_m: mass };
}
