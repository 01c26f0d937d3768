import { describe, expect, it } from 'vitest';
import { shellToBaffleClearanceTema } from '../exchanger/tema-clearances';
import { tubeLayout, type Layout } from './layout';
import { PIPE_SHELLS, STANDARD_SHELLS, bundleClearance, tieRodCount } from './shells';
import { TIE_ROD_LIGAMENT_M, temaTieRods } from './tie-rods';
import { tubeCountPhadke } from './tube-count-phadke';

const IN = 0.0254;
const nps = (n: number) => PIPE_SHELLS.find((s) => s.label === `NPS ${n} STD`)!.innerDiameter_m;
const key = (dShell: number, od: number, layout: Layout, passes: number, clearUnderInlet_m?: number) =>
  ({ shellInnerDiameter_m: dShell, tubeOuterDiameter_m: od, tubePitch_m: 1.25 * od, layout, tubePasses: passes, clearUnderInlet_m });

describe('TEMA tie rods (RCB-4.71, class R column, memory)', () => {
  it('count and diameter by nominal shell size (ID rounded to the inch)', () => {
    expect(temaTieRods(nps(6))).toEqual({ count: 4, diameter_m: 0.375 * IN });
    expect(temaTieRods(nps(16))).toEqual({ count: 4, diameter_m: 0.375 * IN }); // ID 15.25 in: a 15 in shell
    expect(temaTieRods(nps(18))).toEqual({ count: 6, diameter_m: 0.375 * IN });
    expect(temaTieRods(0.75)).toEqual({ count: 6, diameter_m: 0.5 * IN }); // 29.5 in
    expect(temaTieRods(1.0)).toEqual({ count: 8, diameter_m: 0.5 * IN }); // 39.4 in
    expect(temaTieRods(1.5)).toEqual({ count: 10, diameter_m: 0.5 * IN }); // 59 in
    expect(temaTieRods(2.0)).toEqual({ count: 12, diameter_m: 0.625 * IN });
    expect(tieRodCount(1.0)).toBe(8);
  });
});

describe('tie rods placed where they cost the fewest tubes', () => {
  it('an NPS 6 shell with 1 in tubes and 4 passes holds tubes (it held none when the rods took tube holes)', () => {
    const t = tubeLayout(key(nps(6), IN, 30, 4));
    expect(t.tubeCount).toBeGreaterThanOrEqual(4);
    expect(t.tubeCount).toBe(tubeCountPhadke(nps(6) - bundleClearance(nps(6)), IN, 1.25 * IN, 4, 30));
    expect(t.tieRods).toEqual({ count: 4, diameter_m: 0.375 * IN });
    expect(t.tubesDisplacedByTieRods).toBe(0);
  });

  it('every rod is inside the baffle, clear of every tube hole and the other rods, one in each sector around the bundle', () => {
    for (const dShell of [nps(6), nps(8), nps(12), nps(20), 0.8, 1.2]) {
      for (const od of [0.625 * IN, 0.75 * IN, IN]) {
        for (const layout of [30, 90] as const) {
          for (const passes of [1, 2, 4]) {
            const t = tubeLayout(key(dShell, od, layout, passes));
            const rod = temaTieRods(dShell);
            const rods = [...t.tieRod.keys()].filter((i) => t.tieRod[i]);
            expect(rods.length).toBe(rod.count);
            expect(t.tubesDisplacedByTieRods).toBe(0);
            const rim = (dShell - shellToBaffleClearanceTema(dShell)) / 2;
            const sectors = new Set<number>();
            for (const i of rods) {
              const r = Math.hypot(t.x[i]!, t.y[i]!);
              expect(r + rod.diameter_m / 2 + TIE_ROD_LIGAMENT_M).toBeLessThanOrEqual(rim + 1e-9);
              const a = (Math.atan2(t.y[i]!, t.x[i]!) + 2 * Math.PI) % (2 * Math.PI);
              sectors.add(Math.floor((a / (2 * Math.PI)) * rod.count) % rod.count);
              for (let j = 0; j < t.x.length; j++) {
                if (j === i) continue;
                const gap = Math.hypot(t.x[i]! - t.x[j]!, t.y[i]! - t.y[j]!);
                const other = t.tieRod[j] ? rod.diameter_m : od;
                expect(gap).toBeGreaterThanOrEqual((rod.diameter_m + other) / 2 + TIE_ROD_LIGAMENT_M - 1e-9);
              }
            }
            expect(sectors.size).toBe(rod.count);
          }
        }
      }
    }
  }, 120_000);

  it('a rod takes a tube hole only when its sector has no free room (a 5 in bundle packed to the rim)', () => {
    const t = tubeLayout(key(nps(5), 0.75 * IN, 30, 1));
    expect(t.tubesDisplacedByTieRods).toBeGreaterThan(0);
    expect(t.tieRods.count).toBe(4);
  });
});

/**
 * Phadke's method (tube-count-phadke.ts) counts a lattice with a tube on the shell axis and lanes one
 * lattice row wide; our layout keeps the best of four lattice offsets and lanes 16 mm clear. So, over
 * every shell of the ladder from NPS 6 up, 5/8, 3/4, 1 in and 16, 20, 25 mm tubes at 1.25 pitch,
 * 1, 2 and 4 passes (tolerance stated here):
 * - 30°, 60°, 90°: never fewer tubes than Phadke (the tie rods take none of his tubes); where he
 *   counts 100 tubes or more, at most 11 % more (60° with 2 passes at most 18 %: his lane there takes
 *   a whole lattice row and one tube more, ours only the holes within the 16 mm lane);
 * - 45°: within −17 %…+11 % where he counts 100 or more (his lane there is 0.77 d_o clear, one row;
 *   a 16 mm lane takes three rotated-square rows, so we have fewer with lanes).
 * Below 100 tubes the offset lattice may hold many more than a centred one (NPS 8, 25 mm, 30°,
 * 4 passes: 12 against 4); only "never fewer" is asserted there.
 */
describe("tube counts against Phadke's method (Chem. Eng. 1984)", () => {
  const ods = [0.625 * IN, 0.75 * IN, IN, 0.016, 0.02, 0.025];
  for (const layout of [30, 60, 90, 45] as const) {
    it(`${layout}° layouts, 1–4 passes, NPS 6 to 1.5 m`, () => {
      for (const sh of STANDARD_SHELLS.filter((s) => s.innerDiameter_m >= nps(6) - 1e-9)) {
        for (const od of ods) {
          for (const passes of [1, 2, 4] as const) {
            const ours = tubeLayout(key(sh.innerDiameter_m, od, layout, passes)).tubeCount;
            const ph = tubeCountPhadke(sh.innerDiameter_m - bundleClearance(sh.innerDiameter_m), od, 1.25 * od, passes, layout);
            const what = `${sh.label}, ${(od * 1000).toFixed(2)} mm, ${passes} passes: ${ours} against ${ph}`;
            if (layout === 45) {
              if (ph >= 100) {
                expect(ours / ph, what).toBeGreaterThanOrEqual(0.83);
                expect(ours / ph, what).toBeLessThanOrEqual(1.11);
              }
              continue;
            }
            expect(ours, what).toBeGreaterThanOrEqual(ph);
            if (ph >= 100) expect(ours / ph, what).toBeLessThanOrEqual(layout === 60 && passes === 2 ? 1.18 : 1.11);
          }
        }
      }
    }, 120_000);
  }
  it("Phadke's counts for small bundles by hand: 1 pass is the lattice points in the circle", () => {
    // r = (D_otl − d_o)/(2p) = 2 pitches exactly: triangular norms ≤ 4 → 1 + 6 + 6 + 6 = 19; square ≤ 4 → 13
    const p = 0.025;
    expect(tubeCountPhadke(4 * p + 0.02, 0.02, p, 1, 30)).toBe(19);
    expect(tubeCountPhadke(4 * p + 0.02, 0.02, p, 1, 90)).toBe(13);
    // 2 passes, 30°: less the axis row 2⌊r⌋ + 1 = 5 → 14; 4 passes: less C_y = 3⌊2r/√3⌋ + 1 = 7 (⌊2.31⌋ = 2 → 6) → 8
    expect(tubeCountPhadke(4 * p + 0.02, 0.02, p, 2, 30)).toBe(14);
    expect(tubeCountPhadke(4 * p + 0.02, 0.02, p, 4, 30)).toBe(8);
  });
});

describe('room under the shell inlet for an impingement plate', () => {
  it('clearUnderInlet_m leaves out the tubes that come nearer the shell wall at the top; the rest are the same layout', () => {
    const dShell = nps(12);
    const od = 0.75 * IN;
    const plain = tubeLayout(key(dShell, od, 30, 2));
    const cleared = tubeLayout(key(dShell, od, 30, 2, 0.05));
    expect(cleared.tubeCount).toBeLessThan(plain.tubeCount);
    for (let i = 0; i < cleared.x.length; i++) if (!cleared.tieRod[i]) expect(cleared.y[i]! + od / 2).toBeLessThanOrEqual(dShell / 2 - 0.05 + 1e-12);
    expect(tubeLayout(key(dShell, od, 30, 2, 0)).tubeCount).toBe(plain.tubeCount);
  });
});
