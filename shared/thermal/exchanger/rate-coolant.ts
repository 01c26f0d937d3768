/**
 * Rating with a coolant: the process (hot) stream in the tubes or on the shell side, the coolant on
 * the other; one to four identical shells in series. Overall U on the outside area (tube-side
 * correlation for the tube fluid, the shell-side method table for the shell fluid, wall conduction,
 * fouling both sides) and ε-NTU for the arrangement (counterflow shells for one tube pass, 1–2
 * shells for an even number). Properties at each stream's mean bulk temperature, iterated; wall
 * viscosities at wall temperatures estimated from the resistances. Kern's shell side is computed
 * beside the chosen method as a second opinion.
 */
import type { ProcessSide, RateResult, ShellMethod } from '../../schemas/thermal';
import { outletBandCoolant, overallRelativeUncertainty } from './uncertainty';
import { sizeNozzles } from '../checks/nozzles';
import { screenVibration, type VibrationCheck } from '../checks/vibration';
import type { CorrelationChoice } from '../correlations/select';
import { ThermalInputError } from '../errors';
import { bafflePlan } from '../geometry/baffles';
import { lmtdCorrectionShells } from './arrangement';
import { ENGINEERING_CAUTION, tubeWarnings } from './checks';
import { coolantPass, coolantStep, type CoolantState, type Fouling } from './coolant-step';
import { coolantProfile } from './profile';
import type { RateOptions } from './rate-wall';
import { kernMethod, prepareShell, shellMethod, type PreparedShell } from './shell-methods';
import { shellWarnings, type ShellGeometry } from './shell-side';
import { solveFixedPoint } from './solve';
import type { Stream } from './streams';
import { entranceLength, tubePressureDrop, tubeVelocity, type Bundle } from './tube-side';

/** 0.75: below this F the arrangement is refused; more shells in series are needed (common practice). */
export const MIN_LMTD_CORRECTION = 0.75;

export type { Fouling };

/** Where the streams go and how many shells: the allocation and arrangement a rating is for. */
export interface Arrangement {
  processSide: ProcessSide;
  shells: number;
  method?: ShellMethod;
  /** tubes the laid-out tubesheet holds, for the fill finding */
  holds?: number;
  /** tube material id, for the vibration screen's modulus and density (default carbon steel) */
  tubeMaterial?: string;
}

/**
 * The vibration screen of one shell (checks/vibration.ts): the crossflow (gap) velocity at the
 * central spacing is the shell stream over Bell–Delaware's S_m, whichever method rated the shell.
 */
export function vibrationOf(b: Bundle, shell: ShellGeometry, prepared: PreparedShell, shellMassFlow: number, shellDensity: number, tubeDensity: number, shellLiquid: boolean, tubeMaterial?: string): VibrationCheck {
  return screenVibration({
    dOuter: b.dOuter, dInner: b.dInner, tubeMaterial, layout: shell.layout, pitch: shell.pitch, tubeLength: b.length,
    centralSpacing: prepared.baffleSpacing, inletSpacing: prepared.inletSpacing, outletSpacing: prepared.outletSpacing, baffles: prepared.baffles,
    centralVelocity_m_s: shellMassFlow / (shellDensity * prepared.sm), shellDensity, tubeFluidDensity: tubeDensity, shellLiquid,
  });
}

/** One shell's geometry for the shell-side methods, with the baffle plan the nozzles need. */
export function prepareFor(b: Bundle, shell: ShellGeometry): PreparedShell {
  const plan = bafflePlan(b.length, shell.baffleSpacing, shell.dShell, shell.inletSpacing, shell.outletSpacing);
  return prepareShell({
    dShell: shell.dShell, dOuter: b.dOuter, pitch: shell.pitch, layout: shell.layout, tubeCount: b.count, tubePasses: b.passes,
    tubeLength: b.length, baffleSpacing: shell.baffleSpacing, baffleCut: shell.baffleCut, inletSpacing: plan.inlet, outletSpacing: plan.outlet,
  });
}

export function rateCoolant(
  s: Stream,
  c: Stream,
  b: Bundle,
  shell: ShellGeometry,
  fouling: Fouling,
  choice: CorrelationChoice,
  opts: RateOptions = {},
  arr: Arrangement = { processSide: 'tubes', shells: 1 },
  prepared: PreparedShell = prepareFor(b, shell),
): RateResult {
  const tHin = s.inletTemp_C;
  const tCin = c.inletTemp_C;
  const N = arr.shells;
  const areaOut = N * b.count * Math.PI * b.dOuter * b.length;
  const tW0 = 0.5 * (tHin + tCin);
  const ratio = (s.massFlow_kg_s * s.properties(tHin).specificHeat) / (c.massFlow_kg_s * c.properties(tCin).specificHeat);
  const methodId = arr.method ?? 'bell-delaware';
  const method = shellMethod(methodId);
  const k: CoolantState = {
    s, c, side: arr.processSide, b, shells: N, method, prepared, fouling, choice, tHin, tCin, areaOut, tHout: 0, tCout: 0, tWi: tW0, tWo: tW0, ratio,
  };
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
  const f = lmtdCorrectionShells(st.ntu, st.cr, b.passes, N);
  if (f < MIN_LMTD_CORRECTION) {
    throw new ThermalInputError(
      'lmtd-correction-low',
      `With ${N} shell${N > 1 ? 's' : ''} in series and ${b.passes} tube passes the LMTD correction factor F is ${f.toFixed(2)}, below ${MIN_LMTD_CORRECTION}: ` +
        'the streams approach a temperature cross and a small change in flow or fouling would lose much of the duty. ' +
        'Use one tube pass (counterflow), more shells in series, or a larger temperature approach.',
      'geometry.tubePasses',
    );
  }
  const inTubes = arr.processSide === 'tubes';
  const tube = inTubes ? s : c;
  const shellStream = inTubes ? c : s;
  const dp1 = tubePressureDrop(b, tube.massFlow_kg_s, st.tubeBulk);
  const velocity = tubeVelocity(b, tube.massFlow_kg_s, st.tubeBulk.density);
  const kern = kernMethod.rate(prepared, shellStream.massFlow_kg_s, st.shellBulk, st.muWallShell);
  const sd = st.shell;
  const fill = arr.holds ? b.count / arr.holds : undefined;
  const shellLiquid = shellStream.fluid.phase === 'liquid';
  const vib = vibrationOf(b, shell, prepared, shellStream.massFlow_kg_s, st.shellBulk.density, st.tubeBulk.density, shellLiquid, arr.tubeMaterial);
  // nozzles sized per side (checks/nozzles.ts); their losses count in both breakdowns (a given tube-side bore keeps its own)
  const atEnds = (x: Stream, tIn: number, tOut: number) => ({ massFlow_kg_s: x.massFlow_kg_s, inletDensity: x.properties(tIn).density, outletDensity: x.properties(tOut).density, liquid: x.fluid.phase === 'liquid' });
  const noz = sizeNozzles(atEnds(tube, tube.inletTemp_C, inTubes ? tHout : tCout), atEnds(shellStream, shellStream.inletTemp_C, inTubes ? tCout : tHout), shell.dShell);
  const tubeNoz = b.nozzleDiameter ? dp1.nozzles_Pa : noz.tubeLoss_Pa;
  const tubeDp = dp1.friction_Pa + dp1.returns_Pa + tubeNoz;
  const shellDp = sd.dp.total_Pa + noz.shellLoss_Pa;
  const warnings = [
    ...conv.warnings,
    ...tubeWarnings(tube, b, velocity, N * tubeDp),
    ...shellWarnings(shell, sd, method, shellLiquid, b.length, fill),
    ...vib.findings,
    ...noz.findings,
  ];
  const n = opts.profilePoints ?? 21;
  const hotOut = tHout;
  const result: RateResult = {
    outletTemp_C: hotOut,
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
    frictionFactor: dp1.frictionFactor,
    pressureDrop: { friction_Pa: N * dp1.friction_Pa, returns_Pa: N * dp1.returns_Pa, nozzles_Pa: N * tubeNoz, total_Pa: N * tubeDp },
    bulkMeanTemp_C: 0.5 * (tHin + tHout),
    area_m2: areaOut,
    warnings,
    caution: ENGINEERING_CAUTION,
    profile: n > 1 ? coolantProfile(n, { ...b, length: b.length * N }, tHin, tHout, tCin, tCout, st.u * areaOut, st.ch, st.cc) : [],
    coolantOutletTemp_C: tCout,
    overallU_W_m2K: st.u,
    effectiveness: st.eps,
    ntu: st.ntu,
    lmtdCorrectionF: f,
    shellPressureDrop_Pa: N * shellDp,
    shellVelocity_m_s: sd.velocity,
    shellHtc_W_m2K: sd.h,
    shellInnerDiameter_m: shell.dShell,
    processSide: arr.processSide,
    tubeFluid: inTubes ? 'process' : 'coolant',
    shellFluid: inTubes ? 'coolant' : 'process',
    shellsInSeries: N,
    shellMethod: methodId,
    shellHtcKern_W_m2K: kern.h,
    shellPressureDropKern_Pa: N * (kern.dp.total_Pa + noz.shellLoss_Pa),
    shellReynolds: sd.re,
    shellPressureDropBreakdown: { crossflow_Pa: N * sd.dp.crossflow_Pa, window_Pa: N * sd.dp.window_Pa, ends_Pa: N * sd.dp.ends_Pa, nozzles_Pa: N * noz.shellLoss_Pa, total_Pa: N * shellDp },
    baffleSpacing_m: prepared.baffleSpacing,
    inletBaffleSpacing_m: prepared.inletSpacing,
    outletBaffleSpacing_m: prepared.outletSpacing,
    baffleCut: shell.baffleCut,
    baffleCount: prepared.baffles,
    foulingTube_m2K_W: fouling.inside,
    foulingShell_m2K_W: fouling.outside,
    nozzles: noz.nozzles,
    nozzlesOk: noz.ok,
    vibration: { spans: vib.spans, ok: vib.ok, connorsK: vib.connorsK, logDecrement: vib.logDecrement, addedMassCoefficient: vib.addedMassCoefficient, massPerLength_kg_m: vib.massPerLength_kg_m },
  };
  if (methodId === 'bell-delaware') result.shellCorrections = sd.corrections;
  result.outletUncertainty_K = outletBandCoolant(tHin, tHout, st.ntu, st.cr, b.passes, N, overallRelativeUncertainty(result, b.dOuter, b.dInner));
  if (fill !== undefined) result.shellFill = fill;
  if (s.humidityRatio !== undefined) {
    result.condensate_kg_s = st.condensate;
    result.latentDuty_W = st.latent;
  }
  return result;
}
