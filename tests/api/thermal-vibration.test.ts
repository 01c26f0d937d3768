/**
 * Vibration screen over the public thermal API (issue 11): every sized design carries the screen at
 * its inlet, central and outlet spans and none offered fails it; a rated geometry with long spans
 * and a fast shell side carries the failing check with its figures.
 */
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestApp, type TestApp } from './support/app';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.close());

const post = (path: string, body: unknown) => request(t.app).post(path).send(body as object);

/** The hydraulic-oil cooler (invented demo duty). */
const oilDuty = {
  process: { fluid: 'oil-vg46', pressure_Pa: 500000, massFlow_kg_s: 1.2, inletTemp_C: 62, outletTemp_C: 47 },
  boundary: { kind: 'coolant', fluid: 'water', pressure_Pa: 350000, massFlow_kg_s: 2, inletTemp_C: 27 },
  constraints: { maxTubeLength_m: 6, maxPressureDrop_Pa: 70000, maxShellPressureDrop_Pa: 70000 },
};
/** A water/water cooler (invented). */
const waterDuty = {
  process: { fluid: 'water', pressure_Pa: 400000, massFlow_kg_s: 20, inletTemp_C: 50, outletTemp_C: 40 },
  boundary: { kind: 'coolant', fluid: 'water', pressure_Pa: 300000, massFlow_kg_s: 25, inletTemp_C: 28 },
  constraints: { maxTubeLength_m: 4, maxPressureDrop_Pa: 100000 },
};

/** 19.05 mm tubes, 600 mm baffle spacing (1.2 m window spans), 30 kg/s of water on the shell side. */
const longFastSpans = {
  process: { fluid: 'water', pressure_Pa: 300000, massFlow_kg_s: 2, inletTemp_C: 75 },
  boundary: { kind: 'coolant', fluid: 'water', pressure_Pa: 300000, massFlow_kg_s: 30, inletTemp_C: 25, shellInnerDiameter_m: 0.3048, baffleSpacing_m: 0.6, layout: 30 },
  geometry: { tubeOuterDiameter_m: 0.01905, tubeWall_m: 0.00165, tubeCount: 100, tubeLength_m: 4, tubePasses: 1, tubeMaterial: 'carbon-steel' },
};

function expectScreened(d: { rating: { vibration?: { ok: boolean; spans: { where: string; span_m: number; crossflowVelocity_m_s: number; criticalVelocity_m_s: number; ok: boolean }[] }; warnings: { code: string }[] } }) {
  const v = d.rating.vibration!;
  expect(v.ok).toBe(true);
  // a shell with two baffles has only its end spans (no central one)
  const where = v.spans.map((s) => s.where);
  expect(where).toEqual(where.includes('central') ? ['inlet', 'central', 'outlet'] : ['inlet', 'outlet']);
  for (const s of v.spans) {
    expect(s.ok).toBe(true);
    expect(s.span_m).toBeGreaterThan(0);
    expect(s.crossflowVelocity_m_s).toBeLessThan(s.criticalVelocity_m_s);
  }
  expect(d.rating.warnings.some((w) => w.code.startsWith('vibration-'))).toBe(false);
}

describe('vibration screen in sizing', () => {
  it('the oil duty offers only designs that pass the screen at all three spans', async () => {
    const res = await post('/api/thermal/size', oilDuty);
    expect(res.status).toBe(200);
    expect(res.body.candidates.length).toBeGreaterThan(0);
    for (const d of res.body.candidates) expectScreened(d);
  });

  it('the water/water duty offers only designs that pass the screen', async () => {
    const res = await post('/api/thermal/size', waterDuty);
    expect(res.status).toBe(200);
    for (const d of res.body.candidates) expectScreened(d);
  });

  it('a duty whose designs within the other limits fail the screen counts them in the no-design explanation', async () => {
    // 9.525 mm titanium tubes on a 45° layout (Connors' K 2.4) under 80 kg/s of shell-side water: the fast shell side makes the spans unstable
    const res = await post('/api/thermal/size', {
      process: { fluid: 'water', pressure_Pa: 400000, massFlow_kg_s: 20, inletTemp_C: 60, outletTemp_C: 45 },
      boundary: { kind: 'coolant', fluid: 'water', pressure_Pa: 300000, massFlow_kg_s: 80, inletTemp_C: 28 },
      constraints: { maxTubeLength_m: 6, maxPressureDrop_Pa: 300000, tubeOuterDiameters_m: [0.009525], materials: ['titanium-gr2'], layouts: [45] },
    });
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe('no-feasible-design');
    expect(res.body.error.message).toMatch(/\d+ × vibration/);
  });
});

describe('vibration screen in rating', () => {
  it('a geometry with long spans and a fast shell side fails fluid-elastic instability, with its figures', async () => {
    const res = await post('/api/thermal/rate', longFastSpans);
    expect(res.status).toBe(200);
    const v = res.body.vibration;
    expect(v.ok).toBe(false);
    const central = v.spans.find((s: { where: string }) => s.where === 'central');
    // window tube held at every second baffle: 2 × 600 mm
    expect(central.span_m).toBeCloseTo(1.2, 6);
    expect(central.ok).toBe(false);
    expect(central.crossflowVelocity_m_s).toBeGreaterThan(central.criticalVelocity_m_s);
    const ws = res.body.warnings.filter((x: { code: string }) => x.code === 'vibration-fluidelastic').map((x: { message: string }) => x.message);
    expect(ws.join('\n')).toMatch(/fluid-elastic instability at the central span \(1200 mm.*crossflow \d\.\d\d m\/s against a critical \d\.\d\d m\/s/);
  });

  it('the same bundle with 200 mm baffles and a slower shell side passes', async () => {
    const res = await post('/api/thermal/rate', { ...longFastSpans, boundary: { ...longFastSpans.boundary, massFlow_kg_s: 4, baffleSpacing_m: 0.2 } });
    expect(res.status).toBe(200);
    expect(res.body.vibration.ok).toBe(true);
    expect(res.body.warnings.some((x: { code: string }) => x.code.startsWith('vibration-'))).toBe(false);
  });

  it('a wall boundary (no shell) has no vibration screen', async () => {
    const res = await post('/api/thermal/rate', {
      process: { fluid: 'water', pressure_Pa: 300000, massFlow_kg_s: 0.5, inletTemp_C: 60 },
      boundary: { kind: 'wall', wallTemp_C: 20 },
      geometry: { tubeOuterDiameter_m: 0.01905, tubeWall_m: 0.00165, tubeCount: 20, tubeLength_m: 2, tubePasses: 1, tubeMaterial: 'copper' },
    });
    expect(res.status).toBe(200);
    expect(res.body.vibration).toBeUndefined();
  });
});
