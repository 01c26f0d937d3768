import { describe, expect, it } from 'vitest';
import {
  OIL_GRADES,
  cragoeConductivity,
  cragoeSpecificHeat,
  oilDensity,
  oilVg32,
  oilVg46,
  oilVg68,
  waltherConstants,
  waltherViscosity,
} from './oils';

const rel = (a: number, b: number) => Math.abs(a / b - 1);
const OILS = [oilVg32, oilVg46, oilVg68];

describe('ISO VG mineral oils', () => {
  it('the Walther line passes through both reference points of each grade', () => {
    for (const g of Object.values(OIL_GRADES)) {
      const { A, B } = waltherConstants(g.nu40, g.nu100);
      expect(rel(waltherViscosity(A, B, 313.15), g.nu40)).toBeLessThan(1e-12);
      expect(rel(waltherViscosity(A, B, 373.15), g.nu100)).toBeLessThan(1e-12);
    }
  });

  it('meets its grade: ν(40 °C) within ±10 % of the nominal VG (ISO 3448)', () => {
    for (const [oil, vg] of [
      [oilVg32, 32],
      [oilVg46, 46],
      [oilVg68, 68],
    ] as const) {
      const p = oil.properties(40, 1e5);
      expect(rel(p.viscosity / p.density / 1e-6, vg)).toBeLessThan(0.1);
    }
  });

  it('Cragoe cp and k agree with the engine-oil table of Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, Table A.5 (memory)', () => {
    // Engine oil (unused), ρ = 884.1 kg/m³ at 300 K → ρ15 ≈ 891 kg/m³ by the expansion law above.
    // 300 K: cp 1909 J/kgK, k 0.145 W/mK; 350 K: cp 2118, k 0.138. A heavier, additised oil than
    // a hydraulic grade, so k is allowed 12 %, cp 4 %.
    const rho15 = 891;
    expect(rel(oilDensity(rho15, 26.85), 884.1)).toBeLessThan(0.01);
    expect(rel(cragoeSpecificHeat(rho15, 26.85), 1909)).toBeLessThan(0.04);
    expect(rel(cragoeSpecificHeat(rho15, 76.85), 2118)).toBeLessThan(0.04);
    expect(rel(cragoeConductivity(rho15, 26.85), 0.145)).toBeLessThan(0.12);
    expect(rel(cragoeConductivity(rho15, 76.85), 0.138)).toBeLessThan(0.12);
  });

  it('trends: μ falls by orders of magnitude, ρ and k fall, cp rises with temperature; heavier grade is more viscous', () => {
    for (const oil of OILS) {
      const cold = oil.properties(0, 1e5);
      const hot = oil.properties(120, 1e5);
      expect(cold.viscosity / hot.viscosity).toBeGreaterThan(20);
      expect(hot.density).toBeLessThan(cold.density);
      expect(hot.conductivity).toBeLessThan(cold.conductivity);
      expect(hot.specificHeat).toBeGreaterThan(cold.specificHeat);
      expect(cold.prandtl).toBeGreaterThan(1000);
    }
    expect(oilVg68.properties(50, 1e5).viscosity).toBeGreaterThan(oilVg46.properties(50, 1e5).viscosity);
    expect(oilVg46.properties(50, 1e5).viscosity).toBeGreaterThan(oilVg32.properties(50, 1e5).viscosity);
  });

  it('rejects temperatures outside −10…150 °C', () => {
    expect(() => oilVg46.properties(200, 1e5)).toThrow(expect.objectContaining({ code: 'fluid-range' }));
    expect(oilVg46.stateProblem(-30, 1e5)).toMatch(/Mineral oil ISO VG 46: -30 °C .* -10 °C to 150 °C/);
  });
});
