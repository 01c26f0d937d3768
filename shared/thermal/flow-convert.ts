/**
 * A stream's flow written in another flow unit, across bases (mass ↔ volume ↔ normal/standard
 * volume) through the fluid's density, as `flow-basis.ts` defines it: what a flow field shows when
 * its unit menu moves from kg/s to L/min. `null` when the stream cannot be resolved yet.
 */
import { resolveStream, type StreamInput } from './exchanger/streams';
import { ThermalInputError } from './errors';
import { air } from './fluids';
import { flowFields, flowUnit, STANDARD_REFERENCES } from './flow-units';

export function flowInUnit(stream: Omit<StreamInput, 'massFlow_kg_s' | 'volumeFlow_m3_s' | 'standardVolumeFlow_m3_s' | 'standardReference'>, value: number, from: string, to: string): number | null {
  const target = flowUnit(to);
  if (!target || !flowUnit(from)) return null;
  try {
    const s = resolveStream({ ...stream, ...flowFields(value, from) }, 'flow');
    const mass = s.massFlow_kg_s;
    if (target.basis === 'mass') return mass / target.factor;
    if (target.basis === 'volume') return mass / s.properties(s.inletTemp_C).density / target.factor;
    const ref = STANDARD_REFERENCES[target.reference!];
    const dry = s.fluid.id === 'air-moist' ? air : s.fluid;
    return mass / (1 + (s.humidityRatio ?? 0)) / dry.properties(ref.temp_C, ref.pressure_Pa).density / target.factor;
  } catch (e) {
    if (e instanceof ThermalInputError) return null;
    throw e;
  }
}
