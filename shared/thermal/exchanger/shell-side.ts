/** Shell-side coefficient and pressure drop of a baffled shell by Kern's method. */
import type { ThermalWarning } from '../errors';
import type { FluidProperties } from '../fluids';
import { pitchFamily, type Layout } from '../geometry/layout';
import { equivalentDiameterKern, frictionShellKern, nusseltShellKern, pressureDropShellKern, shellCrossflowAreaKern } from './kern';

export interface ShellGeometry {
  dShell: number;
  baffleSpacing: number;
  baffleCut: number;
  pitch: number;
  layout: Layout;
}

/** Default baffle spacing: 0.4 D_s (common practice, 0.2–1 D_s), at least 50.8 mm (TEMA RCB-4.51, memory). */
export function defaultBaffleSpacing(dShell: number, tubeLength: number): number {
  return Math.min(tubeLength, Math.max(0.4 * dShell, 0.0508));
}

export interface ShellSide {
  h: number;
  re: number;
  velocity: number;
  massVelocity: number;
  dEquivalent: number;
}

export function shellSideKern(s: ShellGeometry, dOuter: number, massFlow: number, bulk: FluidProperties, muWall: number): ShellSide {
  const area = shellCrossflowAreaKern(s.dShell, s.baffleSpacing, s.pitch, dOuter);
  const de = equivalentDiameterKern(s.pitch, dOuter, pitchFamily(s.layout));
  const g = massFlow / area;
  const re = (g * de) / bulk.viscosity;
  const nu = nusseltShellKern(re, bulk.prandtl, bulk.viscosity / muWall);
  return { h: (nu * bulk.conductivity) / de, re, velocity: g / bulk.density, massVelocity: g, dEquivalent: de };
}

/** Baffles in a tube of this length: crossings `round(L/B)`, baffles one fewer. */
export function baffleCount(s: ShellGeometry, tubeLength: number): number {
  return Math.max(0, Math.round(tubeLength / s.baffleSpacing) - 1);
}

export function shellPressureDropKern(s: ShellGeometry, side: ShellSide, tubeLength: number, bulk: FluidProperties, muWall: number): number {
  const f = frictionShellKern(side.re);
  return pressureDropShellKern(f, side.massVelocity, baffleCount(s, tubeLength), s.dShell, bulk.density, side.dEquivalent, bulk.viscosity / muWall);
}

export function shellWarnings(s: ShellGeometry, side: ShellSide, liquid: boolean): ThermalWarning[] {
  const out: ThermalWarning[] = [];
  if (side.re < 2000 || side.re > 1e6) {
    out.push({ code: 'shell-correlation-range', message: `Shell-side Re = ${Math.round(side.re)} is outside Kern's range (2·10³–10⁶): the shell-side coefficient is uncertain.` });
  }
  if (Math.abs(s.baffleCut - 0.25) > 0.03) {
    out.push({ code: 'shell-baffle-cut', message: `Kern's method is fitted to a 25 % baffle cut; ${Math.round(s.baffleCut * 100)} % is rated as if it were 25 %.` });
  }
  // 0.3–1 m/s: liquids on the shell side (domain brief 2.4, common practice)
  if (liquid && side.velocity < 0.3) out.push({ code: 'shell-velocity-low', message: `Shell-side velocity ${side.velocity.toFixed(2)} m/s is below about 0.3 m/s: liquids foul at low velocity (common practice). Closer baffles raise it.` });
  if (liquid && side.velocity > 1) out.push({ code: 'shell-velocity-high', message: `Shell-side velocity ${side.velocity.toFixed(2)} m/s is above about 1 m/s for liquids (common practice): risk of erosion and vibration. Wider baffle spacing lowers it.` });
  return out;
}
