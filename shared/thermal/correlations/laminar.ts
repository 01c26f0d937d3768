/**
 * Laminar internal convection in round tubes.
 */

/** 3.66: Shah & London 1978, fully developed laminar flow, constant wall temperature. */
export const NU_LAMINAR_WALL = 3.66;
/** 4.36: Shah & London 1978, fully developed laminar flow, constant heat flux (48/11). */
export const NU_LAMINAR_FLUX = 4.36;

/**
 * Fully developed laminar flow in a round tube.
 *
 * `Nu = 3.66` (uniform wall temperature) or `Nu = 4.36` (uniform heat flux).
 * Valid for `Re < 2300` (common practice) and tubes much longer than the thermal entrance length
 * `≈ 0.05 Re Pr D`.
 *
 * Reference: R. K. Shah and A. L. London, *Laminar Flow Forced Convection in Ducts*, Advances in
 * Heat Transfer Supplement 1, Academic Press, New York, 1978. DOI 10.1016/C2013-0-06152-X.
 *
 * @param boundary `wall` for a uniform wall temperature, `flux` for a uniform heat flux
 */
export function nusseltLaminarFullyDevelopedShahLondon(boundary: 'wall' | 'flux'): number {
  return boundary === 'wall' ? NU_LAMINAR_WALL : NU_LAMINAR_FLUX;
}

/**
 * Hausen's mean Nusselt number for the laminar thermal entry (velocity profile already developed),
 * uniform wall temperature:
 *
 * `Nu_m = 3.66 + 0.0668 Gz / (1 + 0.04 Gz^(2/3))`, `Gz = (D/L) Re Pr`.
 *
 * Units: `dInner`, `length` in m; `re`, `pr` dimensionless. Valid for `Re < 2300`, any `Pr`
 * (hydrodynamically developed flow, so best for `Pr ≳ 5`); tends to 3.66 for long tubes.
 *
 * Reference: H. Hausen, "Darstellung des Wärmeüberganges in Rohren durch verallgemeinerte
 * Potenzbeziehungen", Zeitschrift des VDI, Beiheft Verfahrenstechnik, No. 4, pp. 91–98, 1943.
 */
export function nusseltLaminarEntryHausen(re: number, pr: number, dInner: number, length: number): number {
  const gz = (dInner / length) * re * pr;
  // 0.0668 and 0.04: Hausen 1943, constant wall temperature
  return NU_LAMINAR_WALL + (0.0668 * gz) / (1 + 0.04 * Math.pow(gz, 2 / 3));
}

/**
 * Sieder & Tate's mean Nusselt number for laminar combined (hydrodynamic and thermal) entry,
 * uniform wall temperature:
 *
 * `Nu_m = 1.86 (Re Pr D/L)^(1/3) (μ/μ_w)^0.14`.
 *
 * Units: `dInner`, `length` in m; `muRatio = μ_bulk/μ_wall`. Validity as usually quoted:
 * `0.48 < Pr < 16700`, `0.0044 < μ/μ_w < 9.75`, and `(Re Pr D/L)^(1/3) (μ/μ_w)^0.14 ≥ 2`
 * (below that the result falls under the fully developed 3.66).
 *
 * Reference: E. N. Sieder and G. E. Tate, "Heat transfer and pressure drop of liquids in tubes",
 * Industrial & Engineering Chemistry 28(12), pp. 1429–1435, 1936. DOI 10.1021/ie50324a027.
 */
export function nusseltLaminarEntrySiederTate(
  re: number,
  pr: number,
  dInner: number,
  length: number,
  muRatio: number,
): number {
  // 1.86 and 0.14: Sieder & Tate 1936
  return 1.86 * Math.cbrt((re * pr * dInner) / length) * Math.pow(muRatio, 0.14);
}
