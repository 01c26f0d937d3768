/**
 * Turbulent internal convection in smooth round tubes.
 */

/**
 * Petukhov's Darcy friction factor for smooth tubes, as used inside Gnielinski's correlation:
 *
 * `f = (0.790 ln Re − 1.64)^(−2)`, valid `3000 ≤ Re ≤ 5·10⁶`.
 *
 * Reference: B. S. Petukhov, "Heat transfer and friction in turbulent pipe flow with variable
 * physical properties", Advances in Heat Transfer 6, pp. 503–564, 1970.
 * DOI 10.1016/S0065-2717(08)70153-9.
 */
export function frictionSmoothPetukhov(re: number): number {
  // 0.790 and 1.64: Petukhov 1970
  const a = 0.79 * Math.log(re) - 1.64;
  return 1 / (a * a);
}

/**
 * Gnielinski's turbulent Nusselt number, fully developed:
 *
 * `Nu = (f/8)(Re − 1000) Pr / (1 + 12.7 (f/8)^0.5 (Pr^(2/3) − 1))` with Petukhov's `f`.
 *
 * Valid about `3000 ≤ Re ≤ 5·10⁶`, `0.5 ≤ Pr ≤ 2000` (about ±10 %). Not defined for `Re ≤ 1000`.
 *
 * Reference: V. Gnielinski, "New equations for heat and mass transfer in turbulent pipe and
 * channel flow", International Chemical Engineering 16(2), pp. 359–368, 1976.
 */
export function nusseltTurbulentGnielinski(re: number, pr: number): number {
  const f8 = frictionSmoothPetukhov(re) / 8;
  // 1000 and 12.7: Gnielinski 1976
  return (f8 * (re - 1000) * pr) / (1 + 12.7 * Math.sqrt(f8) * (Math.pow(pr, 2 / 3) - 1));
}

/**
 * Dittus–Boelter, in the form written by McAdams:
 *
 * `Nu = 0.023 Re^0.8 Pr^n`, `n = 0.4` when the fluid is heated, `0.3` when it is cooled.
 *
 * Valid for `Re ≳ 10⁴`, `0.6 ≤ Pr ≤ 160`, `L/D ≳ 10`, moderate wall-to-bulk temperature
 * differences (about ±25 %).
 *
 * References: F. W. Dittus and L. M. K. Boelter, "Heat transfer in automobile radiators of the
 * tubular type", University of California Publications in Engineering 2(13), pp. 443–461, 1930
 * (reprinted in Int. Commun. Heat Mass Transfer 12, pp. 3–22, 1985, DOI 10.1016/0735-1933(85)90003-X);
 * W. H. McAdams, *Heat Transmission*, 2nd ed., McGraw-Hill, 1942.
 */
export function nusseltTurbulentDittusBoelter(re: number, pr: number, heating: boolean): number {
  // 0.023, 0.8, 0.4/0.3: McAdams 1942 form of Dittus & Boelter 1930
  return 0.023 * Math.pow(re, 0.8) * Math.pow(pr, heating ? 0.4 : 0.3);
}

/**
 * Sieder & Tate's turbulent correlation for large property variation:
 *
 * `Nu = 0.027 Re^0.8 Pr^(1/3) (μ/μ_w)^0.14`, `muRatio = μ_bulk/μ_wall`.
 *
 * Valid for `Re ≳ 10⁴`, `0.7 ≤ Pr ≤ 16700`, `L/D ≳ 10`.
 *
 * Reference: E. N. Sieder and G. E. Tate, "Heat transfer and pressure drop of liquids in tubes",
 * Industrial & Engineering Chemistry 28(12), pp. 1429–1435, 1936. DOI 10.1021/ie50324a027.
 */
export function nusseltTurbulentSiederTate(re: number, pr: number, muRatio: number): number {
  // 0.027, 0.8, 1/3, 0.14: Sieder & Tate 1936
  return 0.027 * Math.pow(re, 0.8) * Math.cbrt(pr) * Math.pow(muRatio, 0.14);
}
