/**
 * Rating with a coolant on the shell side: overall U on the outside area (Kern shell side, wall
 * conduction, fouling both sides) and ε-NTU for one shell pass (counterflow for 1 tube pass, the
 * 1–2 formula for an even number). Properties at each stream's mean bulk temperature, iterated;
 * wall viscosities at wall temperatures estimated from the resistances.
 */
import type { RateResult } from '../../schemas/thermal';
import type { CorrelationChoice } from '../correlations/select';
import { ThermalInputError } from '../errors';
import { ENGINEERING_CAUTION, tubeWarnings } from './checks';
import { effectiveness, lmtdCorrectionFactor } from './effectiveness';
import { overallCoefficientOutside } from './overall';
import { coolantProfile } from './profile';
import { effectiveCp, type RateOptions } from './rate-wall';
import { solveFixedPoint } from './solve';
import { shellPressureDropKern, shellSideKern, shellWarnings, type ShellGeometry } from './shell-side';
import { propertiesOrNull, type Stream } from './streams';
import { entranceLength, tubePressureDrop, tubeSideConvection, tubeSideH, tubeVelocity, type Bundle } from './tube-side';

/** 0.75: below this F a single shell is refused; more shells in series are needed (common practice). */
export const MIN_LMTD_CORRECTION = 0.75;

export interface Fouling {
  inside: number;
  outside: number;
}

export function rateCoolant(
  s: Stream,
  c: Stream,
  b: Bundle,
  shell: ShellGeometry,
  fouling: Fouling,
  choice: CorrelationChoice,
  opts: RateOptions = {},
): RateResult {
  const tHin = s.inletTemp_C;
  const tCin = c.inletTemp_C;
  const areaOut = b.count * Math.PI * b.dOuter * b.length;
  const hotProps = s.properties;
  const coldProps = c.properties;
  // state carried between evaluations: capacity ratio and wall temperatures lag one evaluation
  let ratio = (s.massFlow_kg_s * hotProps(tHin).specificHeat) / (c.massFlow_kg_s * coldProps(tCin).specificHeat);
  let tWi = 0.5 * (tHin + tCin);
  let tWo = tWi;
  let tHout = 0;
  let tCout = 0;
  let st!: ReturnType<typeof step>;
  const g = (x: number): number => {
    tHout = x;
    tCout = tCin + (tHin - x) * ratio;
    st = step(false);
    ratio = st.ch / st.cc;
    // wall temperatures only steer μ/μw: moved when they change by more than 0.1 K, saving property calls
    if (Math.abs(st.tWi - tWi) > 0.1) tWi = st.tWi;
    if (Math.abs(st.tWo - tWo) > 0.1) tWo = st.tWo;
    return st.tHout;
  };
  const span = tHin - tCin;
  const x = solveFixedPoint(g, tHin - 0.5 * span, tCin, tHin, 1e-7 * (1 + span));
  if (x !== tHout) g(x);
  st = step(true);
  tHout = st.tHout;
  tCout = st.tCout;
  const conv = st.conv!;

  const problem = c.fluid.stateProblem(tCout, c.pressure_Pa);
  if (problem) {
    throw new ThermalInputError('coolant-outlet-state', `The coolant would leave at ${tCout.toFixed(1)} °C, which it cannot: ${problem} Raise the coolant flow.`, 'boundary.massFlow_kg_s');
  }
  const f = lmtdCorrectionFactor(st.ntu, st.cr, b.passes);
  if (f < MIN_LMTD_CORRECTION) {
    throw new ThermalInputError(
      'lmtd-correction-low',
      `With one shell pass and ${b.passes} tube passes the LMTD correction factor F is ${f.toFixed(2)}, below ${MIN_LMTD_CORRECTION}: ` +
        'the streams approach a temperature cross and a small change in flow or fouling would lose much of the duty. ' +
        'Use one tube pass (counterflow), two or more shells in series, or a larger temperature approach.',
      'geometry.tubePasses',
    );
  }
  const dp = tubePressureDrop(b, s.massFlow_kg_s, st.hot);
  const velocity = tubeVelocity(b, s.massFlow_kg_s, st.hot.density);
  const shellDp = shellPressureDropKern(shell, st.shell, b.length, st.cold, st.muWallShell);
  const warnings = [
    ...conv.warnings,
    ...tubeWarnings(s, b, velocity, dp.total_Pa),
    ...shellWarnings(shell, st.shell, c.fluid.phase === 'liquid'),
  ];
  const n = opts.profilePoints ?? 21;
  const result: RateResult = {
    outletTemp_C: tHout,
    duty_W: st.q,
    regime: conv.regime,
    correlation: conv.method,
    correlationName: conv.methodName,
    corrections: conv.corrections,
    reynolds: conv.re,
    prandtl: conv.pr,
    nusselt: conv.nusselt,
    htc_W_m2K: conv.h,
    velocity_m_s: velocity,
    entranceLength_m: entranceLength(conv.re, conv.pr, b.dInner),
    frictionFactor: dp.frictionFactor,
    pressureDrop: { friction_Pa: dp.friction_Pa, returns_Pa: dp.returns_Pa, nozzles_Pa: dp.nozzles_Pa, total_Pa: dp.total_Pa },
    bulkMeanTemp_C: 0.5 * (tHin + tHout),
    area_m2: areaOut,
    warnings,
    caution: ENGINEERING_CAUTION,
    profile: n > 1 ? coolantProfile(n, b, tHin, tHout, tCin, tCout, st.u * areaOut, st.ch, st.cc) : [],
    coolantOutletTemp_C: tCout,
    overallU_W_m2K: st.u,
    effectiveness: st.eps,
    ntu: st.ntu,
    lmtdCorrectionF: f,
    shellPressureDrop_Pa: shellDp,
    shellVelocity_m_s: st.shell.velocity,
    shellHtc_W_m2K: st.shell.h,
    shellInnerDiameter_m: shell.dShell,
  };
  if (s.humidityRatio !== undefined) {
    result.condensate_kg_s = st.condensate;
    result.latentDuty_W = st.latent;
  }
  return result;

  /** One pass of the fixed point: properties at the current means → new outlets and wall temperatures. */
  function step(withWarnings: boolean) {
    const tHm = 0.5 * (tHin + tHout);
    const tCm = 0.5 * (tCin + tCout);
    const hot = hotProps(tHm);
    const cold = coldProps(tCm);
    const wallIn = propertiesOrNull(s, tWi) ?? hot;
    const muWallShell = (propertiesOrNull(c, tWo) ?? cold).viscosity;
    const conv = withWarnings ? tubeSideConvection(b, s.massFlow_kg_s, hot, wallIn, tHm, tWi, s.fluid.phase, choice, true) : null;
    const hIn = conv ? conv.h : tubeSideH(b, s.massFlow_kg_s, hot, wallIn, tHm, tWi, s.fluid.phase, choice);
    const shellSide = shellSideKern(shell, b.dOuter, c.massFlow_kg_s, cold, muWallShell);
    const u = overallCoefficientOutside(hIn, shellSide.h, b.dInner, b.dOuter, b.kWall, fouling.inside, fouling.outside);
    const cpH = effectiveCp(s, hot, tHout);
    const ch = s.massFlow_kg_s * cpH.cp;
    const cc = c.massFlow_kg_s * cold.specificHeat;
    const cmin = Math.min(ch, cc);
    const cr = cmin / Math.max(ch, cc);
    const ntu = (u * areaOut) / cmin;
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
}
