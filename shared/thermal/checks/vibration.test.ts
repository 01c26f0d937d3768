import { describe, expect, it } from 'vitest';
import { sizeRequestSchema } from '../../schemas/thermal';
import { evaluateDesign } from '../evaluate';
import { connorsCriticalVelocity, owenBuffetingFrequency, pitchComponents, screenVibration, type VibrationInput } from './vibration';
import { addedMassCoefficient, SPAN_END_CONSTANT, spanNaturalFrequency, tubeMassPerLength, tubeSecondMoment } from './tube-frequency';

describe('tube natural frequency', () => {
  it('a simply supported steel tube matches the Euler–Bernoulli beam formula worked by hand', () => {
    // 25.4 × 2.11 mm (BWG 14) steel, 1 m between pins, in air: I = π(d_o⁴ − d_i⁴)/64 = 1.0554e-8 m⁴,
    // EI = 202 GPa × I = 2131.8 N·m², m = 7850 × π/4 × (d_o² − d_i²) = 1.2119 kg/m,
    // f = (π²/(2π L²)) √(EI/m) = (π/2) √(1759.1) = 65.88 Hz (Euler–Bernoulli, any vibration textbook; hand calculation)
    const dOuter = 0.0254;
    const dInner = dOuter - 2 * 0.00211;
    expect(tubeSecondMoment(dOuter, dInner)).toBeCloseTo(1.0554e-8, 11);
    const m = tubeMassPerLength(dOuter, dInner, 7850, 0, 0, 1).total_kg_m;
    expect(m).toBeCloseTo(1.2119, 3);
    const f = spanNaturalFrequency(SPAN_END_CONSTANT['pinned-pinned'], 1, 202e9 * tubeSecondMoment(dOuter, dInner), m);
    expect(f).toBeCloseTo(65.88, 1);
    // a clamped end stiffens the span: 15.42/9.87 times the frequency (beam constants λ², Blevins 1979, memory)
    expect(spanNaturalFrequency(SPAN_END_CONSTANT['clamped-pinned'], 1, 202e9 * tubeSecondMoment(dOuter, dInner), m) / f).toBeCloseTo(15.418 / 9.8696, 4);
  });

  it('added mass: about 1.6 at pitch ratio 1.25 triangular, falling towards 1 for wide pitch (Blevins 1990, memory)', () => {
    const cm = addedMassCoefficient(1.25, 30);
    // D_e/d_o = (1 + 0.625) × 1.25 = 2.031; C_m = (4.126 + 1)/(4.126 − 1) = 1.640 (hand calculation)
    expect(cm).toBeCloseTo(1.640, 2);
    expect(addedMassCoefficient(2, 30)).toBeLessThan(cm);
    expect(addedMassCoefficient(2, 30)).toBeGreaterThan(1);
  });
});

describe("Connors' critical velocity", () => {
  it('matches a hand calculation', () => {
    // v_c = K f d √(m δ/(ρ d²)) = 3 × 40 × 0.01905 × √(1.3 × 0.03/(998 × 0.01905²)) = 2.286 × 0.32815 = 0.7502 m/s (hand calculation)
    expect(connorsCriticalVelocity(3, 40, 0.01905, 1.3, 0.03, 998)).toBeCloseTo(0.7502, 3);
  });

  it("Owen's buffeting frequency matches a hand calculation", () => {
    // 90° layout, p/d = 1.25: x_l = x_t = 1.25; f = v/(d x_l x_t) (3.05 (1 − 1/1.25)² + 0.28) = 25.197 × 0.402 = 10.13 Hz
    const { xl, xt } = pitchComponents(90, 1.25);
    expect(owenBuffetingFrequency(1, 0.0254, xl, xt)).toBeCloseTo(10.13, 2);
  });
});

const base: VibrationInput = {
  dOuter: 0.01905, dInner: 0.01575, tubeMaterial: 'carbon-steel', layout: 30, pitch: 0.0238, tubeLength: 1.8,
  centralSpacing: 0.2, inletSpacing: 0.3, outletSpacing: 0.3, baffles: 7, centralVelocity_m_s: 0.6, shellDensity: 998, tubeFluidDensity: 998, shellLiquid: true,
};

describe('vibration screen', () => {
  it('screens the window tubes: inlet = inlet + central spacing, central = 2 × central spacing, outlet likewise', () => {
    const r = screenVibration(base);
    expect(r.spans.map((s) => s.where)).toEqual(['inlet', 'central', 'outlet']);
    expect(r.spans[0]!.span_m).toBeCloseTo(0.5, 9);
    expect(r.spans[1]!.span_m).toBeCloseTo(0.4, 9);
    expect(r.spans[2]!.span_m).toBeCloseTo(0.5, 9);
    expect(r.spans[0]!.ends).toBe('clamped-pinned');
    expect(r.spans[1]!.ends).toBe('pinned-pinned');
    expect(r.spans.every((s) => s.tube === 'window')).toBe(true);
  });

  it('a normal geometry passes', () => {
    const r = screenVibration(base);
    expect(r.ok).toBe(true);
    expect(r.findings).toEqual([]);
    for (const s of r.spans) expect(s.crossflowVelocity_m_s).toBeLessThan(s.criticalVelocity_m_s);
  });

  it('a long-span, high-velocity geometry fails fluid-elastic instability, named with its figures', () => {
    const r = screenVibration({ ...base, tubeLength: 6, centralSpacing: 0.6, inletSpacing: 0.9, outletSpacing: 0.9, baffles: 8, centralVelocity_m_s: 1.5 });
    expect(r.ok).toBe(false);
    const central = r.spans.find((s) => s.where === 'central')!;
    expect(central.span_m).toBeCloseTo(1.2, 9);
    expect(central.fluidElasticOk).toBe(false);
    const f = r.findings.find((w) => w.code === 'vibration-fluidelastic')!;
    expect(f.message).toMatch(/fluid-elastic instability at the (inlet|central|outlet) span .*crossflow 1\.50 m\/s against a critical \d\.\d\d m\/s/);
  });

  it('the end zone is faster when its spacing is shorter than the central one', () => {
    const r = screenVibration({ ...base, inletSpacing: 0.1, outletSpacing: 0.1, tubeLength: 1.4, baffles: 7 });
    // v_in = 0.6 × 0.2/0.1 = 1.2 m/s over the first span
    expect(r.spans[0]!.crossflowVelocity_m_s).toBeCloseTo(1.2, 9);
  });

  it('vortex shedding fails in a liquid when the shedding band reaches f_n ±20 %, not in a gas', () => {
    // a slow liquid over a long span: f_vs = (0.2–0.5) v/d around f_n
    const slow = { ...base, tubeLength: 6, centralSpacing: 1.0, inletSpacing: 1.0, outletSpacing: 1.0, baffles: 5 };
    const fn = screenVibration({ ...slow, centralVelocity_m_s: 0.01 }).spans[1]!.naturalFrequency_Hz;
    const v = (fn * base.dOuter) / 0.35; // St 0.35 sheds exactly at f_n
    const r = screenVibration({ ...slow, centralVelocity_m_s: v });
    const central = r.spans.find((s) => s.where === 'central')!;
    expect(central.vortexOk).toBe(false);
    expect(r.findings.some((w) => w.code === 'vibration-vortex')).toBe(true);
    expect(screenVibration({ ...slow, centralVelocity_m_s: v, shellLiquid: false, shellDensity: 5 }).spans.every((s) => s.vortexOk)).toBe(true);
  });
});

describe('a hand-set design that fails the screen', () => {
  it('keeps its geometry and carries the failing check with its reason in words', () => {
    // invented duty: water cooled by a large flow of water on the shell side
    const duty = sizeRequestSchema.parse({
      process: { fluid: 'water', pressure_Pa: 300000, massFlow_kg_s: 2, inletTemp_C: 75, outletTemp_C: 40 },
      boundary: { kind: 'coolant', fluid: 'water', pressure_Pa: 300000, massFlow_kg_s: 30, inletTemp_C: 25 },
      constraints: { maxTubeLength_m: 6, maxPressureDrop_Pa: 70000 },
    });
    const g = { tubeCount: 100, tubeLength_m: 4, tubeOuterDiameter_m: 0.01905, tubeWall_m: 0.00165, tubeMaterial: 'carbon-steel', tubePasses: 1, layout: 30 as const, shellInnerDiameter_m: 0.3048, baffleSpacing_m: 0.6, processSide: 'tubes' as const };
    const d = evaluateDesign(duty, g);
    expect(d.baffleSpacing_m).toBe(0.6);
    expect(d.rating.vibration?.ok).toBe(false);
    const w = d.rating.warnings.find((x) => x.code === 'vibration-fluidelastic');
    expect(w?.message).toMatch(/^Fails: fluid-elastic instability at the \w+ span/);
    // closer baffles fix it
    expect(evaluateDesign(duty, { ...g, baffleSpacing_m: 0.15 }).rating.vibration?.ok).toBe(true);
  });
});
