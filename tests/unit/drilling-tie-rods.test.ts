import { describe, expect, it } from 'vitest';
import type { Design } from '../../shared/schemas/thermal';
import { PIPE_SHELLS } from '../../shared/thermal/geometry/shells';
import { drillingCsv, drillingPattern, HOLE_OVERSIZE_MM } from '../../server/features/orders/drilling';
import { drawDrillingPattern } from '../../server/lib/pdf/drilling-drawing';
import { paperPt } from '../../server/lib/pdf/drawing-scale';

const IN = 0.0254;
const nps6 = PIPE_SHELLS.find((s) => s.label === 'NPS 6 STD')!.innerDiameter_m;
/** a hand-set NPS 6 design: 1 in tubes, 4 passes, 30° layout (only the fields the drilling reads) */
const design = (tubeCount: number) =>
  ({ tubeCount, tubePasses: 4, tubeOuterDiameter_m: IN, tubePitch_m: 1.25 * IN, layout: 30, shellInnerDiameter_m: nps6, shellsInSeries: 1 }) as unknown as Design;

describe('drilling data with the tie rods as their own holes', () => {
  it('an NPS 6 shell of 1 in tubes and 4 passes drills 4 tube holes and TEMA’s 4 rods of 3/8 in (9.525 mm, 9.52 to 0.01 mm) (before: 0 tubes, the 4 holes were rods)', () => {
    const p = drillingPattern(design(4));
    expect(p.tubeHoles).toBe(4);
    const rods = p.holes.filter((h) => h.kind === 'tie-rod');
    expect(rods).toHaveLength(4);
    expect(p.tieRods).toEqual({ count: 4, diameter_mm: 9.52 });
    for (const r of rods) expect(r.diameter_mm).toBe(9.52);
    for (const h of p.holes.filter((x) => x.kind === 'tube')) expect(h.diameter_mm).toBeCloseTo(25.4 + HOLE_OVERSIZE_MM, 9);
    const rows = drillingCsv(p).trim().split('\n').slice(1).map((l) => l.split(','));
    expect(rows.filter((r) => r[3] === 'tie-rod').map((r) => [r[4], r[5]])).toEqual(Array(4).fill(['', '9.52']));
    expect(rows.filter((r) => r[3] === 'tube').every((r) => r[5] === '25.60')).toBe(true);
  });

  it('the drawing draws a tie-rod hole at the rod’s diameter and a tube hole at the tube hole’s', () => {
    const p = drillingPattern(design(4));
    const circles: { r: number; fill?: string }[] = [];
    // a recording stand-in for the PDF document: every call chains; circles are kept
    const doc: Record<string, unknown> = new Proxy({}, {
      get: (_t, name) => (...args: unknown[]) => {
        if (name === 'circle') circles.push({ r: args[2] as number });
        return doc;
      },
    });
    const reduction = drawDrillingPattern(doc as unknown as PDFKit.PDFDocument, { holes: p.holes, holeDiameter_mm: p.holeDiameter_mm, outerTubeLimit_mm: p.outerTubeLimit_mm, tubesheetDiameter_mm: 200 }, { x: 0, y: 0, width: 400, height: 400 });
    const radii = circles.map((c) => c.r);
    expect(radii.filter((r) => Math.abs(r - paperPt(9.52 / 2, reduction)) < 1e-9)).toHaveLength(4);
    expect(radii.filter((r) => Math.abs(r - paperPt(p.holeDiameter_mm / 2, reduction)) < 1e-9)).toHaveLength(4);
  });
});

describe('room for the impingement plate under the shell inlet', () => {
  const nps12 = PIPE_SHELLS.find((s) => s.label === 'NPS 12 STD')!.innerDiameter_m;
  const plated = (tubeCount: number) =>
    ({
      tubeCount, tubePasses: 2, tubeOuterDiameter_m: 0.75 * IN, tubePitch_m: 1.25 * 0.75 * IN, layout: 30, shellInnerDiameter_m: nps12, shellsInSeries: 1,
      nozzles: [{ side: 'shell', role: 'inlet', label: 'NPS 3', innerDiameter_m: 0.07792, velocity_m_s: 2.5, rhoV2: 5400, impingementPlate: true }],
    }) as unknown as Design;
  it('a design with a plate and tubes to spare leaves the room under the inlet (D_n/4 + 6 mm) free of tube holes', () => {
    const p = drillingPattern(plated(80));
    expect(p.clearUnderInlet_mm).toBeCloseTo(77.92 / 4 + 6, 1);
    const top = nps12 * 500 - p.clearUnderInlet_mm;
    for (const h of p.holes.filter((x) => x.kind === 'tube')) expect(h.y_mm + 19.05 / 2).toBeLessThanOrEqual(top + 0.01);
    expect(p.tubeHoles).toBe(80);
  });
  it('when the shell needs every hole for the design’s tubes, the full layout is drilled and says no room was kept', () => {
    const p = drillingPattern(plated(110));
    expect(p.clearUnderInlet_mm).toBe(0);
    expect(p.tubeHoles).toBe(110);
  });
});
