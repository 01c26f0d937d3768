/**
 * Walls for pressure over the public thermal API (issue 11): a duty's optional design pressure and
 * temperature per stream, the required walls on the design, bad input refused naming the field.
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
const ATM = 101_325;

/** Invented duty: oil cooled by water, the oil forced into the tubes. */
const duty = (design?: { pressure_Pa: number; temp_C: number }) => ({
  process: { fluid: 'oil-vg46', pressure_Pa: 5e5, massFlow_kg_s: 1.2, inletTemp_C: 62, outletTemp_C: 47, ...(design ? { design } : {}) },
  boundary: { kind: 'coolant', fluid: 'water', pressure_Pa: 3.5e5, massFlow_kg_s: 2, inletTemp_C: 27 },
  constraints: { maxTubeLength_m: 6, maxPressureDrop_Pa: 100000, maxShellPressureDrop_Pa: 70000, processSide: 'tubes', materials: ['carbon-steel'] },
});

describe('POST /api/thermal/size with design pressures', () => {
  it('a duty without `design` (as stored before) sizes; every design carries walls that cover what it needs', async () => {
    const res = await post('/api/thermal/size', duty());
    expect(res.status).toBe(200);
    for (const d of res.body.candidates) {
      expect(d.tubeWall_m).toBeGreaterThanOrEqual(d.tubeWallRequired_m - 1e-9);
      expect(d.shellWallRequired_m).toBeGreaterThan(0);
      expect(d.shellWall_m).toBeGreaterThan(0);
    }
  });

  it('a 60 bar(g) design pressure on the oil gives thicker carbon-steel tubes than the default', async () => {
    const low = (await post('/api/thermal/size', duty()).expect(200)).body;
    const high = (await post('/api/thermal/size', duty({ pressure_Pa: 60e5 + ATM, temp_C: 100 })).expect(200)).body;
    const thinnest = (b: { candidates: { tubeWall_m: number }[] }) => Math.min(...b.candidates.map((d) => d.tubeWall_m));
    expect(thinnest(high)).toBeGreaterThan(thinnest(low));
    expect(high.recommended.tubeWallRequired_m).toBeGreaterThan(low.recommended.tubeWallRequired_m);
  });

  it('refuses a design pressure out of range with 400 naming the field', async () => {
    const res = await post('/api/thermal/size', duty({ pressure_Pa: -1, temp_C: 100 }));
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body.error.fields)).toContain('process.design.pressure_Pa');
  });
});
