/** Worked examples from heat-transfer textbooks, checked through the engine's own functions. */
import { describe, expect, it } from 'vitest';
import { nusseltLaminarEntryHausen } from '../correlations/laminar';
import { nusseltTurbulentDittusBoelter } from '../correlations/turbulent';
import { effectivenessCounterflow, ntuCounterflow } from './effectiveness';
import { overallCoefficientOutside } from './overall';
import { ntuRequiredWall, ntuWall, outletTempWall } from './wall';

describe('Incropera, DeWitt, Bergman & Lavine, Fundamentals of Heat and Mass Transfer, 6th ed., Example 11.1 (memory)', () => {
  // counterflow concentric tube: oil 0.1 kg/s 100 → 60 °C (cp 2131), water 0.2 kg/s from 30 °C (cp 4178),
  // inner tube D = 25 mm; h_i = 2250, h_o = 38.4 W/m²K → U ≈ 37.8; answer L ≈ 66.5 m (memory)
  it('water-side Nu ≈ 90 by Dittus–Boelter (heating, n = 0.4)', () => {
    expect(nusseltTurbulentDittusBoelter(14050, 4.85, true)).toBeCloseTo(90, 0);
  });
  it('the ε-NTU inversion gives the book’s length', () => {
    const cHot = 0.1 * 2131;
    const cCold = 0.2 * 4178;
    const eps = (100 - 60) / (100 - 30); // hot stream is C_min
    const ntu = ntuCounterflow(eps, cHot / cCold);
    const u = overallCoefficientOutside(2250, 38.4, 0.025, 0.025 * (1 + 1e-9), 1e9, 0, 0);
    const length = (ntu * cHot) / (u * Math.PI * 0.025);
    expect(u).toBeCloseTo(37.8, 1);
    expect(Math.abs(length - 66.5) / 66.5).toBeLessThan(0.01);
    expect(effectivenessCounterflow(ntu, cHot / cCold)).toBeCloseTo(eps, 10);
  });
});

describe('Çengel, Heat Transfer: A Practical Approach, 2nd ed., Example 8-1, water heated by condensing steam (memory)', () => {
  // D = 2.5 cm, 0.3 kg/s from 15 to 115 °C, wall 120 °C, h = 800 W/m²K, cp 4187 → L ≈ 61 m (memory)
  it('the required length from the exponential decay', () => {
    const ntu = ntuRequiredWall(15, 115, 120);
    const length = (ntu * 0.3 * 4187) / (Math.PI * 0.025 * 800);
    expect(Math.abs(length - 61) / 61).toBeLessThan(0.01);
  });
});

describe('Çengel, Heat Transfer: A Practical Approach, 2nd ed., Example 8-6, oil pipeline through an icy lake (memory)', () => {
  // D = 0.3 m, L = 200 m, oil at 20 °C, 2 m/s, wall 0 °C; ρ 888.1, cp 1880, k 0.145, Re 636, Pr 10 863;
  // Nu = 37.3 → h = 18.0 W/m²K, outlet 19.71 °C (memory)
  it('Hausen within 3 % of the book’s Nu and the outlet within 0.01 K', () => {
    const nu = nusseltLaminarEntryHausen(636, 10863, 0.3, 200);
    expect(Math.abs(nu - 37.3) / 37.3).toBeLessThan(0.03);
    const mass = 888.1 * ((Math.PI * 0.3 ** 2) / 4) * 2;
    const out = outletTempWall(20, 0, ntuWall(0.3, 200, 18.0, mass, 1880));
    expect(out).toBeCloseTo(19.71, 2);
  });
});

describe('Incropera et al., 6th ed., Example 8.3, steam condensing on a tube, water 15 → 57 °C (memory)', () => {
  // D = 50 mm, L = 6 m, 0.25 kg/s, cp 4178, wall 100 °C → mean h ≈ 756 W/m²K (memory)
  it('the mean coefficient that reproduces the outlet', () => {
    const ntu = ntuRequiredWall(15, 57, 100);
    const h = (ntu * 0.25 * 4178) / (Math.PI * 0.05 * 6);
    expect(Math.abs(h - 756) / 756).toBeLessThan(0.005);
  });
});
