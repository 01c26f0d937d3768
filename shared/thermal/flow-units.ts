/**
 * The units a stream's flow may be given in (issue 12): mass flows, volume flows at the stream's
 * inlet state, and normal/standard volume flows of gases at a stated reference. Each unit says which
 * request field it fills (`massFlow_kg_s`, `volumeFlow_m3_s` or `standardVolumeFlow_m3_s` with
 * `standardReference`) and its factor to that field's SI unit. The conversion between the three
 * (which needs the fluid's density) is the engine's, in `flow-basis.ts`.
 *
 * Factors: 1 lb = 0.45359237 kg, 1 US gal = 3.785411784 L, 1 ft = 0.3048 m (exact by definition,
 * NIST SP 811, memory).
 */

/** Which request field a flow fills. */
export type FlowBasis = 'mass' | 'volume' | 'standard';
/** The reference state of a normal or standard volume flow (`STANDARD_REFERENCES`). */
export type StandardReference = 'normal' | 'standard';

/**
 * Reference states of gas volume flows: "normal" 0 °C and 101.325 kPa (DIN 1343, the Nm³ of
 * European practice); "standard" 60 °F (15.56 °C) and 14.696 psia (101.325 kPa), the reference of
 * SCFM in US gas practice (memory). Both count the gas dry: humid air's water is added on top.
 */
export const STANDARD_REFERENCES: Record<StandardReference, { temp_C: number; pressure_Pa: number; words: string }> = {
  normal: { temp_C: 0, pressure_Pa: 101_325, words: '0 °C and 101.325 kPa, dry' },
  standard: { temp_C: (60 - 32) / 1.8, pressure_Pa: 101_325, words: '60 °F (15.56 °C) and 14.696 psia, dry' },
};

export const FLOW_FIELDS: Record<FlowBasis, 'massFlow_kg_s' | 'volumeFlow_m3_s' | 'standardVolumeFlow_m3_s'> = {
  mass: 'massFlow_kg_s',
  volume: 'volumeFlow_m3_s',
  standard: 'standardVolumeFlow_m3_s',
};

export interface FlowUnit {
  /** the unit's id in forms (stable, stored in form state) */
  unit: string;
  label: string;
  basis: FlowBasis;
  reference?: StandardReference;
  /** SI value (kg/s or m³/s) of 1 of this unit */
  factor: number;
  system: 'SI' | 'US';
}

const LB = 0.45359237;
const GAL = 3.785411784e-3;
const FT3 = 0.3048 ** 3;

/** The flow menu, mass first, then volume at the inlet, then normal/standard volume. */
export const FLOW_UNITS: readonly FlowUnit[] = [
  { unit: 'kg/s', label: 'kg/s', basis: 'mass', factor: 1, system: 'SI' },
  { unit: 'kg/h', label: 'kg/h', basis: 'mass', factor: 1 / 3600, system: 'SI' },
  { unit: 'lb/h', label: 'lb/h', basis: 'mass', factor: LB / 3600, system: 'US' },
  { unit: 'lb/min', label: 'lb/min', basis: 'mass', factor: LB / 60, system: 'US' },
  { unit: 'lb/s', label: 'lb/s', basis: 'mass', factor: LB, system: 'US' },
  { unit: 'L/min', label: 'L/min', basis: 'volume', factor: 1e-3 / 60, system: 'SI' },
  { unit: 'm^3/h', label: 'm³/h', basis: 'volume', factor: 1 / 3600, system: 'SI' },
  { unit: 'gpm', label: 'US gpm', basis: 'volume', factor: GAL / 60, system: 'US' },
  { unit: 'Nm^3/h', label: 'Nm³/h', basis: 'standard', reference: 'normal', factor: 1 / 3600, system: 'SI' },
  { unit: 'Nm^3/min', label: 'Nm³/min', basis: 'standard', reference: 'normal', factor: 1 / 60, system: 'SI' },
  { unit: 'SCFM', label: 'SCFM', basis: 'standard', reference: 'standard', factor: FT3 / 60, system: 'US' },
];

export function flowUnit(unit: string): FlowUnit | undefined {
  return FLOW_UNITS.find((u) => u.unit === unit);
}

/** The unit of the same basis (and, for standard flows, its usual reference) in the other system. */
export function flowUnitInSystem(unit: string, system: 'SI' | 'US'): string {
  const u = flowUnit(unit);
  if (!u || u.system === system) return unit;
  return { mass: { SI: 'kg/s', US: 'lb/h' }, volume: { SI: 'm^3/h', US: 'gpm' }, standard: { SI: 'Nm^3/h', US: 'SCFM' } }[u.basis][system];
}

/**
 * A value in one flow unit written in another of the same basis. Normal and standard volumes of
 * the same gas scale as an ideal gas, V ∝ T/p (memory); `null` across bases (that needs a density).
 */
export function convertFlow(value: number, from: string, to: string): number | null {
  const a = flowUnit(from);
  const b = flowUnit(to);
  if (!a || !b || a.basis !== b.basis) return null;
  let si = value * a.factor;
  if (a.basis === 'standard' && a.reference !== b.reference) {
    const ra = STANDARD_REFERENCES[a.reference!];
    const rb = STANDARD_REFERENCES[b.reference!];
    si *= ((rb.temp_C + 273.15) / (ra.temp_C + 273.15)) * (ra.pressure_Pa / rb.pressure_Pa);
  }
  return si / b.factor;
}

/** A stream's flow as the request gives it: exactly one of the three fields. */
export interface StreamFlow {
  massFlow_kg_s?: number;
  volumeFlow_m3_s?: number;
  standardVolumeFlow_m3_s?: number;
  standardReference?: StandardReference;
}

/** The request fields a flow in `unit` fills, SI. */
export function flowFields(value: number, unit: string): StreamFlow {
  const u = flowUnit(unit);
  if (!u) throw new Error(`unknown flow unit ${unit}`);
  const si = value * u.factor;
  if (u.basis === 'standard') return { standardVolumeFlow_m3_s: si, standardReference: u.reference };
  return { [FLOW_FIELDS[u.basis]]: si };
}

/** The flow a request gave, in a unit of its own basis (the reverse of `flowFields`), or null when none is given. */
export function flowAsGiven(f: StreamFlow, system: 'SI' | 'US' = 'SI'): { value: number; unit: string; label: string } | null {
  const pick = (si: number, unit: string) => ({ value: si / flowUnit(unit)!.factor, unit, label: flowUnit(unit)!.label });
  // liquids in L/min up to 10,000 L/min, larger flows in m³/h
  if (f.volumeFlow_m3_s !== undefined) return pick(f.volumeFlow_m3_s, system === 'US' ? 'gpm' : f.volumeFlow_m3_s < 1 / 6 ? 'L/min' : 'm^3/h');
  if (f.standardVolumeFlow_m3_s !== undefined) {
    const unit = f.standardReference === 'standard' ? 'SCFM' : 'Nm^3/h';
    return pick(f.standardVolumeFlow_m3_s, unit);
  }
  if (f.massFlow_kg_s !== undefined) return pick(f.massFlow_kg_s, system === 'US' ? 'lb/h' : 'kg/h');
  return null;
}

/** The flow a request gave as text in its own unit, 4 significant digits, e.g. "60 L/min", "1,200 Nm³/h". */
export function flowText(f: StreamFlow, system: 'SI' | 'US' = 'SI'): string {
  const g = flowAsGiven(f, system);
  if (!g) return '–';
  return `${Number(g.value.toPrecision(4)).toLocaleString('en-US', { maximumSignificantDigits: 4 })} ${g.label}`;
}
