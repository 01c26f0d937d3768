import { describe, expect, it } from 'vitest';
import { vibrationFacts, vibrationVerdict } from '../../src/views/sizing/parts/vibration-words';

const span = (where: 'inlet' | 'central' | 'outlet', v: number, vc: number) => ({
  where, span_m: where === 'central' ? 0.4 : 0.5, crossflowVelocity_m_s: v, criticalVelocity_m_s: vc, ok: v < vc, fluidElasticOk: v < vc, vortexOk: true,
  ends: where === 'central' ? ('pinned-pinned' as const) : ('clamped-pinned' as const), tube: 'window' as const, naturalFrequency_Hz: 40, vortexFrequency_Hz: [8, 20] as [number, number], buffetingFrequency_Hz: 12,
});

describe('vibration screen in words', () => {
  it('names the failing span with its crossflow and critical velocity', () => {
    const v = { ok: false, spans: [span('inlet', 1.9, 1.4), span('central', 0.5, 2), span('outlet', 0.5, 1.8)] };
    expect(vibrationVerdict(v, 'SI')).toBe('fails: fluid-elastic instability at the inlet span, crossflow 1.9 m/s against a critical 1.4 m/s');
    const facts = vibrationFacts(v, 'SI');
    expect(facts.map((f) => f.label)).toEqual(['Result', 'Inlet span', 'Central span', 'Outlet span']);
    expect(facts[1]!.value).toMatch(/tube in the baffle window, tubesheet to baffle\): crossflow 1\.9 m\/s, critical 1\.4 m\/s.*fails$/);
  });

  it('says how close a passing design comes', () => {
    const v = { ok: true, spans: [span('inlet', 0.5, 1), span('central', 0.5, 2), span('outlet', 0.5, 2)] };
    expect(vibrationVerdict(v, 'SI')).toBe('passes at the inlet, central, outlet spans (crossflow at most 50 % of the critical velocity)');
  });
});
