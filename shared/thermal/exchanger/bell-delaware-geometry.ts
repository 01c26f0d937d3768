/**
 * Geometry of a segmentally baffled shell as the Bell–Delaware method needs it: flow areas of the
 * crossflow, window, leakage and bypass streams, tube rows crossed, window tube fraction, baffle
 * count. Everything here depends on geometry only, so a rating computes it once per design.
 *
 * Reference (all equations): J. Taborek, "Shell-and-tube heat exchangers: single-phase flow",
 * §3.3.5, *Heat Exchanger Design Handbook*, Hemisphere, 1983 (also in Perry's *Chemical Engineers'
 * Handbook*, ch. 11, and in R. W. Serth, *Process Heat Transfer*, Academic Press, 2007, ch. 6).
 * Symbols follow Taborek: D_s shell ID, D_otl outer tube limit, D_ctl = D_otl − d_o, B_c cut as a
 * fraction of D_s, L_bc central spacing, L_pp row pitch in the flow direction. SI throughout.
 */
import type { Layout } from '../geometry/layout';
import { PASS_LANE_CLEARANCE_M } from '../geometry/layout';

/**
 * Row pitch parallel to the crossflow L_pp and effective transverse pitch L_tp,eff, as fractions of
 * the tube pitch (Taborek, HEDH §3.3.5): 30° 0.866 / 1; 90° 1 / 1; 45° 0.707 / 0.707;
 * 60° (rotated triangular) 0.5 / 0.866 (the diagonal gaps 2(p − d) per transverse pitch √3 p).
 */
export function rowPitchFactors(layout: Layout): { flow: number; transverse: number } {
  switch (layout) {
    case 30: return { flow: Math.sqrt(3) / 2, transverse: 1 };
    case 60: return { flow: 0.5, transverse: Math.sqrt(3) / 2 };
    case 90: return { flow: 1, transverse: 1 };
    case 45: return { flow: Math.SQRT1_2, transverse: Math.SQRT1_2 };
  }
}

/**
 * Angle subtended by the baffle cut at the centre, rad: on the shell
 * `θ_ds = 2 arccos(1 − 2 B_c)`, on the tube-centre limit `θ_ctl = 2 arccos((D_s/D_ctl)(1 − 2 B_c))`
 * (0 when the cut line lies outside D_ctl: no tubes in the window).
 */
export function baffleCutAngle(dShell: number, diameter: number, cut: number): number {
  const c = (dShell / diameter) * (1 - 2 * cut);
  if (c >= 1) return 0;
  if (c <= -1) return 2 * Math.PI;
  return 2 * Math.acos(c);
}

/** Fraction of tubes in one window: `F_w = θ_ctl/(2π) − sin θ_ctl/(2π)`; crossflow fraction `F_c = 1 − 2 F_w`. */
export function windowTubeFraction(thetaCtl: number): number {
  return (thetaCtl - Math.sin(thetaCtl)) / (2 * Math.PI);
}

/**
 * Crossflow area at the shell centreline, m²:
 * `S_m = L_bc [ (D_s − D_otl) + (D_ctl / L_tp,eff)(L_tp − d_o) ]`.
 */
export function crossflowAreaBell(baffleSpacing: number, dShell: number, dOtl: number, dOuter: number, pitch: number, pitchEff: number): number {
  return baffleSpacing * (dShell - dOtl + ((dOtl - dOuter) / pitchEff) * (pitch - dOuter));
}

/**
 * Baffles in one shell: `N_b = (L − L_bi − L_bo)/L_bc + 1`, rounded to a whole number, at least 1
 * (Taborek). With equal end spacings this is `round(L/L_bc) − 1`, the count Kern's rating uses.
 */
export function baffleCountBell(tubeLength: number, central: number, inlet: number, outlet: number): number {
  return Math.max(1, Math.round((tubeLength - inlet - outlet) / central) + 1);
}

export interface BaffleZoneGeometry {
  /** crossflow area S_m, window flow area S_w, bundle bypass area S_b, m² */
  sm: number;
  sw: number;
  sb: number;
  /** shell-to-baffle and tube-to-baffle-hole leakage areas S_sb, S_tb, m² */
  ssb: number;
  stb: number;
  /** window hydraulic diameter D_w, m */
  dw: number;
  /** tube fraction in one window, in crossflow */
  fw: number;
  fc: number;
  /** tube rows crossed between baffle tips N_tcc, effective rows in one window N_tcw */
  ntcc: number;
  ntcw: number;
  /** θ_ds, rad */
  thetaDs: number;
}

/**
 * Flow areas and row counts of one baffle compartment (Taborek, HEDH §3.3.5):
 * - `S_wg = (D_s²/4)(θ_ds − sin θ_ds)/2`, `S_wt = N_t F_w π d_o²/4`, `S_w = S_wg − S_wt`;
 * - `D_w = 4 S_w / (π d_o N_t F_w + D_s θ_ds)`;
 * - `S_sb = (π/2) D_s L_sb (1 − θ_ds/(2π))` (L_sb diametral), `S_tb = (π/4)((d_o + L_tb)² − d_o²) N_t (1 − F_w)`;
 * - `S_b = L_bc ((D_s − D_otl) + L_pl)`, L_pl the width of pass-partition lanes parallel to the flow;
 * - `N_tcc = (D_s/L_pp)(1 − 2 B_c)`, `N_tcw = (0.8/L_pp)(D_s B_c − (D_s − D_ctl)/2)` (≥ 0).
 * Valid for baffle cuts of about 15–45 % of D_s.
 */
export function baffleZoneGeometry(g: {
  dShell: number; dOtl: number; dOuter: number; pitch: number; layout: Layout; tubeCount: number;
  tubePasses: number; baffleSpacing: number; baffleCut: number; shellToBaffle: number; tubeToBaffle: number;
}): BaffleZoneGeometry {
  const { dShell, dOtl, dOuter, pitch, tubeCount, baffleSpacing, baffleCut } = g;
  const rp = rowPitchFactors(g.layout);
  const lpp = rp.flow * pitch;
  const dCtl = dOtl - dOuter;
  const thetaDs = baffleCutAngle(dShell, dShell, baffleCut);
  const thetaCtl = baffleCutAngle(dShell, dCtl, baffleCut);
  const fw = windowTubeFraction(thetaCtl);
  const fc = 1 - 2 * fw;
  const sm = crossflowAreaBell(baffleSpacing, dShell, dOtl, dOuter, pitch, rp.transverse * pitch);
  const swg = ((dShell * dShell) / 8) * (thetaDs - Math.sin(thetaDs));
  const swt = (tubeCount * fw * Math.PI * dOuter * dOuter) / 4;
  const sw = Math.max(swg - swt, 1e-9);
  const dw = (4 * sw) / (Math.PI * dOuter * tubeCount * fw + dShell * thetaDs);
  const ssb = (Math.PI / 2) * dShell * g.shellToBaffle * (1 - thetaDs / (2 * Math.PI));
  const stb = (Math.PI / 4) * ((dOuter + g.tubeToBaffle) ** 2 - dOuter * dOuter) * tubeCount * (1 - fw);
  // A vertical pass-partition lane (4, 6, 8 passes in our layouts) runs parallel to the crossflow of
  // horizontally cut baffles: its clear width beyond one ordinary tube gap bypasses the bundle (our
  // reading of Taborek's L_pl).
  const lane = g.tubePasses >= 4 ? Math.max(0, PASS_LANE_CLEARANCE_M - (rp.transverse * pitch - dOuter)) : 0;
  const sb = baffleSpacing * (dShell - dOtl + lane);
  const ntcc = Math.max((dShell / lpp) * (1 - 2 * baffleCut), 1);
  const ntcw = Math.max((0.8 / lpp) * (dShell * baffleCut - (dShell - dCtl) / 2), 0);
  return { sm, sw, sb, ssb, stb, dw, fw, fc, ntcc, ntcw, thetaDs };
}
