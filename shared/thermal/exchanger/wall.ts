/**
 * Constant wall temperature (a bath, a condensing or boiling shell side): the bulk temperature
 * decays exponentially along the tube,
 * `(T_s − T_out)/(T_s − T_in) = exp(−P L h̄ / (ṁ cp))`, `P = π D_i`.
 *
 * Reference: F. P. Incropera, D. P. DeWitt, T. L. Bergman and A. S. Lavine, *Fundamentals of Heat
 * and Mass Transfer*, 6th ed., Wiley, 2007, eq. (8.42b) (memory).
 */

/** `NTU = π D_i L h̄ / (ṁ cp)` for one tube carrying `massFlow` over the path `length`. */
export function ntuWall(dInner: number, length: number, htc: number, massFlow: number, cp: number): number {
  return (Math.PI * dInner * length * htc) / (massFlow * cp);
}

/** Outlet bulk temperature for a wall at `wallTemp` (°C or K, same as `inletTemp`). */
export function outletTempWall(inletTemp: number, wallTemp: number, ntu: number): number {
  return wallTemp + (inletTemp - wallTemp) * Math.exp(-ntu);
}

/** NTU needed to reach `outletTemp`: `ln((T_in − T_s)/(T_out − T_s))`; `Infinity` at or past the wall. */
export function ntuRequiredWall(inletTemp: number, outletTemp: number, wallTemp: number): number {
  const ratio = (inletTemp - wallTemp) / (outletTemp - wallTemp);
  return ratio > 1 ? Math.log(ratio) : ratio === 1 ? 0 : Infinity;
}
