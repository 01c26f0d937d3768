import { describe, expect, it } from 'vitest';
import {
  effectivenessCounterflow,
  effectivenessShell12,
  lmtdCorrectionBowman,
  lmtdCorrectionFactor,
  ntuCounterflow,
  ntuShell12,
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
