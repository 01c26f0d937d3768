/**
 * The vibration screen of a rating (issue 11) in words: a one-line verdict and one line per span
 * (inlet, central, outlet), in the chosen unit system. Old stored ratings have no screen: nothing.
 */
import type { RateResult } from '@shared/schemas/thermal';
import { formatQuantity, type UnitSystem } from '@shared/thermal/units';

type Vibration = NonNullable<RateResult['vibration']>;
type Span = Vibration['spans'][number];

const WHERE: Record<Span['where'], string> = { inlet: 'inlet', central: 'central', outlet: 'outlet' };
const ENDS: Record<NonNullable<Span['ends']>, string> = {
  'pinned-pinned': 'held at two baffles',
  'clamped-pinned': 'tubesheet to baffle',
  'clamped-clamped': 'tubesheet to tubesheet',
};

const hz = (f: number) => `${Number(f.toPrecision(3))} Hz`;

/** Why a span fails, in words, or null when it passes. */
function failure(s: Span, system: UnitSystem): string | null {
  const v = (x: number) => formatQuantity(x, 'velocity', system, { digits: 2 });
  const parts: string[] = [];
  if (s.fluidElasticOk === false || (s.fluidElasticOk === undefined && !s.ok)) {
    parts.push(`fluid-elastic instability at the ${WHERE[s.where]} span, crossflow ${v(s.crossflowVelocity_m_s)} against a critical ${v(s.criticalVelocity_m_s)}`);
  }
  if (s.vortexOk === false) {
    const band = s.vortexFrequency_Hz ? `${hz(s.vortexFrequency_Hz[0])}–${hz(s.vortexFrequency_Hz[1])}` : 'a band';
    parts.push(`vortex shedding at the ${WHERE[s.where]} span (${band}) near its natural frequency${s.naturalFrequency_Hz ? ` ${hz(s.naturalFrequency_Hz)}` : ''}`);
  }
  return parts.length ? parts.join('; ') : null;
}

/** "passes at …" or "fails: fluid-elastic instability at the inlet span, crossflow 1.9 m/s against a critical 1.4 m/s". */
export function vibrationVerdict(v: Vibration, system: UnitSystem): string {
  const fails = v.spans.map((s) => failure(s, system)).filter((x): x is string => x !== null);
  if (fails.length) return `fails: ${fails.join('; ')}`;
  if (!v.ok) return 'fails the screen';
  const worst = Math.max(...v.spans.map((s) => s.crossflowVelocity_m_s / s.criticalVelocity_m_s));
  return `passes at the ${v.spans.map((s) => WHERE[s.where]).join(', ')} spans (crossflow at most ${Math.round(worst * 100)} % of the critical velocity)`;
}

/** One line per span: length, support, velocities, frequencies and its verdict. */
export function vibrationSpanLine(s: Span, system: UnitSystem): string {
  const len = formatQuantity(s.span_m, 'length', system, { digits: 3 });
  const v = (x: number) => formatQuantity(x, 'velocity', system, { digits: 2 });
  const tube = s.tube === 'window' ? 'tube in the baffle window' : 'tube';
  const ends = s.ends ? `, ${ENDS[s.ends]}` : '';
  const freq = [
    s.naturalFrequency_Hz !== undefined ? `natural frequency ${hz(s.naturalFrequency_Hz)}` : '',
    s.vortexFrequency_Hz ? `shedding ${hz(s.vortexFrequency_Hz[0])}–${hz(s.vortexFrequency_Hz[1])}` : '',
    s.buffetingFrequency_Hz !== undefined ? `buffeting ${hz(s.buffetingFrequency_Hz)}` : '',
  ].filter(Boolean);
  return `${len} (${tube}${ends}): crossflow ${v(s.crossflowVelocity_m_s)}, critical ${v(s.criticalVelocity_m_s)}${freq.length ? `; ${freq.join(', ')}` : ''}; ${s.ok ? 'passes' : 'fails'}`;
}

/** Span rows for a facts table: "Inlet span" → its line. */
export function vibrationFacts(v: Vibration, system: UnitSystem): { label: string; value: string; test: string }[] {
  return [
    { label: 'Result', value: vibrationVerdict(v, system), test: 'design-vibration' },
    ...v.spans.map((s) => ({ label: `${WHERE[s.where][0]!.toUpperCase()}${WHERE[s.where].slice(1)} span`, value: vibrationSpanLine(s, system), test: `design-vibration-${s.where}` })),
  ];
}
