/** Thermophysical properties of a fluid at one state, all SI. */
export interface FluidProperties {
  /** kg/m³ */
  density: number;
  /** J/(kg·K) */
  specificHeat: number;
  /** dynamic viscosity, Pa·s */
  viscosity: number;
  /** thermal conductivity, W/(m·K) */
  conductivity: number;
  /** cp·μ/k, dimensionless */
  prandtl: number;
}

export type FluidPhase = 'liquid' | 'gas';

/** What `GET /api/fluids` lists for each fluid. */
export interface FluidInfo {
  /** stable slug, e.g. `water`, `oil-vg46` */
  id: string;
  name: string;
  phase: FluidPhase;
  minTemp_C: number;
  maxTemp_C: number;
  /** where the property data come from (authors, title, year) */
  source: string;
}

export interface Fluid extends FluidInfo {
  /**
   * Properties at `temp_C` and absolute `pressure_Pa`.
   * Throws `ThermalInputError` (code `fluid-range`, `fluid-frozen`, `fluid-boiling`, …) when the state
   * is outside the fluid's data or not a single-phase state of this fluid.
   */
  properties(temp_C: number, pressure_Pa: number): FluidProperties;
  /**
   * Why this state cannot be computed, in words for the engineer, or `null` when it can.
   * `properties` throws exactly when this returns a reason.
   */
  stateProblem(temp_C: number, pressure_Pa: number): string | null;
}
