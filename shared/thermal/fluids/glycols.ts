/**
 * Ethylene- and propylene-glycol/water mixtures at any glycol mass fraction from 10 % to 60 %, from the
 * freezing point to 100 °C, after Melinder 2010 (./melinder).
 *
 * Melinder's fits are polynomials in concentration as well as temperature, so a mixture at any mass
 * fraction inside the fit is evaluated directly (no interpolation between tabled strengths); the
 * freezing point comes from the same source's polynomial in concentration. The fit covers 0–60 % glycol
 * by mass; the library starts at 10 % because weaker mixtures give almost no frost protection (freezing
 * point above −3.4 °C) and are used as water (common practice).
 *
 * Library ids: `ethylene-glycol-<p>` and `propylene-glycol-<p>` for p = 10, 15, …, 60 (% by mass), so
 * the former ids `ethylene-glycol-30`, `-50`, `propylene-glycol-30`, `-50` keep their meaning.
 * Below the freezing point the mixture turns to slush (code `fluid-frozen`); above 100 °C the fit is not
 * valid and, at atmospheric pressure, the mixture approaches its boiling point (code `fluid-range`).
 */
import { ThermalInputError } from '../errors';
import { basicIssue, defineFluid, fmtTemp, props, type StateIssue } from './fluid-base';
import {
  ETHYLENE_GLYCOL,
  PROPYLENE_GLYCOL,
  melinderFreezingPoint,
  melinderProperties,
  type MelinderFluidData,
} from './melinder';
import type { Fluid, FluidInfo } from './types';

const SOURCE =
  'Melinder, Properties of Secondary Working Fluids for Indirect Systems, 2nd ed., IIR 2010 (polynomial fits)';

export type GlycolKind = 'ethylene' | 'propylene';

/** Glycol mass fraction range the library offers, % by mass (inside Melinder's 0–60 % fit). */
export const GLYCOL_MIN_PERCENT = 10;
export const GLYCOL_MAX_PERCENT = 60;
/** Highest temperature of the fits, °C (Melinder 2010). */
export const GLYCOL_MAX_TEMP_C = 100;

/** Strengths the library lists as ids, % by mass: 10, 15, …, 60. */
export const GLYCOL_PERCENTS = [10, 15, 20, 25, 30, 35, 40, 45, 50, 55, 60] as const;
export type GlycolPercent = (typeof GLYCOL_PERCENTS)[number];
export type GlycolFluidId = `${GlycolKind}-glycol-${GlycolPercent}`;

/** Every glycol id of the library, ethylene first, each in ascending strength. */
export const glycolFluidIds: readonly GlycolFluidId[] = (['ethylene', 'propylene'] as const).flatMap((kind) =>
  GLYCOL_PERCENTS.map((p): GlycolFluidId => `${kind}-glycol-${p}`),
);

const DATA: Record<GlycolKind, { name: string; data: MelinderFluidData }> = {
  ethylene: { name: 'Ethylene glycol', data: ETHYLENE_GLYCOL },
  propylene: { name: 'Propylene glycol', data: PROPYLENE_GLYCOL },
};

/** `ethylene-glycol-40` → `{ kind: 'ethylene', massPercent: 40 }`; anything else → null (any number, in range or not). */
export function parseGlycolId(id: string): { kind: GlycolKind; massPercent: number } | null {
  const m = /^(ethylene|propylene)-glycol-(\d+(?:\.\d+)?)$/.exec(id);
  return m ? { kind: m[1] as GlycolKind, massPercent: Number(m[2]) } : null;
}

/** Why this glycol strength cannot be used, in words, or null when it can. */
export function glycolStrengthProblem(kind: GlycolKind, massPercent: number): string | null {
  if (Number.isFinite(massPercent) && massPercent >= GLYCOL_MIN_PERCENT && massPercent <= GLYCOL_MAX_PERCENT) return null;
  return (
    `${DATA[kind].name}–water at ${massPercent} % by mass is outside the property data: the library covers ` +
    `${GLYCOL_MIN_PERCENT} to ${GLYCOL_MAX_PERCENT} % glycol by mass (Melinder 2010), as ids ` +
    `${kind}-glycol-${GLYCOL_MIN_PERCENT} … ${kind}-glycol-${GLYCOL_MAX_PERCENT} in steps of 5.`
  );
}

/** Freezing point (°C) of the mixture, Melinder 2010; `massPercent` must be inside the library's range. */
export function glycolFreezingPoint(kind: GlycolKind, massPercent: number): number {
  return melinderFreezingPoint(DATA[kind].data, massPercent);
}

/**
 * The glycol–water mixture with `massPercent` glycol by mass (10…60, any value), valid from its freezing
 * point to 100 °C. Outside 10…60 % → ThermalInputError `fluid-range` on `field`.
 */
export function glycolMixture(kind: GlycolKind, massPercent: number, field = 'process.fluid'): Fluid {
  const problem = glycolStrengthProblem(kind, massPercent);
  if (problem) throw new ThermalInputError('fluid-range', problem, field);
  const { name: glycolName, data } = DATA[kind];
  const freezing_C = melinderFreezingPoint(data, massPercent);
  const info: FluidInfo = {
    id: `${kind}-glycol-${massPercent}`,
    name: `${glycolName}–water, ${massPercent} % by mass`,
    phase: 'liquid',
    minTemp_C: Math.ceil(freezing_C * 10) / 10,
    maxTemp_C: GLYCOL_MAX_TEMP_C,
    source: SOURCE,
  };
  const issue = (temp_C: number, pressure_Pa: number): StateIssue | null => {
    if (temp_C <= freezing_C) {
      return {
        code: 'fluid-frozen',
        message:
          `${info.name} begins to freeze at ${fmtTemp(freezing_C)} (Melinder 2010); at ${fmtTemp(temp_C)} it ` +
          `would be slush or ice. Use a stronger mixture or keep the fluid warmer.`,
      };
    }
    return basicIssue(info, temp_C, pressure_Pa);
  };
  return defineFluid(info, issue, (temp_C) => {
    const p = melinderProperties(data, massPercent, temp_C);
    return props(p.density, p.specificHeat, p.viscosity, p.conductivity);
  });
}

/** The library's glycol fluids by id (10…60 % in steps of 5, both glycols). */
export const glycolFluids: Record<GlycolFluidId, Fluid> = Object.fromEntries(
  glycolFluidIds.map((id) => {
    const { kind, massPercent } = parseGlycolId(id)!;
    return [id, glycolMixture(kind, massPercent)];
  }),
) as Record<GlycolFluidId, Fluid>;

export const ethyleneGlycol30 = glycolFluids['ethylene-glycol-30'];
export const ethyleneGlycol50 = glycolFluids['ethylene-glycol-50'];
export const propyleneGlycol30 = glycolFluids['propylene-glycol-30'];
export const propyleneGlycol50 = glycolFluids['propylene-glycol-50'];
