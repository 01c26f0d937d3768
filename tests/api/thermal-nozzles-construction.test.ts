/**
 * Nozzles and construction over the public thermal API (issue 11): a sized design carries its four
 * nozzles, the nozzle losses in both pressure-drop breakdowns within the limits, its TEMA type with
 * the reason and its class (the duty's when asked, else C); a bad class is a 400 naming the field;
 * an oil cooler with cooling water on the shell side gets a removable bundle, a glycol loop on the
 * shell side a fixed-tubesheet or removable one by its temperature difference.
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

/** A hydraulic-oil cooler on tower water (invented demo duty). */
const oilDuty = {
  process: { fluid: 'oil-vg46', pressure_Pa: 500000, massFlow_kg_s: 1.2, inletTemp_C: 62, outletTemp_C: 47 },
  boundary: { kind: 'coolant', fluid: 'water', pressure_Pa: 350000, massFlow_kg_s: 2, inletTemp_C: 27 },
  constraints: { maxTubeLength_m: 6, maxPressureDrop_Pa: 70000, maxShellPressureDrop_Pa: 70000, processSide: 'tubes' },
};

describe('nozzles and construction on sized designs', () => {
  it('carries four nozzles, their losses in both breakdowns within the limits, and a removable bundle under shell-side water', async () => {
    const res = await post('/api/thermal/size', oilDuty);
    expect(res.status).toBe(200);
    for (const d of res.body.candidates) {
      expect(d.nozzles).toHaveLength(4);
      const b = d.rating.shellPressureDropBreakdown;
      expect(b.nozzles_Pa).toBeGreaterThan(0);
      expect(b.total_Pa).toBeCloseTo(b.crossflow_Pa + b.window_Pa + b.ends_Pa + b.nozzles_Pa, 3);
      expect(d.rating.shellPressureDrop_Pa).toBeLessThanOrEqual(70000);
      expect(d.rating.pressureDrop.nozzles_Pa).toBeGreaterThan(0);
      expect(d.rating.pressureDrop.total_Pa).toBeLessThanOrEqual(70000);
      // oil in the tubes (clean), tower water on the shell side: the bundle must come out
      expect(['BEU', 'AES']).toContain(d.construction);
      expect(d.constructionReason).toMatch(/cooling water/);
      expect(d.temaClass).toBe('C');
    }
  });

  it('takes the TEMA class the duty asks for and refuses one that is not R, C or B, naming the field', async () => {
    const ok = await post('/api/thermal/size', { ...oilDuty, constraints: { ...oilDuty.constraints, temaClass: 'R' } });
    expect(ok.status).toBe(200);
    expect(ok.body.recommended.temaClass).toBe('R');
    const bad = await post('/api/thermal/size', { ...oilDuty, constraints: { ...oilDuty.constraints, temaClass: 'X' } });
    expect(bad.status).toBe(400);
    expect(JSON.stringify(bad.body.error)).toMatch(/temaClass/);
  });
});
