import { describe, expect, it } from 'vitest';
import fixture from '../../tests/reference/fixtures/fluids-lib.json';
import { frictionColebrook, frictionDarcy, frictionLaminar } from './friction';

describe(`Colebrook against ${fixture.library} ${fixture.version} (python3-fluids, Debian)`, () => {
  it('matches fluids.friction.Colebrook over the Re × ε/D grid to 1e-9 relative', () => {
    for (const row of fixture.colebrook) {
      const fd = frictionColebrook(row.re, row.relRoughness);
      expect(Math.abs(fd - row.fd) / row.fd).toBeLessThan(1e-9);
    }
  });
});

describe('friction over all regimes', () => {
  it('laminar is 64/Re (Hagen–Poiseuille)', () => {
    expect(frictionLaminar(1000)).toBe(0.064);
    expect(frictionDarcy(1000, 1e-4)).toBe(0.064);
  });
  it('is continuous at 2300 and 4000 (stated transition handling)', () => {
    for (const re of [2300, 4000]) {
      const a = frictionDarcy(re * (1 - 1e-9), 1e-4);
      const b = frictionDarcy(re * (1 + 1e-9), 1e-4);
      expect(Math.abs(a - b) / a).toBeLessThan(1e-6);
    }
  });
});
