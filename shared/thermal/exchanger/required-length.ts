/**
 * Required tube length of one sizing candidate, solved from the duty: the outlet target fixes both
 * streams' mean temperatures (so their properties), the NTU needed follows in closed form
 * (wall: ln ratio; coolant: the inverted ε-NTU relation), and only the entrance effects make
 * U depend on L, which a short fixed-point iteration settles.
 */
import type { CorrelationChoice } from '../correlations/select';
import type { FluidProperties } from '../fluids';
import { overallCoefficientOutside } from './overall';
import { shellSideKern, type ShellGeometry } from './shell-side';
import type { Stream } from './streams';
import { tubeSideH, type Bundle } from './tube-side';
import type { Fouling } from './rate-coolant';

export interface DutyContext {
  s: Stream;
  tIn: number;
  tOut: number;
  tMean: number;
  bulk: FluidProperties;
  /** specific heat including latent heat of condensing water, J/(kg·K) */
  cpEff: number;
  choice: CorrelationChoice;
  /** cached property lookups near a temperature (wall estimates) */
  hotAt: (t: number) => FluidProperties | null;
  wall?: { temp: number; props: FluidProperties | null; ntu: number };
  coolant?: {
    c: Stream;
    tCin: number;
    tCout: number;
    tCm: number;
    cold: FluidProperties;
    coldAt: (t: number) => FluidProperties | null;
    fouling: Fouling;
    ch: number;
    cc: number;
    cmin: number;
    cr: number;
  };
}

/** Length of one tube, m, giving NTU `ntu` on the wall boundary. */
export function requiredLengthWall(ctx: DutyContext, b: Bundle): number {
  const w = ctx.wall!;
  const mTube = (ctx.s.massFlow_kg_s * b.passes) / b.count;
  const lengthFor = (h: number) => (w.ntu * mTube * ctx.cpEff) / (Math.PI * b.dInner * b.passes * h);
  const bl = { ...b };
  let length = b.length;
  for (let k = 0; k < 30; k++) {
    bl.length = length;
    const next = lengthFor(tubeSideH(bl, ctx.s.massFlow_kg_s, ctx.bulk, w.props ?? ctx.bulk, ctx.tMean, w.temp, ctx.s.fluid.phase, ctx.choice));
    if (Math.abs(next - length) < 1e-8 * next) return next;
    length = next;
  }
  return length;
}

/** Length of one tube, m, giving NTU `ntu` with the coolant on the shell side. */
export function requiredLengthCoolant(ctx: DutyContext, b: Bundle, shell: ShellGeometry, ntu: number, shellH0?: number): number {
  const k = ctx.coolant!;
  const tHm = ctx.tMean;
  let tWi = 0.5 * (tHm + k.tCm);
  let tWo = tWi;
  // shell-side h at μ/μw = 1; Kern's h scales with (μ/μw)^0.14, so only that factor changes below
  const h0 = shellH0 ?? shellSideKern(shell, b.dOuter, k.c.massFlow_kg_s, k.cold, k.cold.viscosity).h;
  let length = b.length;
  const bl = { ...b };
  for (let it = 0; it < 30; it++) {
    bl.length = length;
    const hIn = tubeSideH(bl, ctx.s.massFlow_kg_s, ctx.bulk, ctx.hotAt(tWi) ?? ctx.bulk, tHm, tWi, ctx.s.fluid.phase, ctx.choice);
    const hOut = h0 * Math.pow(k.cold.viscosity / (k.coldAt(tWo) ?? k.cold).viscosity, 0.14);
    const u = overallCoefficientOutside(hIn, hOut, b.dInner, b.dOuter, b.kWall, k.fouling.inside, k.fouling.outside);
    const next = (ntu * k.cmin) / (u * b.count * Math.PI * b.dOuter);
    const dt = tHm - k.tCm;
    tWi = tHm - (b.dOuter / (b.dInner * hIn)) * u * dt;
    tWo = k.tCm + (u / hOut) * dt;
    if (Math.abs(next - length) < 1e-8 * next && it > 1) return next;
    length = next;
  }
  return length;
}

/** Property lookups rounded to 0.1 K and cached: wall estimates need μ_w, not a fresh call each time. */
export function roundedCache(s: Stream): (t: number) => FluidProperties | null {
  const cache = new Map<number, FluidProperties | null>();
  return (t) => {
    const key = Math.round(t * 10);
    let p = cache.get(key);
    if (p === undefined) {
      try {
        p = s.properties(key / 10);
      } catch {
        p = null;
      }
      cache.set(key, p);
    }
    return p;
  };
}
