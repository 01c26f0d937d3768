/**
 * One pass of the coolant rating's fixed point (`rateCoolant`): properties at the current mean
 * temperatures → overall U, ε-NTU outlets and new wall-temperature estimates. A module function
 * over a state object rather than a closure, so a rating creates no functions per call.
 */
import type { CorrelationChoice } from '../correlations/select';
import { effectiveness } from './effectiveness';
import { overallCoefficientOutside } from './overall';
import { effectiveCp } from './rate-wall';
import { shellSideKern, type ShellGeometry } from './shell-side';
import { propertiesOrNull, type Stream } from './streams';
import { tubeSideConvection, tubeSideH, type Bundle } from './tube-side';

export interface Fouling {
  inside: number;
  outside: number;
}

/** What a pass reads: the rating's fixed inputs and the temperatures the iteration carries. */
export interface CoolantState {
  s: Stream;
  c: Stream;
  b: Bundle;
  shell: ShellGeometry;
  fouling: Fouling;
  choice: CorrelationChoice;
  tHin: number;
  tCin: number;
  areaOut: number;
  tHout: number;
  tCout: number;
  /** inner and outer wall temperatures, °C (they steer μ/μw and Pr_w only) */
  tWi: number;
  tWo: number;
  /** C_hot / C_cold of the previous pass, which places the coolant outlet for the next */
  ratio: number;
}

/**
 * The fixed-point map: a process outlet guess → the outlet one pass gives. The capacity ratio and
 * the wall temperatures lag one pass; walls move only by more than 0.1 K (they steer μ/μw and
 * Pr_w alone, and held walls are remembered states, saving property calls).
 */
export function coolantPass(k: CoolantState, tHout: number): number {
  k.tHout = tHout;
  k.tCout = k.tCin + (k.tHin - tHout) * k.ratio;
  const st = coolantStep(k, false);
  k.ratio = st.ch / st.cc;
  if (Math.abs(st.tWi - k.tWi) > 0.1) k.tWi = st.tWi;
  if (Math.abs(st.tWo - k.tWo) > 0.1) k.tWo = st.tWo;
  return st.tHout;
}

export function coolantStep(k: CoolantState, withWarnings: boolean) {
  const { s, c, b, tHin, tCin } = k;
  const tHm = 0.5 * (tHin + k.tHout);
  const tCm = 0.5 * (tCin + k.tCout);
  const hot = s.properties(tHm);
  const cold = c.properties(tCm);
  const wallIn = propertiesOrNull(s, k.tWi) ?? hot;
  const muWallShell = (propertiesOrNull(c, k.tWo) ?? cold).viscosity;
  const conv = withWarnings ? tubeSideConvection(b, s.massFlow_kg_s, hot, wallIn, tHm, k.tWi, s.fluid.phase, k.choice, true) : null;
  const hIn = conv ? conv.h : tubeSideH(b, s.massFlow_kg_s, hot, wallIn, tHm, k.tWi, s.fluid.phase, k.choice);
  const shellSide = shellSideKern(k.shell, b.dOuter, c.massFlow_kg_s, cold, muWallShell);
  const u = overallCoefficientOutside(hIn, shellSide.h, b.dInner, b.dOuter, b.kWall, k.fouling.inside, k.fouling.outside);
  const cpH = effectiveCp(s, hot, k.tHout);
  const ch = s.massFlow_kg_s * cpH.cp;
  const cc = c.massFlow_kg_s * cold.specificHeat;
  const cmin = Math.min(ch, cc);
  const cr = cmin / Math.max(ch, cc);
  const ntu = (u * k.areaOut) / cmin;
  const eps = effectiveness(ntu, cr, b.passes);
  const q = eps * cmin * (tHin - tCin);
  const rTotal = 1 / u;
  const rIn = b.dOuter / (b.dInner * hIn);
  const dtMean = tHm - tCm;
  return {
    tHout: tHin - q / ch, tCout: tCin + q / cc,
    tWi: tHm - (rIn / rTotal) * dtMean, tWo: tCm + (1 / shellSide.h / rTotal) * dtMean,
    hot, cold, conv, shell: shellSide, muWallShell, u, ntu, eps, cr, q, ch, cc,
    condensate: cpH.condensate_kg_s, latent: cpH.latent_W,
  };
}
