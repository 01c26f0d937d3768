import { describe, expect, it } from 'vitest';
import { IMPINGEMENT_RHOV2, NOZZLE_SIZES, nozzleVelocity, rhoV2, sizeNozzles } from './nozzles';

const water = (m: number) => ({ massFlow_kg_s: m, inletDensity: 997, outletDensity: 995, liquid: true });
const oil = (m: number) => ({ massFlow_kg_s: m, inletDensity: 850, outletDensity: 860, liquid: true });

describe('nozzles', () => {
  it('ρv² of a shell inlet by hand: 10 kg/s of water through NPS 3 (77.92 mm bore)', () => {
    // A = π/4 · 0.07792² = 4.7686e-3 m²; G = 10 / A = 2097.0 kg/(m²s); ρv² = G²/ρ = 2097.0² / 997 = 4410.7
    expect(rhoV2(10, 997, 0.07792)).toBeCloseTo(4410.7, 0);
    expect(nozzleVelocity(10, 997, 0.07792)).toBeCloseTo(2.1034, 3);
    const c = sizeNozzles(oil(2), water(10), 0.3);
    const inlet = c.nozzles.find((n) => n.side === 'shell' && n.role === 'inlet')!;
    // 3 m/s: 10/(997·3) = 3.343e-3 m³/s needs a 65.3 mm bore → NPS 3
    expect(inlet.label).toBe('NPS 3');
    expect(inlet.rhoV2).toBeCloseTo(4410.7, 0);
  });

  it('a high-flow shell side gets an impingement plate; a slow one does not', () => {
    const fast = sizeNozzles(oil(2), water(10), 0.3);
    expect(fast.nozzles.find((n) => n.side === 'shell' && n.role === 'inlet')!.impingementPlate).toBe(true);
    expect(fast.findings.map((f) => f.code)).toContain('impingement-plate');
    expect(fast.nozzles.filter((n) => n.impingementPlate)).toHaveLength(1);
    // 0.3 kg/s of water in NPS 1 1/2 (40.94 mm): G = 227.9, ρv² = 52 — far below the rule
    const slow = sizeNozzles(oil(0.3), water(0.3), 0.2);
    const s = slow.nozzles.find((n) => n.side === 'shell' && n.role === 'inlet')!;
    expect(s.rhoV2).toBeLessThan(IMPINGEMENT_RHOV2);
    expect(s.impingementPlate).toBe(false);
    expect(slow.ok).toBe(true);
  });

  it('losses: 1 velocity head in and 0.5 out, each at its own density', () => {
    const c = sizeNozzles(oil(2), water(10), 0.3);
    const [i, o] = ['inlet', 'outlet'].map((r) => c.nozzles.find((n) => n.side === 'shell' && n.role === r)!);
    expect(c.shellLoss_Pa).toBeCloseTo(0.5 * i!.rhoV2 + 0.25 * o!.rhoV2, 6);
    expect(c.tubeLoss_Pa).toBeGreaterThan(0);
  });

  it('a nozzle wider than half the shell is a hard finding', () => {
    // 60 kg/s of water needs 0.02 m³/s / 3 m/s → 92 mm → NPS 4 (102 mm), over half of a 154 mm shell
    const c = sizeNozzles(oil(1), water(60), 0.154);
    expect(c.ok).toBe(false);
    expect(c.findings.map((f) => f.code)).toContain('nozzle-too-large');
  });

  it('a gas nozzle is held to 30 m/s and ρv² 5,950', () => {
    const air = { massFlow_kg_s: 1, inletDensity: 8, outletDensity: 10, liquid: false };
    const c = sizeNozzles(air, water(5), 0.5);
    const t = c.nozzles.find((n) => n.side === 'tube' && n.role === 'inlet')!;
    expect(t.velocity_m_s).toBeLessThanOrEqual(30);
    expect(t.rhoV2).toBeLessThanOrEqual(5950);
    // the next size down would break a limit
    const k = NOZZLE_SIZES.findIndex((n) => Math.abs(n.innerDiameter_m - t.innerDiameter_m) < 1e-9);
    const d = NOZZLE_SIZES[k - 1]!.innerDiameter_m;
    expect(nozzleVelocity(1, 8, d) > 30 || rhoV2(1, 8, d) > 5950).toBe(true);
  });
});
