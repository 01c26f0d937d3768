/** Small numerical helpers shared by the rating loops. */
import type { FluidProperties } from '../fluids';

/**
 * Solves `x = G(x)` for a contractive `G` (the outlet temperature recomputed from properties at the
 * mean temperature) by the secant method on `G(x) − x`, falling back to plain substitution where the
 * secant step leaves `[lo, hi]`. Returns the last `x` evaluated; `G` keeps whatever state it made.
 */
export function solveFixedPoint(g: (x: number) => number, x0: number, lo: number, hi: number, tol: number): number {
  let xPrev = x0;
  let rPrev = g(x0) - x0;
  if (Math.abs(rPrev) < tol) return x0;
  let x = x0 + rPrev;
  for (let k = 0; k < 40; k++) {
    const r = g(x) - x;
    if (Math.abs(r) < tol) return x;
    const denom = r - rPrev;
    let next = denom !== 0 ? x - (r * (x - xPrev)) / denom : x + r;
    if (!(next > lo && next < hi)) next = x + 0.5 * r;
    xPrev = x;
    rPrev = r;
    x = next;
  }
  return x;
}

/** Remembers the last two property evaluations (the loops ask for the same states repeatedly). */
export function memoProperties(f: (temp_C: number) => FluidProperties): (temp_C: number) => FluidProperties {
  let t1 = NaN;
  let p1: FluidProperties | undefined;
  let t2 = NaN;
  let p2: FluidProperties | undefined;
  return (t) => {
    if (t === t1) return p1!;
    if (t === t2) return p2!;
    const p = f(t);
    t2 = t1;
    p2 = p1;
    t1 = t;
    p1 = p;
    return p;
  };
}
