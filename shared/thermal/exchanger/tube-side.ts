/** Tube-side convection and pressure drop of a bundle. */
import { tubeSideNusselt, tubeSideNusseltValue, type CorrelationChoice, type NusseltResult } from '../correlations/select';
import type { FluidPhase, FluidProperties } from '../fluids';
import { frictionDarcy } from '../friction';

export interface Bundle {
  dOuter: number;
  dInner: number;
  /** tubes in the bundle */
  count: number;
  /** length of one tube, m */
  length: number;
  passes: number;
  roughness: number;
  /** tube-wall conductivity, W/(m·K) */
  kWall: number;
  copperAlloy: boolean;
  nozzleDiameter?: number;
}

/** 4: Kern 1950, eq. 7.46, return losses in velocity heads per pass. */
export const K_RETURN_PER_PASS = 4;
/** 1.5: velocity heads for inlet plus outlet nozzle (common practice: 1 in, 0.5 out). */
export const K_NOZZLES = 1.5;

/** Mass flow through one tube: `ṁ · passes / N`. */
export function massPerTube(b: Bundle, massFlow: number): number {
  return (massFlow * b.passes) / b.count;
}

export function reynolds(b: Bundle, massFlow: number, viscosity: number): number {
  return (4 * massPerTube(b, massFlow)) / (Math.PI * b.dInner * viscosity);
}

export function tubeVelocity(b: Bundle, massFlow: number, density: number): number {
  return massPerTube(b, massFlow) / (density * ((Math.PI * b.dInner * b.dInner) / 4));
}

export interface TubeSideConvection extends NusseltResult {
  re: number;
  pr: number;
  h: number;
}

/**
 * Tube-side mean coefficient. Entrance effects use the length of one pass (the flow mixes in the
 * return headers). `bulk`/`wall` are the property sets at the bulk and inner-wall temperatures.
 */
export function tubeSideConvection(
  b: Bundle,
  massFlow: number,
  bulk: FluidProperties,
  wall: FluidProperties,
  tBulk_C: number,
  tWall_C: number,
  phase: FluidPhase,
  choice: CorrelationChoice,
  withWarnings: boolean,
): TubeSideConvection {
  const re = reynolds(b, massFlow, bulk.viscosity);
  const r = tubeSideNusselt(
    {
      re, pr: bulk.prandtl, dInner: b.dInner, length: b.length,
      muRatio: bulk.viscosity / wall.viscosity, prWall: wall.prandtl,
      tBulk_K: tBulk_C + 273.15, tWall_K: tWall_C + 273.15,
      heating: tWall_C > tBulk_C, boundary: 'wall', phase,
    },
    choice,
    withWarnings,
  );
  const out = r as TubeSideConvection;
  out.re = re;
  out.pr = bulk.prandtl;
  out.h = (r.nusselt * bulk.conductivity) / b.dInner;
  return out;
}

/** The tube-side coefficient alone, W/(m²·K), for iterations (same inputs as `tubeSideConvection`). */
export function tubeSideH(
  b: Bundle,
  massFlow: number,
  bulk: FluidProperties,
  wall: FluidProperties,
  tBulk_C: number,
  tWall_C: number,
  phase: FluidPhase,
  choice: CorrelationChoice,
): number {
  const re = reynolds(b, massFlow, bulk.viscosity);
  const nu = tubeSideNusseltValue(
    {
      re, pr: bulk.prandtl, dInner: b.dInner, length: b.length,
      muRatio: bulk.viscosity / wall.viscosity, prWall: wall.prandtl,
      tBulk_K: tBulk_C + 273.15, tWall_K: tWall_C + 273.15,
      heating: tWall_C > tBulk_C, boundary: 'wall', phase,
    },
    choice,
  );
  return (nu * bulk.conductivity) / b.dInner;
}

export interface TubePressureDrop {
  friction_Pa: number;
  returns_Pa: number;
  nozzles_Pa: number;
  total_Pa: number;
  frictionFactor: number;
}

/** `ΔP = n_p (f L/D_i + K_return) ρ v²/2` plus nozzles (domain brief 2.4; Kern 1950). */
export function tubePressureDrop(b: Bundle, massFlow: number, bulk: FluidProperties): TubePressureDrop {
  const re = reynolds(b, massFlow, bulk.viscosity);
  const fd = frictionDarcy(re, b.roughness / b.dInner);
  const v = tubeVelocity(b, massFlow, bulk.density);
  const head = 0.5 * bulk.density * v * v;
  const friction = b.passes * fd * (b.length / b.dInner) * head;
  const returns = b.passes * K_RETURN_PER_PASS * head;
  let nozzles = 0;
  if (b.nozzleDiameter) {
    const vn = massFlow / (bulk.density * ((Math.PI * b.nozzleDiameter * b.nozzleDiameter) / 4));
    nozzles = K_NOZZLES * 0.5 * bulk.density * vn * vn;
  }
  return { friction_Pa: friction, returns_Pa: returns, nozzles_Pa: nozzles, total_Pa: friction + returns + nozzles, frictionFactor: fd };
}

/** Thermal entrance length, m: laminar `0.05 Re Pr D`, otherwise `10 D` (common practice). */
export function entranceLength(re: number, pr: number, dInner: number): number {
  return re < 2300 ? 0.05 * re * pr * dInner : 10 * dInner;
}
