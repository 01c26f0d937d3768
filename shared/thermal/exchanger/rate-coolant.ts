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
import { coolantPass, coolantStep, type CoolantState, type Fouling } from './coolant-step';
import { lmtdCorrectionFactor } from './effectiveness';
import { coolantProfile } from './profile';
import type { RateOptions } from './rate-wall';
import { solveFixedPoint } from './solve';
import { shellPressureDropKern, shellWarnings, type ShellGeometry } from './shell-side';
import type { Stream } from './streams';
import { entranceLength, tubePressureDrop, tubeVelocity, type Bundle } from './tube-side';

/** 0.75: below this F a single shell is refused; more shells in series are needed (common practice). */
export const MIN_LMTD_CORRECTION = 0.75;

export type { Fouling };

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
  const tW0 = 0.5 * (tHin + tCin);
  const ratio = (s.massFlow_kg_s * s.properties(tHin).specificHeat) / (c.massFlow_kg_s * c.properties(tCin).specificHeat);
  const k: CoolantState = { s, c, b, shell, fouling, choice, tHin, tCin, areaOut, tHout: 0, tCout: 0, tWi: tW0, tWo: tW0, ratio };
  const span = tHin - tCin;
  const x = solveFixedPoint((x) => coolantPass(k, x), tHin - 0.5 * span, tCin, tHin, 1e-7 * (1 + span));
  if (x !== k.tHout) coolantPass(k, x);
  const st = coolantStep(k, true);
  const tHout = st.tHout;
  const tCout = st.tCout;
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
}
