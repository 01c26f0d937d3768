import { describe, expect, it } from 'vitest';
import { sizeRequestSchema, type SizeRequest, type SizeRequestInput } from '../../schemas/thermal';
import { evaluateDesign } from '../evaluate';
import { allowableStress, TUBE_STRESS } from '../geometry/allowable-stress';
import { BWG_WALL_M } from '../geometry/tubes';
import { sizeParsed } from '../size';
import { ThermalInputError } from '../errors';
import { checkWalls, designConditions, shellWallCheck, tubeCollapsePressure, ug27Thickness, wallSides } from './walls';

const ATM = 101_325;
const bar = (g: number) => ATM + g * 1e5;
// Invented duties (no external source): water cooled by water, oil cooled by water.
const water = (tubeBarG: number, shellBarG: number, design = true) =>
  sizeRequestSchema.parse({
    process: { fluid: 'water', pressure_Pa: bar(tubeBarG), massFlow_kg_s: 1.5, inletTemp_C: 85, outletTemp_C: 40, ...(design ? { design: { pressure_Pa: bar(tubeBarG), temp_C: 150 } } : {}) },
    boundary: { kind: 'coolant', fluid: 'water', pressure_Pa: bar(shellBarG), massFlow_kg_s: 3, inletTemp_C: 20, ...(design ? { design: { pressure_Pa: bar(shellBarG), temp_C: 150 } } : {}) },
    constraints: { maxTubeLength_m: 4, maxPressureDrop_Pa: 70000, maxShellPressureDrop_Pa: 70000, processSide: 'tubes' },
  } satisfies SizeRequestInput);

const BWG16 = BWG_WALL_M[16]!; // 0.065 in = 1.651 mm (TEMA Table D-7, memory)

describe('ASME VIII-1 UG-27(c)(1) thin-cylinder wall (memory)', () => {
  it('a 19.05 mm × BWG 16 carbon-steel tube at 10 bar(g) and 150 °C: worked by hand', () => {
    // S = 92 MPa: SA-179 at 150 °C, ASME II-D Table 1A, 13.4 ksi (memory); E = 1.0 (seamless).
    // Inside radius R = 19.05/2 − 1.651 = 7.874 mm.
    // t = P R / (S E − 0.6 P) = 1.0 MPa × 7.874 mm / (92 − 0.6 × 1.0) MPa = 7.874 / 91.4 = 0.0861 mm.
    expect(ug27Thickness(1e6, 0.009525 - BWG16, 92e6, 1)).toBeCloseTo(0.0861e-3, 6);
    // With the corrosion allowance c = 1.5 mm (carbon steel in water, common practice) R is taken
    // corroded: R = 7.874 + 1.5 = 9.374 mm, t = 9.374 / 91.4 = 0.1026 mm; t + c = 1.603 mm ≤ 1.651 mm.
    // Least wall in closed form: t = P R_o / (S E + 0.4 P) + c = 9.525 / 92.4 + 1.5 = 1.6031 mm;
    // the minimum gauge for carbon steel, BWG 16 = 1.651 mm (common practice), governs.
    const duty = water(10, 3);
    const sides = wallSides(duty, 'tubes');
    expect(sides.tube.design.gauge_Pa).toBeCloseTo(10e5, 0);
    const w = checkWalls({ tubeOuterDiameter_m: 0.01905, tubeWall_m: BWG16, tubeWallLabel: 'BWG 16', tubeMaterial: 'carbon-steel' }, sides);
    expect(w.tube.allowableStress_Pa).toBe(92e6);
    expect(w.tube.corrosion_m).toBe(0.0015);
    expect(w.tube.pressure_m + w.tube.corrosion_m).toBeCloseTo(1.6031e-3, 6);
    expect(w.tubeWallRequired_m).toBeCloseTo(BWG16, 9);
    expect(w.ok).toBe(true);
    expect(w.findings).toEqual([]);
  });

  it('the minimum gauge per material (common practice): carbon steel BWG 16, copper alloys BWG 18, stainless BWG 20', () => {
    const sides = wallSides(water(1, 1), 'tubes');
    const ok = (material: string, gauge: number) =>
      checkWalls({ tubeOuterDiameter_m: 0.01905, tubeWall_m: BWG_WALL_M[gauge]!, tubeWallLabel: `BWG ${gauge}`, tubeMaterial: material }, sides).ok;
    // at 1 bar(g) the pressure needs only hundredths of a millimetre: the gauge rule decides
    expect(ok('carbon-steel', 16)).toBe(true);
    expect(ok('carbon-steel', 18)).toBe(false);
    expect(ok('copper', 18)).toBe(true);
    expect(ok('copper', 20)).toBe(false);
    expect(ok('stainless-304', 20)).toBe(true);
    expect(ok('stainless-304', 22)).toBe(false);
    // metric tubes: 1.2 mm carbon steel is below the trade's 1.5 mm; 1.5 mm leaves nothing for the
    // pressure once the 1.5 mm corrosion allowance in water is taken; 2 mm passes
    const metric = (wall: number) => checkWalls({ tubeOuterDiameter_m: 0.02, tubeWall_m: wall, tubeWallLabel: `${wall * 1000} mm`, tubeMaterial: 'carbon-steel' }, sides);
    expect(metric(0.002).ok).toBe(true);
    expect(metric(0.0015).ok).toBe(false);
    expect(metric(0.0012).tube.minimum_m).toBe(0.0015);
  });

  it('allowable stress by temperature: straight-line between the table points; copper has none past 200 °C', () => {
    // SA-213 TP304: 115 MPa at 100 °C, 103 MPa at 150 °C (ASME II-D, memory) → 109 MPa at 125 °C
    expect(allowableStress(TUBE_STRESS['stainless-304']!, 125)! / 1e6).toBeCloseTo(109, 6);
    expect(allowableStress(TUBE_STRESS.copper!, 250)).toBeUndefined();
    const hot = sizeRequestSchema.parse({ ...water(5, 3), process: { ...water(5, 3).process, design: { pressure_Pa: bar(5), temp_C: 260 } } });
    const w = checkWalls({ tubeOuterDiameter_m: 0.01905, tubeWall_m: BWG16, tubeWallLabel: 'BWG 16', tubeMaterial: 'copper' }, wallSides(hot, 'tubes'));
    expect(w.ok).toBe(false);
    expect(w.findings[0]!.code).toBe('tube-wall-thin');
    expect(w.findings[0]!.message).toMatch(/no allowable stress/);
  });

  it('a design point below the operating point is refused at its field', () => {
    const base = water(5, 3);
    const low = sizeRequestSchema.safeParse({ ...base, process: { ...base.process, design: { pressure_Pa: bar(4), temp_C: 60 } } });
    expect(low.success).toBe(false);
    const paths = low.error!.issues.map((i) => i.path.join('.'));
    expect(paths).toEqual(['process.design.pressure_Pa', 'process.design.temp_C']);
    const cold = sizeRequestSchema.safeParse({ ...base, boundary: { ...base.boundary, design: { pressure_Pa: bar(3), temp_C: 10 } } });
    expect(cold.error!.issues.map((i) => i.path.join('.'))).toEqual(['boundary.design.temp_C']);
  });

  it('the shell: a pipe STD wall less 12.5 % must cover the shell side, a rolled shell gets a thicker plate', () => {
    // NPS 24 STD: ID 590.9 mm, wall 9.53 mm; at 30 bar(g), water (c = 1.5 mm), S = 118 MPa (SA-106 B), E = 1:
    // R = 295.47 + 1.5 = 296.97 mm, t = 3.0 × 296.97 / (118 − 1.8) = 7.667 mm, + 1.5 = 9.167 mm > 0.875 × 9.53 = 8.339 mm
    const high = wallSides(water(3, 30), 'tubes');
    const pipe = shellWallCheck({ innerDiameter_m: 0.5909, wall_m: 0.00953, kind: 'pipe' }, high.shell);
    expect(pipe.required_m).toBeCloseTo(9.167e-3, 5);
    expect(pipe.ok).toBe(false);
    // rolled 1000 mm ID at 20 bar(g): S = 138 MPa (SA-516 70), E = 0.85 (spot-radiographed seam):
    // R = 500 + 1.5 = 501.5 mm, t = 2.0 × 501.5 / (117.3 − 1.2) = 8.639 mm, + 1.5 = 10.14 mm → 12 mm plate
    const rolled = shellWallCheck({ innerDiameter_m: 1.0, wall_m: 0.01, kind: 'rolled' }, wallSides(water(3, 20), 'tubes').shell);
    expect(rolled.required_m).toBeCloseTo(10.14e-3, 4);
    expect(rolled.wall_m).toBe(0.012);
    expect(rolled.ok).toBe(true);
    // sturdy tubes under the higher shell-side pressure are not flagged: 19.05 × 1.651 mm carbon
    // steel collapses elastically at 2 × 202 GPa / 0.91 × (1.651/19.05)³ ≈ 289 MPa (Bryan's formula,
    // Timoshenko & Gere 1961, memory), far above a quarter of it
    const w = checkWalls({ tubeOuterDiameter_m: 0.01905, tubeWall_m: BWG16, tubeWallLabel: 'BWG 16', tubeMaterial: 'carbon-steel', shellInnerDiameter_m: 0.5909 }, high);
    expect(w.findings.map((f) => f.code).sort()).toEqual(['shell-wall-thin']);
    expect(tubeCollapsePressure(0.01905, BWG16, 'carbon-steel')).toBeCloseTo(((2 * 202e9) / 0.91) * (BWG16 / 0.01905) ** 3, -3);
    // thin-walled tubes are: 25.4 × 0.3 mm stainless collapses at about 2 × 195 GPa / 0.91 × (0.3/25.4)³ ≈ 0.71 MPa
    const thin = checkWalls({ tubeOuterDiameter_m: 0.0254, tubeWall_m: 0.0003, tubeWallLabel: '0.3 mm', tubeMaterial: 'stainless-304', shellInnerDiameter_m: 0.5909 }, high);
    expect(thin.findings.map((f) => f.code)).toContain('tube-external-pressure');
  });

  it('defaults without `design` (stored duties): operating gauge + 10 %, at least + 1 bar; process inlet + 25 K', () => {
    const d = water(4, 0.5, false);
    const dc = designConditions(d);
    expect(dc.process.gauge_Pa).toBeCloseTo(5e5, 0); // 4 bar(g): 4.4 vs 5.0 bar(g), the larger
    expect(dc.boundary.gauge_Pa).toBeCloseTo(1.5e5, 0);
    expect(dc.process.temp_C).toBe(110);
    expect(dc.process.stated).toBe(false);
    const high = designConditions(water(20, 3, false));
    expect(high.process.gauge_Pa).toBeCloseTo(22e5, 0); // 20 bar(g) + 10 % = 22 bar(g)
  });
});

describe('walls in the sizing search and in a hand-set design', () => {
  it('a 40 bar(g) tube side makes the search choose thicker walls than at 5 bar(g); every offered design passes its wall check', () => {
    const cs = (r: SizeRequest) => ({ ...r, constraints: { ...r.constraints, materials: ['carbon-steel'] } });
    const low = sizeParsed(cs(water(5, 3)));
    const high = sizeParsed(cs(water(40, 3)));
    const thinnest = (r: ReturnType<typeof sizeParsed>) => Math.min(...r.candidates.map((d) => d.tubeWall_m));
    expect(thinnest(low)).toBeLessThan(0.0017); // BWG 16 (1.65 mm) or 1.5 mm metric is on offer at 5 bar(g)
    expect(thinnest(high)).toBeGreaterThan(0.0019); // at 40 bar(g) only BWG 14 and thicker, or 2 mm metric
    expect(high.recommended.tubeWall_m).toBeGreaterThan(low.recommended.tubeWall_m);
    for (const d of [...low.candidates, ...high.candidates]) {
      expect(d.tubeWallRequired_m).toBeDefined();
      expect(d.tubeWall_m).toBeGreaterThanOrEqual(d.tubeWallRequired_m! - 1e-9);
      expect(d.rating.warnings.map((w) => w.code)).not.toContain('tube-wall-thin');
    }
    // at 40 bar(g) (design 40 bar(g), 150 °C) a carbon-steel 3/4 in tube needs 4.0 × 9.525 / (92 + 1.6) + 1.5 = 1.907 mm: BWG 14
    const cs34 = high.candidates.filter((d) => d.tubeMaterial === 'carbon-steel' && Math.abs(d.tubeOuterDiameter_m - 0.01905) < 1e-6);
    for (const d of cs34) expect(d.tubeWallLabel).toMatch(/BWG 1[0-4]$/);
  });

  it('a high shell-side pressure: pipe shells too thin are not offered; the search explains a "wall" exclusion', () => {
    const r = sizeParsed(water(3, 30));
    for (const d of r.candidates) {
      expect(d.shellWall_m! * (d.shellLabel?.startsWith('NPS') ? 0.875 : 1)).toBeGreaterThanOrEqual(d.shellWallRequired_m! - 1e-9);
      expect(d.rating.warnings.map((w) => w.code)).not.toContain('shell-wall-thin');
    }
    // only small pipe shells allowed and a pressure none of them holds: no design, the wall binds
    const req = water(3, 280);
    try {
      sizeParsed({ ...req, constraints: { ...req.constraints, maxShellInnerDiameter_m: 0.6 } });
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(ThermalInputError);
      expect((e as Error).message).toMatch(/wall/);
    }
  });

  it('a hand-set wall thinner than the pressure needs keeps the design and carries `tube-wall-thin` in words', () => {
    const duty = water(40, 3);
    const g = { tubeCount: 60, tubeLength_m: 3, tubeOuterDiameter_m: 0.01905, tubeWall_m: BWG_WALL_M[18]!, tubeMaterial: 'carbon-steel', tubePasses: 1, layout: 30 as const, shellInnerDiameter_m: 0.3048 };
    const e = evaluateDesign(duty, g);
    const f = e.rating.warnings.find((w) => w.code === 'tube-wall-thin');
    expect(f?.message).toMatch(/1\.24 mm is too thin: it needs 1\.91 mm/);
    expect(e.tubeWallRequired_m).toBeCloseTo(1.907e-3, 5);
    // the same geometry at BWG 14 passes
    const ok = evaluateDesign(duty, { ...g, tubeWall_m: BWG_WALL_M[14]! });
    expect(ok.rating.warnings.map((w) => w.code)).not.toContain('tube-wall-thin');
  });

  it('an old stored duty without `design` still sizes, with the default design point', () => {
    const r = sizeParsed(water(2, 2, false));
    expect(r.recommended.tubeWallRequired_m).toBeGreaterThan(0);
    expect(r.recommended.tubeWall_m).toBeGreaterThanOrEqual(r.recommended.tubeWallRequired_m!);
  });
});
