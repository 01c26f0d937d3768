/**
 * Darcy friction factor for flow in round tubes.
 *
 * Transition handling (stated choice): `64/Re` up to Re = 2300, Colebrook from Re = 4000, and a
 * linear interpolation in Re between the two (common practice; continuous, and no published
 * correlation covers intermittent flow). Results between 2300 and 4000 are uncertain.
 */

/** 2300: laminar limit (common practice); 4000: lower end of Colebrook's use (common practice). */
export const RE_FRICTION_LAMINAR = 2300;
export const RE_FRICTION_TURBULENT = 4000;

/**
 * Hagen–Poiseuille laminar Darcy friction factor `f = 64/Re`, valid for `Re < 2300`.
 *
 * Reference: G. Hagen, Annalen der Physik 122(3), pp. 423–442, 1839; J. L. M. Poiseuille, Comptes
 * Rendus 11, pp. 961–967 and 1041–1048, 1840.
 */
export function frictionLaminar(re: number): number {
  return 64 / re;
}

/**
 * Swamee & Jain's explicit approximation of Colebrook (within about 1 % for
 * `5000 ≤ Re ≤ 10⁸`, `10⁻⁶ ≤ ε/D ≤ 10⁻²`): `f = 0.25 / [log10(ε/(3.7D) + 5.74/Re^0.9)]²`.
 * Used here only as the starting point for solving Colebrook.
 *
 * Reference: P. K. Swamee and A. K. Jain, "Explicit equations for pipe-flow problems", Journal of
 * the Hydraulics Division (ASCE) 102(5), pp. 657–664, 1976.
 */
export function frictionSwameeJain(re: number, relRoughness: number): number {
  const l = Math.log10(relRoughness / 3.7 + 5.74 / Math.pow(re, 0.9));
  return 0.25 / (l * l);
}

/**
 * Colebrook's implicit equation, solved by Newton's method on `x = 1/√f` to 1e-10 relative:
 *
 * `1/√f = −2 log10(ε/(3.7 D) + 2.51/(Re √f))`.
 *
 * `re` dimensionless, `relRoughness = ε/D`. Valid for turbulent flow, `Re ≳ 4000`.
 *
 * Reference: C. F. Colebrook, "Turbulent flow in pipes, with particular reference to the transition
 * region between the smooth and rough pipe laws", Journal of the Institution of Civil Engineers
 * 11(4), pp. 133–156, 1939. DOI 10.1680/ijoti.1939.13150.
 */
export function frictionColebrook(re: number, relRoughness: number): number {
  const a = relRoughness / 3.7;
  const b = 2.51 / re;
  let x = 1 / Math.sqrt(frictionSwameeJain(Math.max(re, 2000), relRoughness));
  for (let k = 0; k < 50; k++) {
    const s = a + b * x;
    const g = x + 2 * Math.log10(s);
    const dg = 1 + (2 * b) / (s * Math.LN10);
    const next = x - g / dg;
    const done = Math.abs(next - x) <= 1e-12 * Math.abs(next);
    x = next;
    if (done) break;
  }
  return 1 / (x * x);
}

/** Darcy friction factor over all Re with the transition handling stated above. */
export function frictionDarcy(re: number, relRoughness: number): number {
  if (re <= RE_FRICTION_LAMINAR) return frictionLaminar(re);
  if (re >= RE_FRICTION_TURBULENT) return frictionColebrook(re, relRoughness);
  const w = (re - RE_FRICTION_LAMINAR) / (RE_FRICTION_TURBULENT - RE_FRICTION_LAMINAR);
  return (1 - w) * frictionLaminar(RE_FRICTION_LAMINAR) + w * frictionColebrook(RE_FRICTION_TURBULENT, relRoughness);
}
