/**
 * A stream resolved from a request: its fluid, pressure and flow, and a property function that
 * names the request field when the state is outside the fluid's data. Humid air (`air-moist` with
 * an intake) carries its humidity ratio so the rating can count condensate and latent heat.
 */
import { ThermalInputError } from '../errors';
import {
  constantFluid,
  getFluid,
  humidityRatioFromIntake,
  latentHeatOfCondensation,
  moistAirProperties,
  saturationHumidityRatio,
  type Fluid,
  type FluidProperties,
} from '../fluids';
import type { FluidRef } from '../../schemas/thermal';
import { memoProperties } from './solve';

export interface Stream {
  fluid: Fluid;
  /** dotted request path of this stream, e.g. `process` */
  field: string;
  pressure_Pa: number;
  massFlow_kg_s: number;
  inletTemp_C: number;
  /** water and glycol solutions: the brief's water velocity window applies */
  aqueous: boolean;
  /** humidity ratio at the inlet, kg water / kg dry air (humid air only) */
  humidityRatio?: number;
  /** remembers recent states (`memoProperties`): callers may ask again rather than carry results */
  properties: (temp_C: number) => FluidProperties;
}

export function requireFinite(value: number, field: string, what: string): void {
  if (!Number.isFinite(value)) throw new ThermalInputError('not-finite', `${what} must be a finite number (got ${value}).`, field);
}

export function requirePositiveFlow(value: number, field: string): void {
  requireFinite(value, field, 'The mass flow');
  if (!(value > 0)) {
    throw new ThermalInputError('flow-not-positive', `The mass flow must be above zero (got ${value} kg/s): with no flow there is nothing to cool or to cool with.`, field);
  }
}

/** Re-throws a fluid's ThermalInputError with the request field it belongs to. */
function tagged(field: string, f: (t: number) => FluidProperties) {
  return (temp_C: number): FluidProperties => {
    try {
      return f(temp_C);
    } catch (e) {
      if (e instanceof ThermalInputError && !e.field) throw new ThermalInputError(e.code, e.message, `${field}.fluid`);
      throw e;
    }
  };
}

export function resolveFluid(ref: FluidRef, field: string): Fluid {
  if (typeof ref === 'string') return getFluid(ref, `${field}.fluid`);
  return constantFluid(ref.constant, `${field}.fluid.constant`);
}

export interface StreamInput {
  fluid: FluidRef;
  pressure_Pa: number;
  massFlow_kg_s: number;
  inletTemp_C: number;
  intake?: { temp_C: number; relativeHumidity: number; pressure_Pa: number };
}

export function resolveStream(s: StreamInput, field: string): Stream {
  requirePositiveFlow(s.massFlow_kg_s, `${field}.massFlow_kg_s`);
  requireFinite(s.inletTemp_C, `${field}.inletTemp_C`, 'The inlet temperature');
  requireFinite(s.pressure_Pa, `${field}.pressure_Pa`, 'The pressure');
  const fluid = resolveFluid(s.fluid, field);
  const p = s.pressure_Pa;
  const aqueous = fluid.id === 'water' || fluid.id.includes('glycol');
  if (fluid.id === 'air-moist' && s.intake) {
    const w = humidityRatioFromIntake(s.intake);
    return {
      fluid, field, pressure_Pa: p, massFlow_kg_s: s.massFlow_kg_s, inletTemp_C: s.inletTemp_C, aqueous, humidityRatio: w,
      properties: memoProperties(tagged(field, (t) => moistAirProperties(t, p, w))),
    };
  }
  return {
    fluid, field, pressure_Pa: p, massFlow_kg_s: s.massFlow_kg_s, inletTemp_C: s.inletTemp_C, aqueous,
    properties: memoProperties(tagged(field, (t) => fluid.properties(t, p))),
  };
}

/**
 * Condensate from humid air cooled to `outletTemp_C`, kg/s, and its latent heat, W:
 * dry-air flow × (W_in − W_sat(T_out, p)) (domain brief 2.6), latent heat at the outlet temperature.
 * The mass flow is the humid-air flow entering, so the dry-air flow is ṁ/(1 + W_in).
 */
export function condensation(s: Stream, outletTemp_C: number): { condensate_kg_s: number; latent_W: number } {
  const w = s.humidityRatio;
  if (w === undefined) return { condensate_kg_s: 0, latent_W: 0 };
  const wSat = saturationHumidityRatio(outletTemp_C, s.pressure_Pa);
  const dw = w - wSat;
  if (!(dw > 0)) return { condensate_kg_s: 0, latent_W: 0 };
  const condensate = (s.massFlow_kg_s / (1 + w)) * dw;
  return { condensate_kg_s: condensate, latent_W: condensate * latentHeatOfCondensation(Math.max(0, Math.min(150, outletTemp_C))) };
}

/** Tries the property call; `null` when the state is outside the fluid's data (wall estimates). */
export function propertiesOrNull(s: Stream, temp_C: number): FluidProperties | null {
  try {
    return s.properties(temp_C);
  } catch {
    return null;
  }
}
