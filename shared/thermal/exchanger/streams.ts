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
import { massFlowOf } from '../flow-basis';
import type { StreamFlow } from '../flow-units';
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
    // 4 significant digits and kg/h (the SI unit of forms): never "-0.001388888888888889 kg/s"
    const shown = Number((value * 3600).toPrecision(4));
    throw new ThermalInputError('flow-not-positive', `The mass flow must be above zero (got ${shown} kg/h): with no flow there is nothing to cool or to cool with.`, field);
  }
}

/**
 * Re-throws a fluid's ThermalInputError with the request field it belongs to: a state outside the
 * fluid's data at the stream's inlet temperature blames that temperature (issue 12: an absurd inlet
 * temperature is not the fluid's fault); at other temperatures of the stream, the fluid.
 */
function tagged(field: string, inletTemp_C: number, f: (t: number) => FluidProperties) {
  return (temp_C: number): FluidProperties => {
    try {
      return f(temp_C);
    } catch (e) {
      if (e instanceof ThermalInputError && !e.field) {
        throw new ThermalInputError(e.code, e.message, temp_C === inletTemp_C ? `${field}.inletTemp_C` : `${field}.fluid`);
      }
      throw e;
    }
  };
}

export function resolveFluid(ref: FluidRef, field: string): Fluid {
  if (typeof ref === 'string') return getFluid(ref, `${field}.fluid`);
  return constantFluid(ref.constant, `${field}.fluid.constant`);
}

/** A stream as a request gives it: its flow as exactly one of mass, volume or normal/standard volume (`flow-basis.ts`). */
export interface StreamInput extends StreamFlow {
  fluid: FluidRef;
  pressure_Pa: number;
  inletTemp_C: number;
  intake?: { temp_C: number; relativeHumidity: number; pressure_Pa: number };
}

/** Resolves a request's stream; a volume or normal/standard volume flow becomes its mass flow here (`massFlowOf`). */
export function resolveStream(s: StreamInput, field: string): Stream {
  if (s.massFlow_kg_s !== undefined) requirePositiveFlow(s.massFlow_kg_s, `${field}.massFlow_kg_s`);
  requireFinite(s.inletTemp_C, `${field}.inletTemp_C`, 'The inlet temperature');
  requireFinite(s.pressure_Pa, `${field}.pressure_Pa`, 'The pressure');
  const fluid = resolveFluid(s.fluid, field);
  const p = s.pressure_Pa;
  const tIn = s.inletTemp_C;
  const aqueous = fluid.id === 'water' || fluid.id.includes('glycol');
  if (fluid.id === 'air-moist' && s.intake) {
    const w = humidityRatioFromIntake(s.intake);
    const properties = memoProperties(tagged(field, tIn, (t) => moistAirProperties(t, p, w)));
    const massFlow_kg_s = massFlowOf(s, { ...fluid, properties: (t) => properties(t) }, field, w);
    return { fluid, field, pressure_Pa: p, massFlow_kg_s, inletTemp_C: tIn, aqueous, humidityRatio: w, properties };
  }
  const properties = memoProperties(tagged(field, tIn, (t) => fluid.properties(t, p)));
  const massFlow_kg_s = massFlowOf(s, fluid, field);
  return { fluid, field, pressure_Pa: p, massFlow_kg_s, inletTemp_C: tIn, aqueous, properties };
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
