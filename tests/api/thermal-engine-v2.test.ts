/**
 * Design engine v2 over the public thermal API (issue 10): allocation, both-side limits by default,
 * shells in series, the shell-side method, distinct candidates, and old-shaped requests.
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
const oilDuty = () => ({
  process: { fluid: 'oil-vg46', pressure_Pa: 500000, massFlow_kg_s: 1.2, inletTemp_C: 62, outletTemp_C: 47 },
  boundary: { kind: 'coolant', fluid: 'water', pressure_Pa: 350000, massFlow_kg_s: 2, inletTemp_C: 27 },
  constraints: { maxTubeLength_m: 6, maxPressureDrop_Pa: 70000, maxShellPressureDrop_Pa: 70000 },
});
/** The water/water duty, no shell-side limit given. */
const waterDuty = (maxTubeLength_m = 6) => ({
  process: { fluid: 'water', pressure_Pa: 300000, massFlow_kg_s: 2, inletTemp_C: 75, outletTemp_C: 40 },
  boundary: { kind: 'coolant', fluid: 'water', pressure_Pa: 300000, massFlow_kg_s: 3, inletTemp_C: 25 },
  constraints: { maxTubeLength_m, maxPressureDrop_Pa: 70000 },
});

describe('POST /api/thermal/size, engine v2', () => {
  it('puts the oil on the shell side with U 150–400 W/m²K (common practice) and both ΔP within 70 kPa, saying why', async () => {
    const res = await post('/api/thermal/size', oilDuty());
    expect(res.status).toBe(200);
    const d = res.body.recommended;
    expect(d.processSide).toBe('shell');
    expect(d.rating.shellMethod).toBe('bell-delaware');
    expect(d.rating.shellHtcKern_W_m2K).toBeGreaterThan(0);
    expect(d.rating.shellCorrections.Jl).toBeGreaterThan(0);
    expect(d.rating.overallU_W_m2K).toBeGreaterThanOrEqual(150);
    expect(d.rating.overallU_W_m2K).toBeLessThanOrEqual(400);
    expect(d.rating.pressureDrop.total_Pa).toBeLessThanOrEqual(70000);
    expect(d.rating.shellPressureDrop_Pa).toBeLessThanOrEqual(70000);
    expect(d.allocationReason).toMatch(/shell side/);
    expect(d.recommendedReason).toBeTruthy();
    expect(res.body.candidates[0].recommendedReason).toBe(d.recommendedReason);
  });

  it('keeps the shell drop within the tube-side limit when no shell limit is given (686 kPa before)', async () => {
    const res = await post('/api/thermal/size', waterDuty());
    expect(res.status).toBe(200);
    for (const d of res.body.candidates) expect(d.rating.shellPressureDrop_Pa).toBeLessThanOrEqual(70000);
  });

  it('finds a design for the 3 m temperature-cross duty (shells in series or one pass), both ΔP ≤ 70 kPa', async () => {
    const res = await post('/api/thermal/size', waterDuty(3));
    expect(res.status).toBe(200);
    const d = res.body.recommended;
    expect(d.tubeLength_m).toBeLessThanOrEqual(3);
    expect(d.shellsInSeries > 1 || d.tubePasses === 1).toBe(true);
    expect(d.rating.pressureDrop.total_Pa).toBeLessThanOrEqual(70000);
    expect(d.rating.shellPressureDrop_Pa).toBeLessThanOrEqual(70000);
  });

  it('lists each design once', async () => {
    const res = await post('/api/thermal/size', oilDuty());
    const key = (d: Record<string, number | string>) => [d.processSide, d.shellsInSeries, d.tubePasses, Math.round(Number(d.tubeOuterDiameter_m) * 1000), d.tubeCount, d.shellInnerDiameter_m, d.tubeLength_m].join('|');
    const keys = res.body.candidates.map(key);
    expect(new Set(keys).size).toBe(keys.length);
  });

  it('a forced side and a forced Kern shell side are kept', async () => {
    const body = { ...oilDuty(), constraints: { ...oilDuty().constraints, processSide: 'tubes' }, shellMethod: 'kern' };
    const res = await post('/api/thermal/size', body);
    expect(res.status).toBe(200);
    for (const d of res.body.candidates) {
      expect(d.processSide).toBe('tubes');
      expect(d.rating.shellMethod).toBe('kern');
    }
  });

  it('an unknown process side answers 400 naming the field', async () => {
    const res = await post('/api/thermal/size', { ...oilDuty(), constraints: { ...oilDuty().constraints, processSide: 'middle' } });
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body.error)).toMatch(/constraints\.processSide/);
  });
});

describe('POST /api/thermal/rate, engine v2', () => {
  const rateBody = (geometry: Record<string, unknown> = {}, boundary: Record<string, unknown> = {}) => ({
    process: { fluid: 'oil-vg46', pressure_Pa: 500000, massFlow_kg_s: 1.2, inletTemp_C: 62 },
    boundary: { kind: 'coolant', fluid: 'water', pressure_Pa: 350000, massFlow_kg_s: 2, inletTemp_C: 27, shellInnerDiameter_m: 0.2545, ...boundary },
    geometry: { tubeOuterDiameter_m: 0.015875, tubeWall_m: 0.001245, tubeCount: 68, tubeLength_m: 3, tubePasses: 4, ...geometry },
  });

  it('rates the process on the shell side, in two shells, with the baffles given', async () => {
    const res = await post('/api/thermal/rate', rateBody({ processSide: 'shell', shellsInSeries: 2 }, { baffleSpacing_m: 0.08, baffleCut: 0.3 }));
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ processSide: 'shell', tubeFluid: 'coolant', shellFluid: 'process', shellsInSeries: 2, baffleSpacing_m: 0.08, baffleCut: 0.3 });
    expect(res.body.baffleCount).toBeGreaterThan(10);
    expect(res.body.shellPressureDropBreakdown.total_Pa).toBeCloseTo(res.body.shellPressureDrop_Pa, 3);
  });

  it('refuses the process on the shell side of a wall boundary (422 naming geometry.processSide)', async () => {
    const body = { ...rateBody({ processSide: 'shell' }), boundary: { kind: 'wall', wallTemp_C: 20 } };
    const res = await post('/api/thermal/rate', body);
    expect(res.status).toBe(422);
    expect(JSON.stringify(res.body.error)).toMatch(/geometry\.processSide/);
  });

  it('answers 400 naming geometry.shellsInSeries for five shells', async () => {
    const res = await post('/api/thermal/rate', rateBody({ shellsInSeries: 5 }));
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body.error)).toMatch(/geometry\.shellsInSeries/);
  });
});
