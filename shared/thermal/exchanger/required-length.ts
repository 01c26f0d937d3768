/**
 * Required tube length of one sizing candidate, solved from the duty: the outlet target fixes both
 * streams' mean temperatures (so their properties), the NTU needed follows in closed form
 * (wall: ln ratio; coolant: the inverted ε-NTU relation), and only the entrance effects make
 * U depend on L, which a short fixed-point iteration settles.
 */
import type { CorrelationChoice } from '../correlations/select';
import type { FluidProperties } from '../fluids';
import { overallCoefficientOutside } from './overall';
import type { Stream } from './streams';
import { tubeSideH, type Bundle } from './tube-side';
import type { ProcessSide } from '../../schemas/thermal';
import type { Fouling } from './coolant-step';

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

/**
 * The two sides of one allocation: which stream is in the tubes and which on the shell side, their
 * bulk properties at the duty's mean temperatures, cached wall-state lookups and the fouling.
 */
export interface SideView {
  side: ProcessSide;
  tube: Stream;
  tubeBulk: FluidProperties;
  tubeAt: (t: number) => FluidProperties | null;
  tTube: number;
  shell: Stream;
  shellBulk: FluidProperties;
  shellAt: (t: number) => FluidProperties | null;
  tShell: number;
  fouling: Fouling;
}

export function sideView(ctx: DutyContext, side: ProcessSide, fouling: Fouling): SideView {
  const k = ctx.coolant!;
  const p = { s: ctx.s, bulk: ctx.bulk, at: ctx.hotAt, t: ctx.tMean };
  const c = { s: k.c, bulk: k.cold, at: k.coldAt, t: k.tCm };
  const [t, sh] = side === 'tubes' ? [p, c] : [c, p];
  return { side, tube: t.s, tubeBulk: t.bulk, tubeAt: t.at, tTube: t.t, shell: sh.s, shellBulk: sh.bulk, shellAt: sh.at, tShell: sh.t, fouling };
}

export interface RequiredLength {
  /** one shell's tube length, m */
  length: number;
  u: number;
  hIn: number;
  hOut: number;
}

/**
 * Length of one shell's tubes, m, giving the total NTU `ntu` over `shells` shells in series, with
 * the tube and shell streams of `v`. `hShell0` is the shell-side coefficient at μ/μw = 1: both
 * shell-side methods scale with (μ/μw)^0.14, so only that factor changes as the wall estimate moves.
 */
export function requiredLengthCoolant(ctx: DutyContext, v: SideView, b: Bundle, ntu: number, shells: number, hShell0: number): RequiredLength {
  const k = ctx.coolant!;
  const inTubes = v.side === 'tubes';
  const dt = ctx.tMean - k.tCm;
  let tWi = 0.5 * (v.tTube + v.tShell);
  let tWo = tWi;
  const l0 = b.length;
  let length = l0;
  const out: RequiredLength = { length, u: 0, hIn: 0, hOut: 0 };
  // b.length carries the iterate (entrance effects) and is restored before returning
  for (let it = 0; it < 30; it++) {
    b.length = length;
    const hIn = tubeSideH(b, v.tube.massFlow_kg_s, v.tubeBulk, v.tubeAt(tWi) ?? v.tubeBulk, v.tTube, tWi, v.tube.fluid.phase, ctx.choice);
    const hOut = hShell0 * Math.pow(v.shellBulk.viscosity / (v.shellAt(tWo) ?? v.shellBulk).viscosity, 0.14);
    const u = overallCoefficientOutside(hIn, hOut, b.dInner, b.dOuter, b.kWall, v.fouling.inside, v.fouling.outside);
    const next = (ntu * k.cmin) / (u * shells * b.count * Math.PI * b.dOuter);
    const fIn = (b.dOuter / (b.dInner * hIn)) * u * dt;
    const fOut = (u / hOut) * dt;
    tWi = inTubes ? v.tTube - fIn : v.tTube + fIn;
    tWo = inTubes ? v.tShell + fOut : v.tShell - fOut;
    out.u = u;
    out.hIn = hIn;
    out.hOut = hOut;
    out.length = next;
    if (Math.abs(next - length) < 1e-8 * next && it > 1) break;
    length = next;
  }
  b.length = l0;
  return out;
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
