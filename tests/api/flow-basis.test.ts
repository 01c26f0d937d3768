import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestApp, type TestApp } from './support/app';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.close());

const post = (path: string, body: unknown) => request(t.app).post(path).send(body as object);

/** An invented lube-oil cooler: 60 L/min of ISO VG 46 cooled by 6 m³/h of plant water. */
const sizeBody = (process: object = { volumeFlow_m3_s: 0.001 }, boundary: object = { volumeFlow_m3_s: 6 / 3600 }) => ({
  process: { fluid: 'oil-vg46', pressure_Pa: 500000, inletTemp_C: 62, outletTemp_C: 47, ...process },
  boundary: { kind: 'coolant', fluid: 'water', pressure_Pa: 350000, inletTemp_C: 27, ...boundary },
  constraints: { maxTubeLength_m: 3.5, maxPressureDrop_Pa: 70000, maxShellPressureDrop_Pa: 70000 },
});

const rateBody = (process: object) => ({
  process: { fluid: 'water', pressure_Pa: 300000, inletTemp_C: 85, ...process },
  boundary: { kind: 'wall', wallTemp_C: 20 },
  geometry: { tubeOuterDiameter_m: 0.01905, tubeWall_m: 0.001245, tubeCount: 40, tubeLength_m: 3, tubePasses: 1 },
});

describe('a stream gives exactly one of massFlow_kg_s, volumeFlow_m3_s, standardVolumeFlow_m3_s (issue 12)', () => {
  it('sizes 60 L/min of oil and 6 m³/h of water: the duty is ρ V̇ cp ΔT, the design the same as in kg/s', async () => {
    const byVolume = await post('/api/thermal/size', sizeBody());
    expect(byVolume.status).toBe(200);
    // ISO VG 46 mineral oil near 55 °C: ρ ≈ 845 kg/m³, cp ≈ 2.0 kJ/(kg K) (memory); 60 L/min = 0.001 m³/s over 15 K ≈ 25 kW
    const duty = byVolume.body.recommended.rating.duty_W as number;
    expect(duty / 1000).toBeGreaterThan(0.001 * 845 * 1.9 * 15 * 0.95);
    expect(duty / 1000).toBeLessThan(0.001 * 845 * 2.1 * 15 * 1.05);
    // the coolant in kg/s at ρ(27 °C, 3.5 bar(a)) ≈ 996.6 kg/m³ (IAPWS-95, python3-iapws fixture: 997.86 at 22 °C, 996.04 at 29 °C)
    const byMass = await post('/api/thermal/size', sizeBody({ volumeFlow_m3_s: 0.001 }, { massFlow_kg_s: (6 / 3600) * 996.6 }));
    expect(byMass.status).toBe(200);
    expect(byMass.body.recommended.rating.duty_W).toBeCloseTo(duty, -1);
    expect(byMass.body.recommended.tubeCount).toBe(byVolume.body.recommended.tubeCount);
    expect(byMass.body.recommended.rating.coolantOutletTemp_C).toBeCloseTo(byVolume.body.recommended.rating.coolantOutletTemp_C, 1);
  });

  it('no flow is a 400 naming process.massFlow_kg_s; two are a 400 naming the second', async () => {
    const none = await post('/api/thermal/size', sizeBody({}));
    expect(none.status).toBe(400);
    expect(none.body.error.fields['process.massFlow_kg_s']).toMatch(/exactly one of massFlow_kg_s, volumeFlow_m3_s or standardVolumeFlow_m3_s/);
    const two = await post('/api/thermal/size', sizeBody({ massFlow_kg_s: 1, volumeFlow_m3_s: 0.001 }));
    expect(two.status).toBe(400);
    expect(two.body.error.fields['process.volumeFlow_m3_s']).toMatch(/Give only one flow: massFlow_kg_s is already given/);
    const coolantTwo = await post('/api/thermal/size', sizeBody(undefined, { volumeFlow_m3_s: 0.001, standardVolumeFlow_m3_s: 1, standardReference: 'normal' }));
    expect(coolantTwo.status).toBe(400);
    expect(Object.keys(coolantTwo.body.error.fields)).toEqual(['boundary.standardVolumeFlow_m3_s']);
    const rateTwo = await post('/api/thermal/rate', rateBody({ massFlow_kg_s: 1, standardVolumeFlow_m3_s: 0.1, standardReference: 'standard' }));
    expect(rateTwo.status).toBe(400);
    expect(rateTwo.body.error.fields).toHaveProperty(['process.standardVolumeFlow_m3_s']);
    const rateNone = await post('/api/thermal/rate', rateBody({}));
    expect(rateNone.status).toBe(400);
    expect(rateNone.body.error.fields).toHaveProperty(['process.massFlow_kg_s']);
  });

  it('a standard volume flow needs its reference, and a reference needs its flow; a case gives at most one flow', async () => {
    const noRef = await post('/api/thermal/size', sizeBody({ standardVolumeFlow_m3_s: 0.01 }));
    expect(noRef.status).toBe(400);
    expect(noRef.body.error.fields['process.standardReference']).toMatch(/"normal" \(0 °C, 101.325 kPa\) or "standard" \(60 °F, 14.696 psia\)/);
    const badRef = await post('/api/thermal/size', sizeBody({ standardVolumeFlow_m3_s: 0.01, standardReference: 'ISO' }));
    expect(badRef.status).toBe(400);
    expect(badRef.body.error.fields).toHaveProperty(['process.standardReference']);
    const stray = await post('/api/thermal/size', sizeBody({ massFlow_kg_s: 1, standardReference: 'normal' }));
    expect(stray.status).toBe(400);
    expect(stray.body.error.fields['process.standardReference']).toMatch(/belongs to standardVolumeFlow_m3_s/);
    const caseTwo = await post('/api/thermal/size', { ...sizeBody(), cases: [{ name: 'Summer', process: { massFlow_kg_s: 1, volumeFlow_m3_s: 0.001 } }] });
    expect(caseTwo.status).toBe(400);
    expect(caseTwo.body.error.fields).toHaveProperty(['cases.0.process.volumeFlow_m3_s']);
  });

  it('a gas in Nm³/h sizes; a volume flow that makes more than 1000 kg/s is a 422 naming the volume field', async () => {
    const air = await post('/api/thermal/size', {
      process: { fluid: 'air', pressure_Pa: 800000, inletTemp_C: 120, outletTemp_C: 45, standardVolumeFlow_m3_s: 1000 / 3600, standardReference: 'normal' },
      boundary: { kind: 'coolant', fluid: 'water', pressure_Pa: 350000, inletTemp_C: 27, volumeFlow_m3_s: 4 / 3600 },
      constraints: { maxTubeLength_m: 3.5, maxPressureDrop_Pa: 70000, maxShellPressureDrop_Pa: 70000 },
    });
    expect(air.status).toBe(200);
    // 1000 Nm³/h × 1.293 kg/m³ (dry air at 0 °C, 101.325 kPa; memory) × cp ≈ 1010 J/(kg K) × 75 K ≈ 27 kW
    expect(air.body.recommended.rating.duty_W / 1000).toBeGreaterThan(25);
    expect(air.body.recommended.rating.duty_W / 1000).toBeLessThan(29);
    const huge = await post('/api/thermal/size', sizeBody(undefined, { volumeFlow_m3_s: 900 }));
    expect(huge.status).toBe(422);
    expect(huge.body.error.code).toBe('flow-too-large');
    expect(huge.body.error.fields).toHaveProperty(['boundary.volumeFlow_m3_s']);
  });
});
