/**
 * Darcy friction factor for flow in round tubes.
 *
 * Over all Re (stated choice, see `frictionDarcy`): Churchill's 1977 all-regime equation, with its
 * turbulent term taken from Colebrook instead of Churchill's explicit fit. This is `64/Re` in laminar
 * flow, Colebrook in turbulent flow, and Churchill's published transition term between them, joined by
 * Churchill & Usagi's asymptotic blending: continuous and smooth at every Re (no switch at 2300 or
 * 4000). Results between about 2000 and 4000 (intermittent flow) remain uncertain, as with any method.
 */

/** 2300: laminar limit (common practice); 4000: lower end of Colebrook's use (common practice).
 * No longer switch points of `frictionDarcy`; kept as the regime limits other modules name. */
export const RE_FRICTION_LAMINAR = 2300;
export const RE_FRICTION_TURBULENT = 4000;
/** Below this Re `frictionDarcy` takes Churchill's own turbulent term (negligible there, see below). */
const RE_COLEBROOK_TERM = 1000;

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

/** Churchill's turbulent term `A = [2.457 ln(1 / ((7/Re)^0.9 + 0.27 ε/D))]^16` (Churchill 1977). */
function churchillA(re: number, relRoughness: number): number {
  return Math.pow(2.457 * Math.log(1 / (Math.pow(7 / re, 0.9) + 0.27 * relRoughness)), 16);
}

/** Churchill's transition term `B = (37530/Re)^16` (Churchill 1977). */
function churchillB(re: number): number {
  return Math.pow(37530 / re, 16);
}

/**
 * Churchill's all-regime Darcy friction factor, as published:
 *
 * `f = 8 [(8/Re)^12 + (A + B)^(−3/2)]^(1/12)`,
 * `A = [2.457 ln(1 / ((7/Re)^0.9 + 0.27 ε/D))]^16`, `B = (37530/Re)^16`.
 *
 * `re` dimensionless (> 0), `relRoughness = ε/D`. Valid for all Re (laminar, transition, turbulent).
 * Agrees with `64/Re` to 0.2 % below Re ≈ 2000 and with Colebrook to about 1 % for Re 10⁴–10⁶ and
 * ε/D ≤ 10⁻³ (2 % at ε/D = 10⁻², Re = 10⁴), measured against python3-fluids' Colebrook.
 *
 * Reference: S. W. Churchill, "Friction-factor equation spans all fluid-flow regimes", Chemical
 * Engineering 84(24), pp. 91–92, 7 November 1977.
 */
export function frictionChurchill(re: number, relRoughness: number): number {
  const a = churchillA(re, relRoughness);
  return 8 * Math.pow(Math.pow(8 / re, 12) + Math.pow(a + churchillB(re), -1.5), 1 / 12);
}

/**
 * Darcy friction factor over all Re (what the engine uses): Churchill's 1977 equation (above) with
 * its turbulent term `A` replaced by the value that makes that term equal Colebrook's friction factor,
 * `A = (8 / f_Colebrook)^8` (Churchill's turbulent asymptote is `8 A^(−1/8)`):
 *
 * `f = 8 [(8/Re)^12 + (A + B)^(−3/2)]^(1/12)`,  `B = (37530/Re)^16`.
 *
 * Churchill built the equation by the asymptotic blending of Churchill & Usagi, so either turbulent
 * asymptote may be used; this one keeps the turbulent results on Colebrook (within 0.1 % for
 * Re ≥ 5000) and the laminar ones on `64/Re` (within 0.2 % below Re ≈ 2000), with Churchill's
 * transition term between: continuous and smooth over all Re, with a peak near Re ≈ 3000.
 *
 * References: S. W. Churchill, Chemical Engineering 84(24), pp. 91–92, 1977; S. W. Churchill and
 * R. Usagi, "A general expression for the correlation of rates of transfer and other phenomena",
 * AIChE Journal 18(6), pp. 1121–1128, 1972; Colebrook 1939 (above).
 */
export function frictionDarcy(re: number, relRoughness: number): number {
  // Below Re 1000 the sum A + B is B to 1 part in 10⁸ and Colebrook has no meaning (nor a safe
  // solution at Re ~ 1): Churchill's own A is used there, a change far below rounding in f.
  const a = re < RE_COLEBROOK_TERM ? churchillA(re, relRoughness) : Math.pow(8 / frictionColebrook(re, relRoughness), 8);
  return 8 * Math.pow(Math.pow(8 / re, 12) + Math.pow(a + churchillB(re), -1.5), 1 / 12);
}
