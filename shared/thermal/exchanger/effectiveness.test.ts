import { describe, expect, it } from 'vitest';
import {
  effectivenessCounterflow,
  effectivenessShell12,
  lmtdCorrectionBowman,
  lmtdCorrectionFactor,
  ntuCounterflow,
  ntuShell12,
  effectivenessShellsInSeries,
  lmtdCorrectionFactorShells,
  ntuShellsInSeries,
} from './effectiveness';

// Kays & London, Compact Heat Exchangers, 3rd ed., 1984, Fig./Tables 2-13 (counterflow) and 2-14
// (1 shell pass, 2, 4, … tube passes): ε at NTU, Cr (memory, 3 figures; confirm against the printed table)
const counterflow: [number, number, number][] = [
  [1, 0, 0.632],
  [1, 0.5, 0.565],
  [1, 1, 0.5],
  [2, 0.75, 0.722],
  [3, 1, 0.75],
];
const shell12: [number, number, number][] = [
  [1, 1, 0.463],
  [2, 0.5, 0.693],
  [1, 0, 0.632],
];

describe('ε-NTU against Kays & London (memory)', () => {
  it('counterflow', () => {
    for (const [ntu, cr, eps] of counterflow) expect(effectivenessCounterflow(ntu, cr)).toBeCloseTo(eps, 3);
  });
  it('one shell pass, even tube passes (1–2)', () => {
    for (const [ntu, cr, eps] of shell12) expect(effectivenessShell12(ntu, cr)).toBeCloseTo(eps, 3);
  });
  it('inversions return the NTU (round trip)', () => {
    for (const ntu of [0.1, 0.5, 1, 2, 4]) {
      for (const cr of [0, 0.3, 0.8, 1]) {
        expect(ntuCounterflow(effectivenessCounterflow(ntu, cr), cr)).toBeCloseTo(ntu, 8);
        expect(ntuShell12(effectivenessShell12(ntu, cr), cr)).toBeCloseTo(ntu, 6);
      }
    }
  });
});

describe('F factor (Bowman, Mueller & Nagle 1940)', () => {
  it('their closed form equals NTU_counterflow/NTU_1-2 for the same ε and Cr', () => {
    for (const ntu of [0.3, 1, 2]) {
      for (const cr of [0.2, 0.6, 1]) {
        const p = effectivenessShell12(ntu, cr);
        expect(lmtdCorrectionBowman(p, cr)).toBeCloseTo(lmtdCorrectionFactor(ntu, cr, 2), 6);
      }
    }
  });
  it('R = 1, P = 0.5 gives F ≈ 0.80 (Bowman, Mueller & Nagle chart, memory)', () => {
    expect(lmtdCorrectionBowman(0.5, 1)).toBeCloseTo(0.80, 2);
  });
  it('is 1 for counterflow', () => {
    expect(lmtdCorrectionFactor(2, 0.5, 1)).toBe(1);
  });
});

describe('N identical shells in series', () => {
  /** F(P, R) with P the tube-side temperature effectiveness and R = C_tube/C_shell (chart convention). */
  function fChart(p: number, r: number, shells: number): number {
    const [eff, cr] = r <= 1 ? [p, r] : [p * r, 1 / r];
    return ntuCounterflow(eff, cr) / ntuShellsInSeries(eff, cr, 2, shells);
  }
  /**
   * Bowman, Mueller & Nagle (1940) closed form for 2 shell passes, 4, 8, … tube passes (as printed in
   * Kern 1950, eq. 7.46, memory):
   * F = √(R²+1)/(2(R−1)) ln[(1−P)/(1−PR)] / ln{[2/P − 1 − R + (2/P)√((1−P)(1−PR)) + √(R²+1)] / [same − √(R²+1)]}.
   */
  function f24(p: number, r: number): number {
    const s = Math.sqrt(r * r + 1);
    const a = 2 / p - 1 - r + (2 / p) * Math.sqrt((1 - p) * (1 - p * r));
    return ((s / (2 * (r - 1))) * Math.log((1 - p) / (1 - p * r))) / Math.log((a + s) / (a - s));
  }
  it('N = 1 is the one-shell relation', () => {
    for (const ntu of [0.5, 1, 2]) {
      for (const cr of [0, 0.4, 1]) {
        expect(effectivenessShellsInSeries(ntu, cr, 2, 1)).toBe(effectivenessShell12(ntu, cr));
        expect(lmtdCorrectionFactorShells(ntu, cr, 2, 1)).toBeCloseTo(lmtdCorrectionFactor(ntu, cr, 2), 12);
      }
    }
  });
  it('two shells match the published 2-4 closed form', () => {
    for (const [p, r] of [[0.4, 2], [0.5, 1.5], [0.6, 0.5], [0.3, 3], [0.7, 0.8]] as const) {
      expect(fChart(p, r, 2), `P ${p} R ${r}`).toBeCloseTo(f24(p, r), 6);
    }
  });
  it('two shells: chart points (TEMA T-3.2 / Bowman et al. 2-shell chart, memory) within ±0.02', () => {
    // R = 1: P = 0.5 → F ≈ 0.96 and P = 0.6 → F ≈ 0.90 (one shell would be 0.80 and below 0.6)
    expect(fChart(0.5, 1, 2)).toBeGreaterThan(0.94);
    expect(fChart(0.5, 1, 2)).toBeLessThan(0.98);
    expect(Math.abs(fChart(0.6, 1, 2) - 0.9)).toBeLessThan(0.03);
  });
  it('inverse round trip, Infinity beyond reach, and many shells approach counterflow', () => {
    for (const n of [1, 2, 3, 4]) {
      for (const cr of [0, 0.5, 1]) {
        for (const ntu of [0.5, 2, 4]) {
          expect(ntuShellsInSeries(effectivenessShellsInSeries(ntu, cr, 2, n), cr, 2, n)).toBeCloseTo(ntu, 5);
        }
      }
    }
    expect(ntuShellsInSeries(1, 0.5, 2, 3)).toBe(Infinity);
    expect(ntuShellsInSeries(0.9, 1, 2, 1)).toBe(Infinity); // one 1-2 shell tops out at 0.586 for Cr = 1
    expect(Number.isFinite(ntuShellsInSeries(0.7, 1, 2, 3))).toBe(true);
    expect(effectivenessShellsInSeries(3, 0.8, 2, 40)).toBeCloseTo(effectivenessCounterflow(3, 0.8), 3);
    expect(lmtdCorrectionFactorShells(3, 0.8, 2, 40)).toBeGreaterThan(0.99);
    expect(lmtdCorrectionFactorShells(2, 0.8, 2, 2)).toBeGreaterThan(lmtdCorrectionFactor(2, 0.8, 2));
    expect(lmtdCorrectionFactorShells(2, 0.8, 1, 3)).toBe(1);
  });
});
