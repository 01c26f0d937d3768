import { describe, expect, it } from 'vitest';
import fixture from '../../tests/reference/fixtures/fluids-lib.json';
import { frictionChurchill, frictionColebrook, frictionDarcy, frictionLaminar } from './friction';

describe(`Colebrook against ${fixture.library} ${fixture.version} (python3-fluids, Debian)`, () => {
  it('matches fluids.friction.Colebrook over the Re × ε/D grid to 1e-9 relative', () => {
    for (const row of fixture.colebrook) {
      const fd = frictionColebrook(row.re, row.relRoughness);
      expect(Math.abs(fd - row.fd) / row.fd).toBeLessThan(1e-9);
    }
  });
});

describe('friction over all regimes (Churchill 1977 with a Colebrook turbulent term)', () => {
  const roughnesses = [0, 1e-6, 1e-4, 1e-3, 1e-2, 0.05];
  it('laminar is 64/Re (Hagen–Poiseuille) within 1 % up to Re 2000', () => {
    expect(frictionLaminar(1000)).toBe(0.064);
    for (const re of [1, 10, 100, 500, 1000, 1500, 2000]) {
      for (const rr of roughnesses) expect(Math.abs(frictionDarcy(re, rr) * (re / 64) - 1)).toBeLessThan(0.01);
    }
  });
  it('is Colebrook (python3-fluids fixture) within 1 % at Re 10⁴–10⁶, in fact within 0.1 %', () => {
    const rows = fixture.colebrook.filter((r) => r.re >= 1e4 && r.re <= 1e6);
    expect(rows.length).toBeGreaterThan(20);
    for (const row of rows) {
      expect(Math.abs(frictionDarcy(row.re, row.relRoughness) / row.fd - 1)).toBeLessThan(1e-3);
    }
  });
  it('Churchill as published is within 1 % of Colebrook at Re 10⁴–10⁶ for ε/D ≤ 10⁻³ (2.5 % above)', () => {
    for (const row of fixture.colebrook.filter((r) => r.re >= 1e4 && r.re <= 1e6)) {
      const tol = row.relRoughness <= 1e-3 ? 0.01 : 0.025;
      expect(Math.abs(frictionChurchill(row.re, row.relRoughness) / row.fd - 1)).toBeLessThan(tol);
    }
  });
  it('is continuous and smooth across 2300 and 4000 (no switch, no kink)', () => {
    for (const rr of roughnesses) {
      for (const re of [2300, 4000]) {
        const h = re * 1e-6;
        const a = frictionDarcy(re - h, rr);
        const m = frictionDarcy(re, rr);
        const b = frictionDarcy(re + h, rr);
        expect(Math.abs(b - a) / m).toBeLessThan(1e-4); // continuous
        // smooth: the one-sided slopes agree (the old straight line had a kink at both ends)
        const left = (m - a) / h;
        const right = (b - m) / h;
        expect(Math.abs(right - left)).toBeLessThan(1e-3 * Math.max(Math.abs(left), Math.abs(right), 1e-9) + 1e-9);
      }
    }
  });
  it('rises through the transition from the laminar to the turbulent value (Churchill\'s hump near Re 3000)', () => {
    // old linear interpolation at Re 3000, ε/D 1e-4: about 0.0326; Churchill's transition term puts it near 0.042
    const f3000 = frictionDarcy(3000, 1e-4);
    expect(f3000).toBeGreaterThan(frictionDarcy(2300, 1e-4));
    expect(f3000).toBeGreaterThan(0.04);
    expect(Math.abs(frictionDarcy(4000, 1e-4) / frictionColebrook(4000, 1e-4) - 1)).toBeLessThan(0.001);
  });
});
