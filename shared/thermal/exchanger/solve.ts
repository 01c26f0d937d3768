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

/** 8: states a coolant rating revisits (inlet, wall and bulk temperatures of the last few passes). */
const MEMO_SIZE = 8;

/**
 * Remembers the last `MEMO_SIZE` property evaluations by exact temperature. A stream wraps its
 * property function in one, so the inlet checks, the wall temperatures held between iterations
 * and the final consistent pass reuse what the fixed point already computed; the values are the
 * same objects, so results do not change. Failures are not remembered (they throw every time).
 */
export function memoProperties(f: (temp_C: number) => FluidProperties): (temp_C: number) => FluidProperties {
  // plain arrays: a typed array's buffer costs more to make than a rating saves with it
  const temps = new Array<number>(MEMO_SIZE).fill(NaN);
  const values = new Array<FluidProperties | undefined>(MEMO_SIZE).fill(undefined);
  let next = 0;
  return (t) => {
    for (let k = 0; k < MEMO_SIZE; k++) if (temps[k] === t) return values[k]!;
    const p = f(t);
    temps[next] = t;
    values[next] = p;
    next = (next + 1) % MEMO_SIZE;
    return p;
  };
}
