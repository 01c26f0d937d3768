import { readFileSync } from 'node:fs';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestApp, type TestApp } from './support/app';

/** Reference states computed with python3-iapws (IAPWS-95 + 2008/2011 transport), see tests/reference. */
const reference = JSON.parse(readFileSync(new URL('../reference/fixtures/properties.json', import.meta.url), 'utf8'));
type State = { temp_C: number; pressure_Pa: number; density: number; specificHeat: number; viscosity: number; conductivity: number };

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.close());

describe('GET /api/fluids', () => {
  it('lists the library with the stable ids, ranges and sources', async () => {
    const res = await request(t.app).get('/api/fluids').expect(200);
    const ids = res.body.items.map((f: { id: string }) => f.id);
    for (const id of ['water', 'air', 'air-moist', 'ethylene-glycol-30', 'ethylene-glycol-50', 'propylene-glycol-30', 'propylene-glycol-50', 'oil-vg32', 'oil-vg46', 'oil-vg68']) {
      expect(ids).toContain(id);
    }
    for (const f of res.body.items) {
      expect(Object.keys(f).sort()).toEqual(['id', 'maxTemp_C', 'minTemp_C', 'name', 'phase', 'source']);
      expect(f.minTemp_C).toBeLessThan(f.maxTemp_C);
      expect(f.source.length).toBeGreaterThan(10);
    }
  });
});

describe('GET /api/fluids/:id/properties', () => {
  it('returns water properties in SI within 0.5 % of IAPWS-95 (python3-iapws)', async () => {
    const state: State = reference.water.states.find((s: State) => s.temp_C > 40 && s.temp_C < 70);
    const res = await request(t.app)
      .get('/api/fluids/water/properties')
      .query({ temp_C: state.temp_C, pressure_Pa: state.pressure_Pa })
      .expect(200);
    for (const key of ['density', 'specificHeat', 'viscosity', 'conductivity'] as const) {
      expect(Math.abs(res.body[key] / state[key] - 1)).toBeLessThan(0.005);
    }
    expect(res.body.prandtl).toBeCloseTo((res.body.specificHeat * res.body.viscosity) / res.body.conductivity, 6);
  });

  it('returns dry air within 2 % of Lemmon et al. (python3-iapws Air) at pressure', async () => {
    const state: State = reference.air.states.find((s: State) => s.pressure_Pa >= 1e6);
    const res = await request(t.app)
      .get('/api/fluids/air/properties')
      .query({ temp_C: state.temp_C, pressure_Pa: state.pressure_Pa })
      .expect(200);
    for (const key of ['density', 'specificHeat', 'viscosity', 'conductivity'] as const) {
      expect(Math.abs(res.body[key] / state[key] - 1)).toBeLessThan(0.02);
    }
  });

  it('answers 422 outside the valid range, explaining the physics', async () => {
    const boiling = await request(t.app).get('/api/fluids/water/properties').query({ temp_C: 120, pressure_Pa: 101325 });
    expect(boiling.status).toBe(422);
    expect(boiling.body.error.message).toMatch(/boil/i);
    const frozen = await request(t.app).get('/api/fluids/ethylene-glycol-30/properties').query({ temp_C: -40 });
    expect(frozen.status).toBe(422);
  });

  it('answers 400 for a missing or non-numeric temperature and 404 for an unknown fluid', async () => {
    const missing = await request(t.app).get('/api/fluids/water/properties');
    expect(missing.status).toBe(400);
    expect(missing.body.error.fields).toHaveProperty('temp_C');
    const nan = await request(t.app).get('/api/fluids/water/properties').query({ temp_C: 'warm' });
    expect(nan.status).toBe(400);
    const inf = await request(t.app).get('/api/fluids/water/properties').query({ temp_C: 'Infinity' });
    expect(inf.status).toBe(400);
    const unknown = await request(t.app).get('/api/fluids/mercury/properties').query({ temp_C: 20 });
    expect(unknown.status).toBe(404);
  });
});

describe('glycol–water at any library strength (10–60 % by mass in steps of 5, Melinder 2010)', () => {
  const props = async (id: string, temp_C: number) =>
    (await request(t.app).get(`/api/fluids/${id}/properties`).query({ temp_C }).expect(200)).body;

  it('lists ethylene- and propylene-glycol 10…60 % with their freezing points as the lower limit', async () => {
    const res = await request(t.app).get('/api/fluids').expect(200);
    const byId = new Map<string, { name: string; minTemp_C: number; maxTemp_C: number }>(
      res.body.items.map((f: { id: string }) => [f.id, f]),
    );
    for (const kind of ['ethylene', 'propylene']) {
      for (let p = 10; p <= 60; p += 5) expect(byId.has(`${kind}-glycol-${p}`), `${kind} ${p}`).toBe(true);
    }
    const eg40 = byId.get('ethylene-glycol-40')!;
    expect(eg40.name).toBe('Ethylene glycol–water, 40 % by mass');
    // ASHRAE Handbook—Fundamentals (2009) ch. 31: 40 % ethylene glycol freezes near −23.5 °C (memory)
    expect(Math.abs(eg40.minTemp_C + 23.5)).toBeLessThan(1.5);
    expect(eg40.maxTemp_C).toBe(100);
  });

  it('40 % ethylene glycol at 20 °C lies between 30 % and 50 % and near the published values', async () => {
    const [a, m, b] = [await props('ethylene-glycol-30', 20), await props('ethylene-glycol-40', 20), await props('ethylene-glycol-50', 20)];
    for (const key of ['density', 'specificHeat', 'viscosity', 'conductivity', 'prandtl']) {
      expect(m[key], key).toBeGreaterThan(Math.min(a[key], b[key]));
      expect(m[key], key).toBeLessThan(Math.max(a[key], b[key]));
    }
    // ASHRAE Handbook—Fundamentals (2009) ch. 31 ethylene glycol tables, 40 % by mass, 20 °C (memory)
    expect(Math.abs(m.density / 1053 - 1)).toBeLessThan(0.01);
    expect(Math.abs(m.specificHeat / 3500 - 1)).toBeLessThan(0.03);
    expect(Math.abs(m.viscosity / 2.9e-3 - 1)).toBeLessThan(0.15);
  });

  it('refuses a strength outside 10–60 % or off the steps with 422 naming `id`', async () => {
    const high = await request(t.app).get('/api/fluids/ethylene-glycol-70/properties').query({ temp_C: 20 });
    expect(high.status).toBe(422);
    expect(high.body.error.code).toBe('fluid-range');
    expect(high.body.error.fields.id).toMatch(/10 to 60 % glycol by mass/);
    const off = await request(t.app).get('/api/fluids/propylene-glycol-42/properties').query({ temp_C: 20 });
    expect(off.status).toBe(422);
    expect(off.body.error.fields.id).toMatch(/propylene-glycol-40 or propylene-glycol-45/);
  });

  it('refuses 40 % ethylene glycol below its freezing point (−23.8 °C, Melinder 2010)', async () => {
    expect((await request(t.app).get('/api/fluids/ethylene-glycol-40/properties').query({ temp_C: -20 })).status).toBe(200);
    const frozen = await request(t.app).get('/api/fluids/ethylene-glycol-40/properties').query({ temp_C: -30 });
    expect(frozen.status).toBe(422);
    expect(frozen.body.error.message).toMatch(/begins to freeze at -23\.8 °C/);
  });
});

describe('glycol strength in a sizing request', () => {
  const sizeBody = (coolant: string, inletTemp_C: number) => ({
    process: { fluid: 'oil-vg46', pressure_Pa: 500000, massFlow_kg_s: 1.2, inletTemp_C: 62, outletTemp_C: 47 },
    boundary: { kind: 'coolant', fluid: coolant, pressure_Pa: 350000, massFlow_kg_s: 2.4, inletTemp_C },
    constraints: { maxTubeLength_m: 3.5, maxPressureDrop_Pa: 70000, maxShellPressureDrop_Pa: 70000 },
  });

  it('sizes with a 40 % ethylene glycol coolant', async () => {
    const res = await request(t.app).post('/api/thermal/size').send(sizeBody('ethylene-glycol-40', 27));
    expect(res.status).toBe(200);
  });

  it('refuses a 70 % glycol coolant with 400 naming boundary.fluid and the range', async () => {
    const res = await request(t.app).post('/api/thermal/size').send(sizeBody('ethylene-glycol-70', 27));
    expect(res.status).toBe(400);
    expect(res.body.error.fields['boundary.fluid']).toMatch(/10 to 60 % glycol by mass/);
  });

  it('refuses a coolant entering below its freezing point with 422', async () => {
    const res = await request(t.app).post('/api/thermal/size').send(sizeBody('ethylene-glycol-20', -12));
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe('fluid-frozen');
    expect(res.body.error.fields).toHaveProperty(['boundary.inletTemp_C']);
    expect(res.body.error.message).toMatch(/20 % by mass begins to freeze at -7\.9 °C/);
  });
});
