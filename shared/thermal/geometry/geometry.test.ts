import { describe, expect, it } from 'vitest';
import fixture from '../../../tests/reference/fixtures/fluids-lib.json';
import { BWG_WALL_M, LAYOUTS, PASS_LANE_CLEARANCE_M, PIPE_SHELLS, bundleClearance, tubeLayout, type Layout } from './index';

describe(`geometry against ${fixture.library} ${fixture.version} (python3-fluids, Debian)`, () => {
  it('BWG walls match fluids.piping.t_from_gauge(…, BWG)', () => {
    for (const row of fixture.bwg) expect(BWG_WALL_M[row.gauge]).toBeCloseTo(row.wall_m, 6);
  });
  it('NPS STD shells match fluids.piping.nearest_pipe(NPS, STD) within 0.3 mm', () => {
    for (const sh of PIPE_SHELLS) {
      const nps = Number(sh.label.split(' ')[1]);
      const ref = fixture.pipesStd.find((p) => p.nps === nps)!;
      expect(Math.abs(sh.innerDiameter_m - ref.innerDiameter_m)).toBeLessThan(3e-4);
      expect(Math.abs(sh.wall_m - ref.wall_m)).toBeLessThan(1e-5);
    }
  });
});

describe('tube hole layout', () => {
  const od = 0.01905;
  const pitch = 1.25 * od;
  it('every tube hole lies inside the outer tube limit, at least a pitch apart, clear of the pass lanes', () => {
    for (const layout of LAYOUTS as readonly Layout[]) {
      for (const passes of [1, 2, 4]) {
        const k = { shellInnerDiameter_m: 0.3048, tubeOuterDiameter_m: od, tubePitch_m: pitch, layout, tubePasses: passes };
        const t = tubeLayout(k);
        const rMax = (0.3048 - bundleClearance(0.3048)) / 2 - od / 2;
        for (let i = 0; i < t.x.length; i++) {
          if (t.tieRod[i]) continue; // tie rods sit in free room at the rim or in a lane (tie-rods.test.ts)
          expect(Math.hypot(t.x[i]!, t.y[i]!)).toBeLessThanOrEqual(rMax + 1e-12);
          if (passes === 4) expect(Math.abs(t.x[i]!)).toBeGreaterThanOrEqual((PASS_LANE_CLEARANCE_M + od) / 2);
          for (let j = i + 1; j < t.x.length; j++) if (!t.tieRod[j]) expect(Math.hypot(t.x[i]! - t.x[j]!, t.y[i]! - t.y[j]!)).toBeGreaterThan(pitch * (1 - 1e-9));
        }
        expect(t.tubeCount).toBe(t.x.length - t.tieRod.reduce((a, b) => a + b, 0));
      }
    }
  }, 60_000);
  it('a larger shell holds more tubes; more passes fewer; the layout is deterministic', () => {
    const key = (d: number, passes: number) => ({ shellInnerDiameter_m: d, tubeOuterDiameter_m: od, tubePitch_m: pitch, layout: 30 as const, tubePasses: passes });
    const small = tubeLayout(key(0.3, 1)).tubeCount;
    expect(tubeLayout(key(0.4, 1)).tubeCount).toBeGreaterThan(small);
    expect(tubeLayout(key(0.3, 2)).tubeCount).toBeLessThan(small);
    // a triangular pitch packs about 2/√3 more holes than a square one at the same pitch (geometry)
    const sq = tubeLayout({ ...key(0.6, 1), layout: 90 }).tubeCount;
    const tri = tubeLayout(key(0.6, 1)).tubeCount;
    expect(tri / sq).toBeGreaterThan(1.08);
    expect(tri / sq).toBeLessThan(1.2);
    expect(Array.from(tubeLayout(key(0.31, 2)).x)).toEqual(Array.from(tubeLayout(key(0.31, 2)).x));
  });
});
