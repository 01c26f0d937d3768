/**
 * Issue 9, finding 1: one anonymous request froze the app. Out-of-range numbers and long lists are
 * refused before the engine runs (400 naming the field); the engine runs in worker threads within a
 * time budget, so a long search answers 503 with the budget message while other requests go on.
 */
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { tubeMaterialIds } from '../../shared/thermal/geometry/materials';
import { signedIn, startTestApp, type TestApp } from './support/app';
import { oilCoolerDuty } from './support/quotes';

let t: TestApp;
/** the same app with a 50 ms budget (THERMAL_TIME_BUDGET_MS through the configuration) */
let tight: TestApp;
beforeAll(async () => {
  [t, tight] = await Promise.all([startTestApp(), startTestApp({ THERMAL_TIME_BUDGET_MS: '50' })]);
});
afterAll(async () => {
  await Promise.all([t?.close(), tight?.close()]);
});

const duty = {
  process: { fluid: 'water', pressure_Pa: 300000, massFlow_kg_s: 1.5, inletTemp_C: 85, outletTemp_C: 40 },
  boundary: { kind: 'coolant', fluid: 'water', pressure_Pa: 300000, massFlow_kg_s: 3, inletTemp_C: 20 },
  constraints: { maxTubeLength_m: 4, maxPressureDrop_Pa: 70000 },
};
const rateBody = (shellInnerDiameter_m: number) => ({
  process: { fluid: 'water', pressure_Pa: 300000, massFlow_kg_s: 1.5, inletTemp_C: 85 },
  boundary: { ...duty.boundary, shellInnerDiameter_m },
  geometry: { tubeOuterDiameter_m: 0.01905, tubeWall_m: 0.001245, tubeCount: 100, tubeLength_m: 3, tubePasses: 2 },
});
/**
 * Long choice lists, large flows and 12 m tubes; tube diameters no earlier request used, so every
 * tube layout is computed afresh (none is in the workers' cache): seconds of search on one core.
 */
const heavyDuty = () => ({
  process: { ...duty.process, massFlow_kg_s: 40 },
  boundary: { ...duty.boundary, massFlow_kg_s: 80 },
  constraints: {
    maxTubeLength_m: 12, maxPressureDrop_Pa: 70000,
    tubeOuterDiameters_m: Array.from({ length: 10 }, (_, i) => 0.012 + i * 0.002 + Math.random() * 1e-4),
    materials: tubeMaterialIds.slice(0, 8), tubePasses: [1, 2, 4, 6, 8], layouts: [30, 60, 90, 45],
  },
});

describe('thermal requests are bounded before the engine runs (issue 9)', () => {
  it('answers 400 naming boundary.shellInnerDiameter_m for a 9.2e18 m shell', async () => {
    const res = await request(t.app).post('/api/thermal/rate').send(rateBody(9.2e18));
    expect(res.status).toBe(400);
    expect(res.body.error.fields['boundary.shellInnerDiameter_m']).toBe('Shell inner diameter must be between 0.05 and 2.5 m.');
    expect(res.body.error.message).toMatch(/boundary\.shellInnerDiameter_m: Shell inner diameter must be between 0\.05 and 2\.5 m/);
  });

  it('answers 400 for 1,000 distinct tube diameters and for 3,000 repeated materials', async () => {
    const ods = Array.from({ length: 1000 }, (_, i) => 0.01 + i * 1e-5);
    const many = await request(t.app).post('/api/thermal/size').send({ ...duty, constraints: { ...duty.constraints, tubeOuterDiameters_m: ods } });
    expect(many.status).toBe(400);
    expect(many.body.error.fields['constraints.tubeOuterDiameters_m']).toMatch(/at most 10/);
    const repeated = await request(t.app).post('/api/thermal/size').send({ ...duty, constraints: { ...duty.constraints, materials: Array(3000).fill('copper') } });
    expect(repeated.status).toBe(400);
    expect(repeated.body.error.fields['constraints.materials']).toMatch(/at most 10/);
  });

  it('still sizes a request whose short lists repeat themselves (repeats dropped)', async () => {
    const res = await request(t.app).post('/api/thermal/size').send({ ...duty, constraints: { ...duty.constraints, materials: ['copper', 'copper'], tubePasses: [1, 1] } });
    expect(res.status).toBe(200);
    expect(res.body.recommended.tubeMaterial).toBe('copper');
  });

  it('refuses an out-of-range duty in a quote with 400 naming the field', async () => {
    const customer = await signedIn(t.app, 'customer@pellmar.example');
    const d = oilCoolerDuty();
    const res = await customer.post('/api/quotes').send({ duty: { ...d, boundary: { ...d.boundary, shellInnerDiameter_m: 60 } }, quantity: 1 });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty(['duty.boundary.shellInnerDiameter_m']);
  });
});

describe('the engine runs off the request loop, within a time budget (issue 9)', () => {
  it('answers GET /api/health while a long search runs', async () => {
    const order: string[] = [];
    const sizing = request(t.app).post('/api/thermal/size').send(heavyDuty()).then((res) => (order.push('size'), res));
    // the health check is sent after the search started and comes back before it ends
    await new Promise((r) => setTimeout(r, 100));
    const health = await request(t.app).get('/api/health');
    order.push('health');
    expect(health.status).toBe(200);
    const res = await sizing;
    expect([200, 503]).toContain(res.status); // 503 only where the default budget is too short for it
    expect(order).toEqual(['health', 'size']);
  });

  it('stops a search past its budget with 503 and the budget in words; the next search is computed', async () => {
    const res = await request(tight.app).post('/api/thermal/size').send(heavyDuty());
    expect(res.status).toBe(503);
    expect(res.body.error.code).toBe('over-budget');
    expect(res.body.error.message).toMatch(/the computation took longer than its budget \(0\.05 s\)/i);
    // the pool replaced the stopped worker
    const next = await request(t.app).post('/api/thermal/size').send(duty);
    expect(next.status).toBe(200);
  });

  it('refuses a quote whose sizing runs past the budget with 503, storing nothing', async () => {
    const customer = await signedIn(tight.app, 'customer@pellmar.example');
    const count = async () => Number((await tight.database.pool.query('select count(*) from quotes')).rows[0].count);
    const before = await count();
    const res = await customer.post('/api/quotes').send({ duty: heavyDuty(), quantity: 1 });
    expect(res.status).toBe(503);
    expect(res.body.error.code).toBe('over-budget');
    expect(await count()).toBe(before);
  });
});
