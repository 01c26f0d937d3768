import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestApp, type TestApp } from './support/app';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.close());

/** The request body of issue 3's example: water in 40 copper tubes, wall held at 20 °C. */
const rateBody = () => ({
  process: { fluid: 'water', pressure_Pa: 300000, massFlow_kg_s: 1.5, inletTemp_C: 85 },
  boundary: { kind: 'wall', wallTemp_C: 20 },
  geometry: {
    tubeOuterDiameter_m: 0.01905, tubeWall_m: 0.001245, tubeCount: 40,
    tubeLength_m: 3.0, tubePasses: 1, roughness_m: 1.5e-6, tubeMaterial: 'copper',
  },
  correlation: 'auto',
});

/** An invented lube-oil cooler duty: ISO VG 46 cooled by plant water. */
const sizeBody = () => ({
  process: { fluid: 'oil-vg46', pressure_Pa: 500000, massFlow_kg_s: 1.2, inletTemp_C: 62, outletTemp_C: 47 },
  boundary: { kind: 'coolant', fluid: 'water', pressure_Pa: 350000, massFlow_kg_s: 2.0, inletTemp_C: 27 },
  constraints: { maxTubeLength_m: 3.5, maxPressureDrop_Pa: 70000, maxShellPressureDrop_Pa: 70000 },
});

const post = (path: string, body: unknown) => request(t.app).post(path).send(body as object);

function allFinite(value: unknown): boolean {
  if (typeof value === 'number') return Number.isFinite(value);
  if (Array.isArray(value)) return value.every(allFinite);
  if (value && typeof value === 'object') return Object.values(value).every(allFinite);
  return true;
}

describe('POST /api/thermal/rate', () => {
  it('rates a wall-cooled bundle with every documented field, no sign-in or CSRF header needed', async () => {
    const res = await post('/api/thermal/rate', rateBody());
    expect(res.status).toBe(200);
    const r = res.body;
    for (const key of ['outletTemp_C', 'duty_W', 'reynolds', 'prandtl', 'nusselt', 'htc_W_m2K', 'velocity_m_s', 'entranceLength_m', 'frictionFactor', 'bulkMeanTemp_C']) {
      expect(typeof r[key]).toBe('number');
    }
    expect(['laminar', 'transitional', 'turbulent']).toContain(r.regime);
    expect(typeof r.correlation).toBe('string');
    expect(Object.keys(r.pressureDrop)).toEqual(expect.arrayContaining(['friction_Pa', 'returns_Pa', 'total_Pa']));
    expect(Array.isArray(r.warnings)).toBe(true);
    expect(allFinite(r)).toBe(true);
    // cooled towards the wall, never past it
    expect(r.outletTemp_C).toBeLessThan(85);
    expect(r.outletTemp_C).toBeGreaterThan(20);
    expect(r.bulkMeanTemp_C).toBeCloseTo((85 + r.outletTemp_C) / 2, 6);
    // Re = 4 ṁ_tube / (π D_i μ): with the returned Re, the implied viscosity must be that of water near the bulk mean (0.3–0.6 mPa·s)
    const di = 0.01905 - 2 * 0.001245;
    const mu = (4 * (1.5 / 40)) / (Math.PI * di * r.reynolds);
    expect(mu).toBeGreaterThan(0.0003);
    expect(mu).toBeLessThan(0.0006);
    expect(r.caution).toMatch(/responsible engineer/);
  });

  it('rates against a coolant and reports U, ε, NTU, F and the shell side', async () => {
    const body = {
      ...rateBody(),
      boundary: { kind: 'coolant', fluid: 'water', pressure_Pa: 300000, massFlow_kg_s: 3, inletTemp_C: 25 },
      geometry: { ...rateBody().geometry, tubePasses: 2 },
    };
    const res = await post('/api/thermal/rate', body);
    expect(res.status).toBe(200);
    const r = res.body;
    for (const key of ['coolantOutletTemp_C', 'overallU_W_m2K', 'effectiveness', 'ntu', 'lmtdCorrectionF', 'shellPressureDrop_Pa']) {
      expect(typeof r[key]).toBe('number');
    }
    expect(r.effectiveness).toBeGreaterThan(0);
    expect(r.effectiveness).toBeLessThan(1);
    expect(r.coolantOutletTemp_C).toBeGreaterThan(25);
    // energy balance of the two streams: the duty leaves the process and enters the coolant
    const coolantDuty = 3 * 4180 * (r.coolantOutletTemp_C - 25); // cp of water ≈ 4180 J/kg·K near 30 °C (IAPWS-95)
    expect(Math.abs(coolantDuty / r.duty_W - 1)).toBeLessThan(0.01);
  });

  it('answers 400 naming the field for malformed input, including non-finite numbers', async () => {
    const word = await post('/api/thermal/rate', { ...rateBody(), process: { ...rateBody().process, massFlow_kg_s: 'fast' } });
    expect(word.status).toBe(400);
    expect(word.body.error.fields).toHaveProperty(['process.massFlow_kg_s']);
    const inf = await request(t.app).post('/api/thermal/rate').set('content-type', 'application/json')
      .send(JSON.stringify(rateBody()).replace('"inletTemp_C":85', '"inletTemp_C":1e999'));
    expect(inf.status).toBe(400);
    expect(inf.body.error.fields).toHaveProperty(['process.inletTemp_C']);
    const unknownFluid = await post('/api/thermal/rate', { ...rateBody(), process: { ...rateBody().process, fluid: 'mercury' } });
    expect(unknownFluid.status).toBe(400);
    expect(unknownFluid.body.error.fields).toHaveProperty(['process.fluid']);
  });

  it('answers 422 with the physics in words for impossible states', async () => {
    const boiling = await post('/api/thermal/rate', { ...rateBody(), process: { ...rateBody().process, pressure_Pa: 101325, inletTemp_C: 130 } });
    expect(boiling.status).toBe(422);
    expect(boiling.body.error.message).toMatch(/boil/i);
    const noFlow = await post('/api/thermal/rate', { ...rateBody(), process: { ...rateBody().process, massFlow_kg_s: 0 } });
    expect(noFlow.status).toBe(422);
    expect(noFlow.body.error.message).toMatch(/flow/i);
    const warmWall = await post('/api/thermal/rate', { ...rateBody(), boundary: { kind: 'wall', wallTemp_C: 95 } });
    expect(warmWall.status).toBe(422);
  });
});

describe('POST /api/thermal/size', () => {
  it('sizes a duty: a recommended design that meets the target, with alternatives and the margin', async () => {
    const res = await post('/api/thermal/size', sizeBody());
    expect(res.status).toBe(200);
    const { recommended: d, candidates, evaluated } = res.body;
    for (const key of ['tubeCount', 'tubeLength_m', 'tubePasses', 'tubeOuterDiameter_m', 'tubeWall_m', 'tubeMaterial', 'shellInnerDiameter_m', 'area_m2', 'overSurface_pct']) {
      expect(d).toHaveProperty(key);
    }
    expect(d.tubeLength_m).toBeLessThanOrEqual(3.5);
    expect(d.overSurface_pct).toBeGreaterThanOrEqual(0);
    expect(d.rating.outletTemp_C).toBeLessThanOrEqual(47 + 1e-6);
    expect(d.rating.pressureDrop.total_Pa).toBeLessThanOrEqual(70000);
    expect(d.rating.shellPressureDrop_Pa).toBeLessThanOrEqual(70000);
    expect(candidates.length).toBeGreaterThan(1);
    expect(evaluated).toBeGreaterThanOrEqual(candidates.length);
    expect(allFinite(res.body)).toBe(true);
    // re-rating the recommended geometry through the public rate endpoint gives the same outlet
    const rerate = await post('/api/thermal/rate', {
      process: { fluid: 'oil-vg46', pressure_Pa: 500000, massFlow_kg_s: 1.2, inletTemp_C: 62 },
      boundary: {
        ...sizeBody().boundary,
        shellInnerDiameter_m: d.shellInnerDiameter_m, baffleSpacing_m: d.baffleSpacing_m, tubePitch_m: d.tubePitch_m, layout: d.layout,
        baffleCut: d.baffleCut,
      },
      geometry: {
        tubeOuterDiameter_m: d.tubeOuterDiameter_m, tubeWall_m: d.tubeWall_m, tubeCount: d.tubeCount,
        tubeLength_m: d.tubeLength_m, tubePasses: d.tubePasses, tubeMaterial: d.tubeMaterial,
        processSide: d.processSide, shellsInSeries: d.shellsInSeries,
      },
    });
    expect(rerate.status).toBe(200);
    expect(rerate.body.outletTemp_C).toBeCloseTo(d.rating.outletTemp_C, 2);
  });

  it('explains a target colder than the coolant inlet instead of computing it', async () => {
    const body = sizeBody();
    body.process.outletTemp_C = 20;
    const res = await post('/api/thermal/size', body);
    expect(res.status).toBe(422);
    expect(res.body.error.message).toMatch(/coolant|27/);
  });

  it('says which limit binds when no design is feasible', async () => {
    const body = sizeBody();
    // short tubes and a small shell cannot both hold the surface this duty needs
    body.constraints = { ...body.constraints, maxTubeLength_m: 0.8, maxShellInnerDiameter_m: 0.15 } as typeof body.constraints;
    const res = await post('/api/thermal/size', body);
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe('no-feasible-design');
    expect(res.body.error.message).toMatch(/shell/i);
    expect(res.body.error.message).toMatch(/relax/i);
  });
});
