/** Laminar–turbulent transition in round tubes. */

/** 2300: lower end of Gnielinski's 1995 interpolation (common practice laminar limit). */
export const RE_LAMINAR_LIMIT = 2300;
/** 10⁴: upper end of Gnielinski's 1995 interpolation (fully turbulent). */
export const RE_TURBULENT_LIMIT = 1e4;

/**
 * Gnielinski's transition interpolation:
 *
 * `Nu = (1 − γ) Nu_lam(2300) + γ Nu_turb(10⁴)`, `γ = (Re − 2300)/(10⁴ − 2300)`, `0 ≤ γ ≤ 1`.
 *
 * `nuLaminarAt2300` and `nuTurbulentAt1e4` are the laminar and turbulent mean Nusselt numbers
 * evaluated at `Re = 2300` and `Re = 10⁴` with the actual `Pr` and `D/L`. Valid for
 * `2300 ≤ Re ≤ 10⁴`; the result is uncertain there (flow may be intermittent).
 *
 * Reference: V. Gnielinski, "Ein neues Berechnungsverfahren für die Wärmeübertragung im
 * Übergangsbereich zwischen laminarer und turbulenter Rohrströmung", Forschung im
 * Ingenieurwesen 61(9), pp. 240–248, 1995. DOI 10.1007/BF02607964.
 */
export function nusseltTransitionGnielinski(
  re: number,
  nuLaminarAt2300: number,
  nuTurbulentAt1e4: number,
): number {
  const gamma = (re - RE_LAMINAR_LIMIT) / (RE_TURBULENT_LIMIT - RE_LAMINAR_LIMIT);
  return (1 - gamma) * nuLaminarAt2300 + gamma * nuTurbulentAt1e4;
}
