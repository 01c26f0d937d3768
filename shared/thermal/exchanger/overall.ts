/**
 * Overall heat-transfer coefficient referred to the tube outside area:
 * `1/U_o = 1/h_o + R_fo + D_o ln(D_o/D_i)/(2 k_w) + R_fi D_o/D_i + D_o/(D_i h_i)`.
 * All SI: h in W/(m²·K), R_f in m²·K/W, diameters in m, `kWall` in W/(m·K).
 *
 * Reference: TEMA, *Standards of the Tubular Exchanger Manufacturers Association*, 10th ed., 2019,
 * section T-1 (memory); the same form in Kern 1950, ch. 6.
 */
export function overallCoefficientOutside(
  hInside: number,
  hOutside: number,
  dInner: number,
  dOuter: number,
  kWall: number,
  foulingInside: number,
  foulingOutside: number,
): number {
  const r =
    1 / hOutside +
    foulingOutside +
    (dOuter * Math.log(dOuter / dInner)) / (2 * kWall) +
    (foulingInside * dOuter) / dInner +
    dOuter / (dInner * hInside);
  return 1 / r;
}
