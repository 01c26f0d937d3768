/** Corrections multiplied onto a fully developed or constant-property Nusselt number. */

/**
 * Gnielinski's mean-Nu entrance factor for short tubes in turbulent flow:
 *
 * `K = 1 + (D/L)^(2/3)`; `dInner`, `length` in m. Valid for `L/D > 1` (tubes with a sharp-edged
 * entry, hydrodynamically and thermally developing).
 *
 * Reference: V. Gnielinski, "New equations for heat and mass transfer in turbulent pipe and
 * channel flow", International Chemical Engineering 16(2), pp. 359–368, 1976.
 */
export function entranceFactorGnielinski(dInner: number, length: number): number {
  return 1 + Math.pow(dInner / length, 2 / 3);
}

/**
 * Sieder & Tate's viscosity-ratio correction for liquids: `K = (μ/μ_w)^0.14`, `muRatio = μ_bulk/μ_wall`.
 * Valid for `0.0044 < μ/μ_w < 9.75`.
 *
 * Reference: E. N. Sieder and G. E. Tate, Industrial & Engineering Chemistry 28(12),
 * pp. 1429–1435, 1936. DOI 10.1021/ie50324a027.
 */
export function viscosityCorrectionSiederTate(muRatio: number): number {
  return Math.pow(muRatio, 0.14);
}

/**
 * Gnielinski's property-ratio correction for liquids in turbulent flow: `K = (Pr/Pr_w)^0.11`.
 * Valid for `0.05 ≤ Pr/Pr_w ≤ 20`.
 *
 * Reference: V. Gnielinski, "G1 Heat Transfer in Pipe Flow", *VDI Heat Atlas*, 2nd ed.,
 * Springer, 2010, eq. (29) (memory). DOI 10.1007/978-3-540-77877-6_34.
 */
export function propertyRatioCorrectionLiquidGnielinski(pr: number, prWall: number): number {
  // 0.11: Gnielinski, VDI Heat Atlas G1 (memory)
  return Math.pow(pr / prWall, 0.11);
}

/**
 * Gnielinski's temperature-ratio correction for gases in turbulent flow: `K = (T/T_w)^n` with
 * absolute temperatures in K, `n = 0.45` when the gas is heated and `n = 0` when it is cooled.
 * Valid for `0.5 ≤ T/T_w ≤ 1.5`.
 *
 * Reference: V. Gnielinski, "G1 Heat Transfer in Pipe Flow", *VDI Heat Atlas*, 2nd ed.,
 * Springer, 2010, eq. (30) (memory). DOI 10.1007/978-3-540-77877-6_34.
 */
export function temperatureRatioCorrectionGasGnielinski(tBulk_K: number, tWall_K: number): number {
  // 0.45 heating / 0 cooling: Gnielinski, VDI Heat Atlas G1 (memory)
  return tWall_K > tBulk_K ? Math.pow(tBulk_K / tWall_K, 0.45) : 1;
}
