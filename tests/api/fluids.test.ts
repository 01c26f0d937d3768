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
