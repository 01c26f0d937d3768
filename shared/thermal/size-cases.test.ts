import { describe, expect, it } from 'vitest';
import { nusseltMethods } from './correlations/methods';
import { outletBandCoolant, overallRelativeUncertainty, TUBE_METHOD_ACCURACY } from './exchanger/uncertainty';
import { rate } from './rate';
import { size } from './size';

// a water-cooled lube-oil duty: oil in, cooling water at its summer design temperature
const oil = { fluid: 'oil-vg46' as const, pressure_Pa: 500000, massFlow_kg_s: 2, inletTemp_C: 65, outletTemp_C: 45 };
const water = { kind: 'coolant' as const, fluid: 'water' as const, pressure_Pa: 300000, massFlow_kg_s: 4, inletTemp_C: 32 };
const constraints = { maxTubeLength_m: 6, maxPressureDrop_Pa: 100000, maxShellPressureDrop_Pa: 100000 };

describe('design margin (issue 11)', () => {
  it('a 10 % margin lengthens the design by about that percentage; the round-up comes on top', () => {
    const req = { process: oil, boundary: water, constraints: { ...constraints, processSide: 'tubes' as const, tubeOuterDiameters_m: [0.01905], tubePasses: [2], materials: ['carbon-steel' as const], maxShellsInSeries: 1 } };
    const plain = size(req);
    const margined = size(req, { designMargin_pct: 10 });
    expect(margined.recommended.designMargin_pct).toBe(10);
    expect(plain.recommended.designMargin_pct).toBeUndefined();
    // the same bundle? compare the length the margin asks of it with its required length
    for (const d of margined.candidates.slice(0, 5)) {
      expect(d.tubeLength_m).toBeGreaterThanOrEqual(d.requiredLength_m * 1.1 - 1e-9);
      expect(d.tubeLength_m).toBeLessThan(d.requiredLength_m * 1.1 + 0.1 * 2 + 1e-9);
      expect(d.overSurface_pct).toBeGreaterThanOrEqual(10 - 1e-6);
    }
    // area: about 10 % more (the search may pick another bundle, so a band)
    const ratio = margined.recommended.area_m2 / plain.recommended.area_m2;
    expect(ratio).toBeGreaterThan(1.03);
    expect(ratio).toBeLessThan(1.25);
    // the request may ask for more than the fabricator's margin, never less
    expect(size({ ...req, constraints: { ...req.constraints, designMargin_pct: 0 } }, { designMargin_pct: 10 }).recommended.designMargin_pct).toBe(10);
  });
});

describe('outlet uncertainty (issue 11)', () => {
  it('every tube-side method in the table states an accuracy; the transition band is the widest', () => {
    for (const label of Object.keys(nusseltMethods)) expect(TUBE_METHOD_ACCURACY[label]).toBeGreaterThan(0);
    expect(TUBE_METHOD_ACCURACY['gnielinski-transition']).toBeGreaterThan(Math.max(TUBE_METHOD_ACCURACY.gnielinski!, TUBE_METHOD_ACCURACY['dittus-boelter']!));
  });

  it('the band is wider for a Dittus–Boelter rating than for Gnielinski on the same bundle', () => {
    const geometry = { tubeOuterDiameter_m: 0.01905, tubeWall_m: 0.00165, tubeCount: 60, tubeLength_m: 3, tubePasses: 2 };
    const process = { fluid: 'water' as const, pressure_Pa: 300000, massFlow_kg_s: 3, inletTemp_C: 80 };
    const boundary = { ...water, inletTemp_C: 25, massFlow_kg_s: 5, shellInnerDiameter_m: 0.3048 };
    const g = rate({ process, boundary, geometry, correlation: 'gnielinski' });
    const db = rate({ process, boundary, geometry, correlation: 'dittus-boelter' });
    expect(g.regime).toBe('turbulent');
    expect(g.outletUncertainty_K).toBeGreaterThan(0);
    expect(db.outletUncertainty_K!).toBeGreaterThan(g.outletUncertainty_K! * 1.1);
    // the band follows from U at its ends: re-rating by hand with δU/U gives the same figure
    const rel = overallRelativeUncertainty(g, 0.01905, 0.01905 - 2 * 0.00165);
    expect(rel).toBeGreaterThan(0.05);
    expect(rel).toBeLessThan(0.25);
  });

  it('a laminar oil rating in the tubes carries a wider band than a turbulent water one', () => {
    const geometry = { tubeOuterDiameter_m: 0.01905, tubeWall_m: 0.00165, tubeCount: 60, tubeLength_m: 4, tubePasses: 2 };
    const lam = rate({ process: { ...oil, outletTemp_C: undefined } as never, boundary: { ...water, shellInnerDiameter_m: 0.3048 }, geometry });
    expect(lam.regime).toBe('laminar');
    expect(lam.outletUncertainty_K).toBeGreaterThan(0);
  });

  it('the band is zero when U is exact and grows with the U uncertainty', () => {
    expect(outletBandCoolant(80, 50, 1.2, 0.5, 2, 1, 0)).toBeCloseTo(0, 12);
    const a = outletBandCoolant(80, 50, 1.2, 0.5, 2, 1, 0.1);
    const b = outletBandCoolant(80, 50, 1.2, 0.5, 2, 1, 0.2);
    expect(a).toBeGreaterThan(0);
    expect(b).toBeGreaterThan(1.8 * a);
  });
});

describe('operating cases (issue 11)', () => {
  const req = { process: oil, boundary: water, constraints, cases: [{ name: 'Winter', boundary: { inletTemp_C: 15 } }] };

  it('summer coolant at 32 °C governs over winter at 15 °C; both cases are rated and met', () => {
    const r = size(req);
    expect(r.governingCase).toBe('Design point');
    expect(r.cases?.map((c) => c.name)).toEqual(['Design point', 'Winter']);
    const [summer, winter] = r.cases!;
    expect(summer!.meets).toBe(true);
    expect(winter!.meets).toBe(true);
    expect(winter!.outletTemp_C).toBeLessThan(summer!.outletTemp_C - 2);
    expect(winter!.coolantInletTemp_C).toBe(15);
    expect(summer!.pressureDrop_Pa).toBeGreaterThan(0);
    expect(summer!.shellPressureDrop_Pa).toBeGreaterThan(0);
    expect(r.recommended.cases).toEqual(r.cases);
    // each case rated on the recommended design agrees with a plain rating of it
    expect(summer!.outletTemp_C).toBeCloseTo(r.recommended.rating.outletTemp_C, 1);
  });

  it('the case needing the largest area governs even when it is not the design point', () => {
    const r = size({ process: oil, boundary: { ...water, inletTemp_C: 15 }, constraints, cases: [{ name: 'Summer', boundary: { inletTemp_C: 32 } }] });
    expect(r.governingCase).toBe('Summer');
    expect(r.cases!.every((c) => c.meets)).toBe(true);
    const winterOnly = size({ process: oil, boundary: { ...water, inletTemp_C: 15 }, constraints });
    expect(r.recommended.area_m2).toBeGreaterThan(winterOnly.recommended.area_m2);
  });
});
