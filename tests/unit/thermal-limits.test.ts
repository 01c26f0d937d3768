/**
 * Issue 9, finding 1: the thermal request schemas bound every number to a physical range and keep
 * lists short and free of repeats, so no request body can make the engine's loops or caches grow
 * without end. The figures that froze the app are the probe's (issue 9).
 */
import { describe, expect, it } from 'vitest';
import { LIMITS, rateRequestSchema, sizeRequestSchema } from '../../shared/schemas/thermal';
import { tubeLayout, layoutCacheSize, LAYOUT_CACHE_MAX } from '../../shared/thermal/geometry/layout';

const duty = {
  process: { fluid: 'water', pressure_Pa: 300000, massFlow_kg_s: 1.5, inletTemp_C: 85, outletTemp_C: 40 },
  boundary: { kind: 'coolant', fluid: 'water', pressure_Pa: 300000, massFlow_kg_s: 3, inletTemp_C: 20 },
  constraints: { maxTubeLength_m: 4, maxPressureDrop_Pa: 70000 },
} as const;
const rateBody = {
  process: duty.process,
  boundary: { ...duty.boundary, shellInnerDiameter_m: 0.3 },
  geometry: { tubeOuterDiameter_m: 0.01905, tubeWall_m: 0.001245, tubeCount: 100, tubeLength_m: 3, tubePasses: 2 },
};

const issues = (r: { success: boolean; error?: { issues: { path: PropertyKey[]; message: string }[] } }) =>
  Object.fromEntries((r.error?.issues ?? []).map((i) => [i.path.join('.'), i.message]));

describe('thermal request limits (issue 9)', () => {
  it('refuses a 9.2e18 m shell, naming the field and the range in words', () => {
    const r = rateRequestSchema.safeParse({ ...rateBody, boundary: { ...rateBody.boundary, shellInnerDiameter_m: 9.2e18 } });
    expect(issues(r)).toEqual({ 'boundary.shellInnerDiameter_m': 'Shell inner diameter must be between 0.05 and 2.5 m.' });
  });

  it('bounds temperatures, pressures, flows, lengths and counts', () => {
    const bad = sizeRequestSchema.safeParse({
      ...duty,
      process: { ...duty.process, inletTemp_C: 1e9, pressure_Pa: 1e12, massFlow_kg_s: 1e7 },
      constraints: { ...duty.constraints, maxTubeLength_m: 60, maxPressureDrop_Pa: 1e300, maxShellInnerDiameter_m: 60 },
    });
    expect(Object.keys(issues(bad)).sort()).toEqual([
      'constraints.maxPressureDrop_Pa', 'constraints.maxShellInnerDiameter_m', 'constraints.maxTubeLength_m',
      'process.inletTemp_C', 'process.massFlow_kg_s', 'process.pressure_Pa',
    ]);
    expect(issues(bad)['process.inletTemp_C']).toBe('Process inlet temperature must be between -100 and 600 °C.');
    const many = rateRequestSchema.safeParse({ ...rateBody, geometry: { ...rateBody.geometry, tubeCount: 1e6 } });
    expect(issues(many)['geometry.tubeCount']).toMatch(/1 to 20000/);
    // in range, zero flow still reaches the engine, which explains it with a 422 (tests/api/thermal.test.ts)
    expect(rateRequestSchema.safeParse({ ...rateBody, process: { ...rateBody.process, massFlow_kg_s: 0 } }).success).toBe(true);
  });

  it('keeps lists short: 1,000 distinct diameters and 3,000 repeated materials are refused', () => {
    const ods = Array.from({ length: 1000 }, (_, i) => 0.01 + i * 1e-5);
    const r1 = sizeRequestSchema.safeParse({ ...duty, constraints: { ...duty.constraints, tubeOuterDiameters_m: ods } });
    expect(issues(r1)['constraints.tubeOuterDiameters_m']).toBe(`Give at most ${LIMITS.listMax} tube outside diameters.`);
    const r2 = sizeRequestSchema.safeParse({ ...duty, constraints: { ...duty.constraints, materials: Array(3000).fill('copper') } });
    expect(issues(r2)['constraints.materials']).toBe(`Give at most ${LIMITS.listMax} materials.`);
  });

  it('drops repeats from a short list, keeping the first of each', () => {
    const parsed = sizeRequestSchema.parse({
      ...duty,
      constraints: { ...duty.constraints, materials: ['copper', 'copper', 'stainless-304', 'copper'], tubePasses: [2, 1, 2], layouts: [30, 30], tubeOuterDiameters_m: [0.01905, 0.01905] },
    });
    expect(parsed.constraints.materials).toEqual(['copper', 'stainless-304']);
    expect(parsed.constraints.tubePasses).toEqual([2, 1]);
    expect(parsed.constraints.layouts).toEqual([30]);
    expect(parsed.constraints.tubeOuterDiameters_m).toEqual([0.01905]);
  });
});

describe('tube-layout cache (issue 9)', () => {
  it('never holds more than its stated maximum, and a hit is the same layout', () => {
    const key = (i: number) => ({ shellInnerDiameter_m: 0.1 + (i % 50) * 0.001, tubeOuterDiameter_m: 0.01 + Math.floor(i / 50) * 1e-5, tubePitch_m: 0.0125 + Math.floor(i / 50) * 1.25e-5, layout: 30 as const, tubePasses: 1 });
    const first = tubeLayout(key(0));
    expect(tubeLayout(key(0))).toBe(first);
    for (let i = 1; i < LAYOUT_CACHE_MAX + 200; i++) {
      tubeLayout(key(i));
      expect(layoutCacheSize()).toBeLessThanOrEqual(LAYOUT_CACHE_MAX);
    }
    expect(layoutCacheSize()).toBe(LAYOUT_CACHE_MAX);
    // evicted, laid out again: the same holes (deterministic)
    expect(tubeLayout(key(0)).tubeCount).toBe(first.tubeCount);
  }, 60_000); // 4,200 layouts, each now placing its tie rods in free room
});
