/** Picks and runs a tube-side method from the one table, for `auto` or a forced choice. */
import { ThermalInputError, type ThermalWarning } from '../errors';
import { autoNusselt, autoPlan, correctionMethods, nusseltMethods, nusseltMethods as methodTable, rangeWarnings, type ConvectionInputs, type NusseltMethodLabel } from './methods';
import { RE_LAMINAR_LIMIT, RE_TURBULENT_LIMIT } from './transition';

/** The choices a request may make (`correlation` field). */
export const correlationChoices = ['auto', 'gnielinski', 'dittus-boelter', 'sieder-tate', 'hausen', 'laminar-fully-developed'] as const;
export type CorrelationChoice = (typeof correlationChoices)[number];

export type Regime = 'laminar' | 'transitional' | 'turbulent';

export interface NusseltResult {
  nusselt: number;
  regime: Regime;
  /** label of the method that ran (a key of `nusseltMethods`) */
  method: NusseltMethodLabel;
  methodName: string;
  /** labels of the corrections `auto` multiplied on (never for a forced method) */
  corrections: string[];
  warnings: ThermalWarning[];
}

/** 2300 / 10⁴: common practice regime limits, the ends of Gnielinski's 1995 interpolation. */
export function regimeOf(re: number): Regime {
  return re < RE_LAMINAR_LIMIT ? 'laminar' : re < RE_TURBULENT_LIMIT ? 'transitional' : 'turbulent';
}

function forcedLabel(choice: Exclude<CorrelationChoice, 'auto'>, re: number): NusseltMethodLabel {
  if (choice === 'sieder-tate') return re < RE_LAMINAR_LIMIT ? 'sieder-tate-laminar' : 'sieder-tate-turbulent';
  return choice;
}

/**
 * Tube-side mean Nusselt number. `auto` picks by regime and Pr (see `autoPlan`); a forced choice
 * runs exactly the published formula, with range warnings but no corrections. Also returns only
 * the Nusselt number cheaply when `withWarnings` is false (used inside iterations).
 */
export function tubeSideNusselt(i: ConvectionInputs, choice: CorrelationChoice, withWarnings = true): NusseltResult {
  const regime = regimeOf(i.re);
  if (choice === 'auto') {
    const plan = autoPlan(i);
    const e = nusseltMethods[plan.method];
    const nusselt = autoNusselt(i);
    const warnings: ThermalWarning[] = [];
    if (withWarnings) {
      warnings.push(...rangeWarnings(e, i));
      for (const c of plan.corrections) warnings.push(...rangeWarnings(correctionMethods[c as keyof typeof correctionMethods], i));
      if (regime === 'transitional') warnings.push({ code: 'transition-uncertain', message: `Re = ${Math.round(i.re)} is in the laminar–turbulent transition (2300–10⁴): the heat-transfer coefficient is uncertain there; a design outside this range is more predictable.` });
    }
    return { nusselt, regime, method: plan.method, methodName: e.name, corrections: plan.corrections, warnings };
  }
  const label = forcedLabel(choice, i.re);
  const e = nusseltMethods[label];
  const nusselt = e.evaluate(i);
  if (!(nusselt > 0) || !Number.isFinite(nusselt)) {
    throw new ThermalInputError('correlation-not-applicable', `${e.name} gives no positive Nusselt number at Re = ${Math.round(i.re)}, Pr = ${i.pr.toPrecision(3)}; choose "auto" or a method for this regime.`, 'correlation');
  }
  return { nusselt, regime, method: label, methodName: e.name, corrections: [], warnings: withWarnings ? rangeWarnings(e, i) : [] };
}

/** Only the Nusselt number, for iterations (no warnings, no allocation of a result). */
export function tubeSideNusseltValue(i: ConvectionInputs, choice: CorrelationChoice): number {
  if (choice === 'auto') return autoNusselt(i);
  const nu = methodTable[forcedLabel(choice, i.re)].evaluate(i);
  return nu > 0 && Number.isFinite(nu) ? nu : NaN;
}
