/**
 * One pass of the coolant rating's fixed point (`rateCoolant`): properties at the current mean
 * temperatures → overall U, ε-NTU outlets and new wall-temperature estimates. A module function
 * over a state object rather than a closure, so a rating creates no functions per call.
 *
 * The process (hot) stream is in the tubes or on the shell side (`side`); the coolant takes the
 * other. Tube-side convection is for whichever fluid is in the tubes, heated or cooled as the wall
 * temperature says (Dittus–Boelter's n, μ/μw follow from it); the shell side goes through the
 * shell-side method table.
 */
import type { ProcessSide } from '../../schemas/thermal';
import type { CorrelationChoice } from '../correlations/select';
import { effectivenessShells } from './arrangement';
import { overallCoefficientOutside } from './overall';
import { effectiveCp } from './rate-wall';
import type { PreparedShell, ShellMethodEntry } from './shell-methods';
import { propertiesOrNull, type Stream } from './streams';
import { tubeSideConvection, tubeSideH, type Bundle } from './tube-side';

/** Fouling resistances, m²K/W: `inside` on the tube side, `outside` on the shell side. */
export interface Fouling {
  inside: number;
  outside: number;
}

/** What a pass reads: the rating's fixed inputs and the temperatures the iteration carries. */
export interface CoolantState {
  s: Stream;
  c: Stream;
  side: ProcessSide;
  b: Bundle;
  /** identical shells in series; `b` is one shell's bundle */
  shells: number;
  method: ShellMethodEntry;
  prepared: PreparedShell;
  fouling: Fouling;
  choice: CorrelationChoice;
  tHin: number;
  tCin: number;
  /** outside tube area of all shells, m² */
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
  const processInTubes = k.side === 'tubes';
  const tube = processInTubes ? s : c;
  const tubeBulk = processInTubes ? hot : cold;
  const tTube = processInTubes ? tHm : tCm;
  const shellStream = processInTubes ? c : s;
  const shellBulk = processInTubes ? cold : hot;
  const wallIn = propertiesOrNull(tube, k.tWi) ?? tubeBulk;
  const muWallShell = (propertiesOrNull(shellStream, k.tWo) ?? shellBulk).viscosity;
  const conv = withWarnings ? tubeSideConvection(b, tube.massFlow_kg_s, tubeBulk, wallIn, tTube, k.tWi, tube.fluid.phase, k.choice, true) : null;
  const hIn = conv ? conv.h : tubeSideH(b, tube.massFlow_kg_s, tubeBulk, wallIn, tTube, k.tWi, tube.fluid.phase, k.choice);
  const shellSide = k.method.rate(k.prepared, shellStream.massFlow_kg_s, shellBulk, muWallShell);
  const u = overallCoefficientOutside(hIn, shellSide.h, b.dInner, b.dOuter, b.kWall, k.fouling.inside, k.fouling.outside);
  const cpH = effectiveCp(s, hot, k.tHout);
  const ch = s.massFlow_kg_s * cpH.cp;
  const cc = c.massFlow_kg_s * cold.specificHeat;
  const cmin = Math.min(ch, cc);
  const cr = cmin / Math.max(ch, cc);
  const ntu = (u * k.areaOut) / cmin;
  const eps = effectivenessShells(ntu, cr, b.passes, k.shells);
  const q = eps * cmin * (tHin - tCin);
  // wall temperatures from the share of the resistance on each side of the wall
  const fIn = (b.dOuter / (b.dInner * hIn)) * u;
  const fOut = u / shellSide.h;
  const dtMean = tHm - tCm;
  return {
    tHout: tHin - q / ch, tCout: tCin + q / cc,
    tWi: processInTubes ? tHm - fIn * dtMean : tCm + fIn * dtMean,
    tWo: processInTubes ? tCm + fOut * dtMean : tHm - fOut * dtMean,
    hot, cold, tubeBulk, shellBulk, conv, shell: shellSide, muWallShell, u, ntu, eps, cr, q, ch, cc, hIn,
    condensate: cpH.condensate_kg_s, latent: cpH.latent_W,
  };
}
