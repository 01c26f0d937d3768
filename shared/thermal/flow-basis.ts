/**
 * The one place a stream's volume flow becomes a mass flow (issue 12). A request gives each stream
 * exactly one of `massFlow_kg_s`, `volumeFlow_m3_s` (at the stream's inlet temperature and
 * pressure) or `standardVolumeFlow_m3_s` with `standardReference` (normal or standard, dry; see
 * `STANDARD_REFERENCES`). The engine resolves every stream through here (`resolveStream`), so it
 * works in kg/s while a stored duty keeps what the user gave.
 *
 *   ṁ = ρ(T_in, p) · V̇                     volume at the inlet state
 *   ṁ = ρ_dry(T_ref, p_ref) · V̇_ref · (1 + W)   normal/standard volume (W: humid air's humidity ratio)
 */
import { LIMITS } from '../schemas/thermal';
import { ThermalInputError } from './errors';
import { air, type Fluid } from './fluids';
import { STANDARD_REFERENCES, type StreamFlow } from './flow-units';

export interface FlowState extends StreamFlow {
  inletTemp_C: number;
  pressure_Pa: number;
}

function density(fluid: Fluid, temp_C: number, pressure_Pa: number, field: string, where: string): number {
  try {
    return fluid.properties(temp_C, pressure_Pa).density;
  } catch (e) {
    if (e instanceof ThermalInputError) {
      throw new ThermalInputError(e.code, `The flow cannot be turned into a mass flow: ${fluid.name} has no density ${where}. ${e.message}`, field);
    }
    throw e;
  }
}

function readable(x: number): string {
  return Number(x.toPrecision(4)).toLocaleString('en-US', { maximumSignificantDigits: 4 });
}

/**
 * The stream's mass flow, kg/s, from whichever flow it gives. `field` is the stream's request path
 * (`process`, `boundary`); `humidityRatio` is humid air's water per kg dry air.
 */
export function massFlowOf(s: FlowState, fluid: Fluid, field: string, humidityRatio = 0): number {
  if (s.massFlow_kg_s !== undefined) return s.massFlow_kg_s;
  let mass: number;
  let from: string;
  if (s.volumeFlow_m3_s !== undefined) {
    from = `${field}.volumeFlow_m3_s`;
    if (!(s.volumeFlow_m3_s > 0)) {
      throw new ThermalInputError('flow-not-positive', `The volume flow must be above zero (got ${readable(s.volumeFlow_m3_s * 3600)} m³/h): with no flow there is nothing to cool or to cool with.`, from);
    }
    // humid air: the property function of the stream itself, so the density counts its water
    mass = s.volumeFlow_m3_s * density(fluid, s.inletTemp_C, s.pressure_Pa, `${field}.inletTemp_C`, 'at the inlet state');
  } else if (s.standardVolumeFlow_m3_s !== undefined) {
    from = `${field}.standardVolumeFlow_m3_s`;
    if (!(s.standardVolumeFlow_m3_s > 0)) {
      throw new ThermalInputError('flow-not-positive', `The standard volume flow must be above zero (got ${readable(s.standardVolumeFlow_m3_s * 3600)} m³/h at the reference): with no flow there is nothing to cool or to cool with.`, from);
    }
    const ref = STANDARD_REFERENCES[s.standardReference ?? 'normal'];
    const dry = fluid.id === 'air-moist' ? air : fluid;
    mass = s.standardVolumeFlow_m3_s * density(dry, ref.temp_C, ref.pressure_Pa, `${field}.standardReference`, `at the reference state (${ref.words})`) * (1 + humidityRatio);
  } else {
    throw new ThermalInputError('flow-missing', 'Give the flow: a mass flow, a volume flow or a normal/standard volume flow.', `${field}.massFlow_kg_s`);
  }
  const max = LIMITS.massFlow_kg_s[1];
  if (mass > max) {
    throw new ThermalInputError('flow-too-large', `That flow is ${readable(mass)} kg/s of ${fluid.name}, above the ${max} kg/s this engine sizes.`, from);
  }
  return mass;
}
