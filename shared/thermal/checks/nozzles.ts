/**
 * Nozzles (issue 11): each side's inlet and outlet nozzle sized from the standard pipe sizes by
 * velocity, the shell inlet's ρv² checked against TEMA's impingement rule, and the nozzle losses
 * for both pressure-drop breakdowns. Hard finding: `nozzle-too-large` (the nozzle a flow needs is
 * wider than its shell allows).
 *
 * Rules (stated, common practice): a liquid nozzle runs at most 3 m/s (the trade's 1–3 m/s window,
 * sized to its upper end so the nozzle stays small); a gas nozzle at most 30 m/s and ρv² at most
 * 5,950 kg/(m·s²) (memory: TEMA's limit at the shell/bundle entrance); a nozzle's bore is at most
 * half the shell's inner diameter; a shell inlet above ρv² = 2,230 kg/(m·s²) gets an impingement
 * plate (TEMA RCB-4.6.1, 1,500 lb/(ft·s²) for non-abrasive single-phase fluids, memory). Losses:
 * one velocity head at the inlet and half a velocity head at the outlet (common practice), at each
 * nozzle's own density. N shells in series: each shell has its own pair.
 * An estimate for the quotation: the responsible engineer's drawing governs.
 */
import type { ThermalWarning } from '../errors';

/** One standard nozzle size: NPS and its bore (ASME B36.10M, standard wall, memory). */
export interface NozzleSize {
  nps: number;
  innerDiameter_m: number;
}

/**
 * NPS 1 to 12, standard (STD) wall, ASME B36.10M (memory): OD − 2 × wall, mm.
 * 1: 33.4 − 2·3.38; 1½: 48.3 − 2·3.68; 2: 60.3 − 2·3.91; 3: 88.9 − 2·5.49; 4: 114.3 − 2·6.02;
 * 6: 168.3 − 2·7.11; 8: 219.1 − 2·8.18; 10: 273.0 − 2·9.27; 12: 323.8 − 2·9.53.
 * The list stops at NPS 12, the largest nozzle the price book carries.
 */
export const NOZZLE_SIZES: readonly NozzleSize[] = [
  [1, 26.64], [1.5, 40.94], [2, 52.48], [3, 77.92], [4, 102.26], [6, 154.08], [8, 202.74], [10, 254.46], [12, 304.74],
].map(([nps, id]) => ({ nps: nps!, innerDiameter_m: id! / 1000 }));

/** 3 m/s: highest liquid nozzle velocity (common practice: liquids 1–3 m/s). */
export const LIQUID_NOZZLE_VELOCITY_MAX = 3;
/** 30 m/s: highest gas nozzle velocity (common practice). */
export const GAS_NOZZLE_VELOCITY_MAX = 30;
/** 5,950 kg/(m·s²): highest gas nozzle ρv² (memory: TEMA's 4,000 lb/(ft·s²) at the shell entrance). */
export const GAS_NOZZLE_RHOV2_MAX = 5950;
/** 2,230 kg/(m·s²): shell-inlet ρv² above which an impingement plate is fitted (TEMA RCB-4.6.1, memory). */
export const IMPINGEMENT_RHOV2 = 2230;
/** 0.5: largest nozzle bore over shell inner diameter (common practice). */
export const NOZZLE_MAX_SHELL_FRACTION = 0.5;
/** Velocity heads lost at an inlet nozzle (1) and an outlet nozzle (0.5) (common practice). */
export const K_NOZZLE_INLET = 1;
export const K_NOZZLE_OUTLET = 0.5;

export type NozzleSide = 'tube' | 'shell';
export type NozzleRole = 'inlet' | 'outlet';

export interface Nozzle {
  side: NozzleSide;
  role: NozzleRole;
  /** e.g. "NPS 3" */
  label: string;
  nps: number;
  innerDiameter_m: number;
  velocity_m_s: number;
  /** kg/(m·s²) */
  rhoV2: number;
  impingementPlate: boolean;
}

/** One side's stream at its nozzles: mass flow and the density at the inlet and at the outlet. */
export interface NozzleStream {
  massFlow_kg_s: number;
  inletDensity: number;
  outletDensity: number;
  liquid: boolean;
}

export interface NozzleCheck {
  ok: boolean;
  findings: ThermalWarning[];
  nozzles: Nozzle[];
  /** losses of one shell's nozzles, Pa */
  tubeLoss_Pa: number;
  shellLoss_Pa: number;
}

/** Velocity through a bore, m/s: v = ṁ / (ρ π d²/4). */
export function nozzleVelocity(massFlow_kg_s: number, density: number, bore_m: number): number {
  return massFlow_kg_s / (density * Math.PI * bore_m * bore_m * 0.25);
}

/** ρv², kg/(m·s²), from the mass flow: (ṁ / A)² / ρ. */
export function rhoV2(massFlow_kg_s: number, density: number, bore_m: number): number {
  const g = massFlow_kg_s / (Math.PI * bore_m * bore_m * 0.25);
  return (g * g) / density;
}

/** Does this bore keep the stream within its nozzle limits? */
function withinLimits(st: NozzleStream, density: number, bore: number): boolean {
  const v = nozzleVelocity(st.massFlow_kg_s, density, bore);
  if (st.liquid) return v <= LIQUID_NOZZLE_VELOCITY_MAX + 1e-9;
  return v <= GAS_NOZZLE_VELOCITY_MAX + 1e-9 && rhoV2(st.massFlow_kg_s, density, bore) <= GAS_NOZZLE_RHOV2_MAX + 1e-6;
}

/** The smallest standard nozzle within the limits at the given density; the largest if none is. */
export function nozzleFor(st: NozzleStream, density: number): { size: NozzleSize; fits: boolean } {
  const size = NOZZLE_SIZES.find((n) => withinLimits(st, density, n.innerDiameter_m));
  return size ? { size, fits: true } : { size: NOZZLE_SIZES[NOZZLE_SIZES.length - 1]!, fits: false };
}

/**
 * Sizes the four nozzles of one shell. The inlet and outlet of a side share one size (the larger
 * the two densities need: a gas expands as it warms, a liquid barely changes), as a shop would
 * fit them. `shellInnerDiameter_m` bounds both sides (the channel is the shell's diameter).
 */
export function sizeNozzles(tube: NozzleStream, shell: NozzleStream, shellInnerDiameter_m: number): NozzleCheck {
  const findings: ThermalWarning[] = [];
  const nozzles: Nozzle[] = [];
  const losses = { tube: 0, shell: 0 };
  let ok = true;
  const maxBore = NOZZLE_MAX_SHELL_FRACTION * shellInnerDiameter_m;
  for (const [side, st] of [['tube', tube], ['shell', shell]] as const) {
    const a = nozzleFor(st, st.inletDensity);
    const b = nozzleFor(st, st.outletDensity);
    const size = a.size.nps >= b.size.nps ? a.size : b.size;
    const where = side === 'tube' ? 'channel (tube-side)' : 'shell-side';
    if (size.innerDiameter_m > maxBore + 1e-9) {
      ok = false;
      findings.push({
        code: 'nozzle-too-large',
        message: `The ${where} nozzles need NPS ${size.nps} (${Math.round(size.innerDiameter_m * 1000)} mm bore) to keep the flow within ` +
          `${st.liquid ? `${LIQUID_NOZZLE_VELOCITY_MAX} m/s` : `${GAS_NOZZLE_VELOCITY_MAX} m/s and ρv² ${GAS_NOZZLE_RHOV2_MAX} kg/(m·s²)`}, ` +
          `wider than half the ${Math.round(shellInnerDiameter_m * 1000)} mm shell (at most ${Math.round(maxBore * 1000)} mm): a larger shell or a lower flow is needed.`,
      });
    } else if (!(a.fits && b.fits)) {
      findings.push({
        code: 'nozzle-velocity-high',
        message: `Even the largest standard nozzle (NPS ${size.nps}) leaves the ${where} flow above its velocity limit; the losses are counted at that size.`,
      });
    }
    for (const role of ['inlet', 'outlet'] as const) {
      const rho = role === 'inlet' ? st.inletDensity : st.outletDensity;
      const v = nozzleVelocity(st.massFlow_kg_s, rho, size.innerDiameter_m);
      const rv2 = rho * v * v;
      const plate = side === 'shell' && role === 'inlet' && rv2 > IMPINGEMENT_RHOV2;
      nozzles.push({ side, role, label: `NPS ${size.nps}`, nps: size.nps, innerDiameter_m: size.innerDiameter_m, velocity_m_s: v, rhoV2: rv2, impingementPlate: plate });
      losses[side] += (role === 'inlet' ? K_NOZZLE_INLET : K_NOZZLE_OUTLET) * 0.5 * rv2;
    }
  }
  const inlet = nozzles.find((n) => n.side === 'shell' && n.role === 'inlet')!;
  if (inlet.impingementPlate) {
    findings.push({
      code: 'impingement-plate',
      message: `The shell inlet's ρv² is ${Math.round(inlet.rhoV2)} kg/(m·s²), above ${IMPINGEMENT_RHOV2} (TEMA RCB-4.6.1): an impingement plate protects the first tube rows.`,
    });
  }
  return { ok, findings, nozzles, tubeLoss_Pa: losses.tube, shellLoss_Pa: losses.shell };
}

/** The design's `nozzles` record (without the NPS number, which the label carries). */
export function designNozzles(nozzles: readonly (Omit<Nozzle, 'nps'> & { nps?: number })[]): Omit<Nozzle, 'nps'>[] {
  return nozzles.map(({ side, role, label, innerDiameter_m, velocity_m_s, rhoV2, impingementPlate }) => ({ side, role, label, innerDiameter_m, velocity_m_s, rhoV2, impingementPlate }));
}
