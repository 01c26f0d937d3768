/**
 * Quantity fields with a unit of their own (SI or US customary per field) and one page-wide SI/US
 * toggle. Every conversion goes through `@shared/thermal/units`, the same code the server uses, so
 * "what you typed" and "what was sized" cannot drift apart.
 */
import {
  fromSI,
  toSI,
  type PressureBasis,
  type QuantityKind,
  type UnitSystem,
} from '@shared/thermal/units';
import { convertFlow, flowAsGiven, FLOW_UNITS, flowUnit, flowUnitInSystem, type StreamFlow } from '@shared/thermal/flow-units';

export type { PressureBasis, QuantityKind, UnitSystem };

/**
 * A field's kind: a unit kind of `@shared/thermal/units`, or `flow`, a stream's flow whose unit
 * menu holds mass, volume and normal/standard volume units (`@shared/thermal/flow-units`); the unit
 * chosen decides which request field the number fills.
 */
export type FieldKind = QuantityKind | 'flow';

/** One quantity as a person typed it: a number (null while empty) in a unit (mathjs syntax). */
export interface Quantity {
  kind: FieldKind;
  value: number | null;
  unit: string;
  /** pressures only: whether the number is gauge or absolute */
  basis?: PressureBasis;
}

/** The units offered per kind; the first of each system is what the global toggle switches to. */
const UNITS: Partial<Record<QuantityKind, Record<UnitSystem, string[]>>> = {
  massFlow: { SI: ['kg/s', 'kg/h'], US: ['lb/h', 'lb/min', 'lb/s'] },
  temperature: { SI: ['degC', 'K'], US: ['degF'] },
  pressure: { SI: ['bar', 'kPa', 'MPa'], US: ['psi'] },
  pressureDrop: { SI: ['kPa', 'bar'], US: ['psi'] },
  length: { SI: ['m', 'mm'], US: ['ft', 'in'] },
  fouling: { SI: ['m^2 K/W'], US: ['h ft^2 degF/BTU'] },
  density: { SI: ['kg/m^3'], US: ['lb/ft^3'] },
  specificHeat: { SI: ['kJ/(kg K)', 'J/(kg K)'], US: ['BTU/(lb degF)'] },
  viscosity: { SI: ['mPa s', 'Pa s'], US: ['cP', 'lb/(ft h)'] },
  conductivity: { SI: ['W/(m K)'], US: ['BTU/(h ft degF)'] },
};

/** Plain unit names for pressure (the gauge/absolute mark is a separate choice beside the field). */
const PRESSURE_LABELS: Record<string, string> = { bar: 'bar', kPa: 'kPa', MPa: 'MPa', psi: 'psi' };

export function unitLabel(kind: FieldKind, unit: string): string {
  if (kind === 'flow') return flowUnit(unit)?.label ?? unit;
  if (kind === 'pressure') return PRESSURE_LABELS[unit] ?? unit;
  return fromSI(0, kind as QuantityKind, { unit }).label;
}

export type UnitOption = { label: string; value: string };

/** The unit choices of a field, SI first, then US customary, as select options. */
export function unitOptions(kind: FieldKind): UnitOption[] {
  if (kind === 'flow') return FLOW_UNITS.map((u) => ({ label: u.label, value: u.unit }));
  const units = UNITS[kind];
  if (!units) return [];
  return [...units.SI, ...units.US].map((value) => ({ label: unitLabel(kind, value), value }));
}

export function systemOfUnit(kind: FieldKind, unit: string): UnitSystem {
  if (kind === 'flow') return flowUnit(unit)?.system ?? 'SI';
  return UNITS[kind]?.US.includes(unit) ? 'US' : 'SI';
}

/** A quantity in the given unit, or in the default unit of the given system. */
export function quantity(kind: FieldKind, value: number | null, unit: string, basis?: PressureBasis): Quantity {
  return basis ? { kind, value, unit, basis } : { kind, value, unit };
}

/** A stream's flow field from a request's flow (what the user gave: mass in kg/s, a volume in its own unit). */
export function flowQuantity(f: StreamFlow): Quantity {
  if (f.massFlow_kg_s !== undefined) return quantity('flow', f.massFlow_kg_s, 'kg/s');
  const g = flowAsGiven(f);
  return g ? quantity('flow', tidy(g.value), g.unit) : quantity('flow', null, 'kg/s');
}

/** The SI value (pressures absolute); throws `UnitInputError` when it cannot be read. */
export function quantityToSI(q: Quantity): number {
  if (q.value === null) throw new Error('empty quantity');
  if (q.kind === 'flow') return q.value * (flowUnit(q.unit)?.factor ?? Number.NaN);
  return toSI({ value: q.value, unit: q.unit }, q.kind as QuantityKind, { pressureBasis: q.basis });
}

/** Five significant digits: enough for an engineer, short enough to read after a conversion. */
export function tidy(value: number): number {
  return Number(value.toPrecision(5)) + 0;
}

/** The same quantity written in another unit (the number is converted, the quantity kept). */
export function inUnit(q: Quantity, unit: string): Quantity {
  if (unit === q.unit) return q;
  if (q.value === null) return { ...q, unit };
  if (q.kind === 'flow') {
    // across mass and volume it takes the fluid's density: the form converts those (`flowInUnit`), here the number is cleared
    const v = convertFlow(q.value, q.unit, unit);
    return { ...q, unit, value: v === null ? null : tidy(v) };
  }
  try {
    const si = quantityToSI(q);
    return { ...q, unit, value: tidy(fromSI(si, q.kind as QuantityKind, { unit }, { pressureBasis: q.basis }).value) };
  } catch {
    return { ...q, unit };
  }
}

/** The same quantity in the default unit of `system` (unchanged when its unit already belongs to it). */
export function inSystem(q: Quantity, system: UnitSystem): Quantity {
  if (q.kind === 'flow') return inUnit(q, flowUnitInSystem(q.unit, system));
  const units = UNITS[q.kind];
  if (!units || systemOfUnit(q.kind, q.unit) === system) return q;
  return inUnit(q, units[system][0]!);
}

function isQuantity(value: unknown): value is Quantity {
  return typeof value === 'object' && value !== null && 'kind' in value && 'unit' in value && 'value' in value;
}

/** Converts, in place, every quantity found in a (reactive) form to the default units of `system`. */
export function switchSystem(tree: Record<string, unknown>, system: UnitSystem): void {
  for (const [key, value] of Object.entries(tree)) {
    if (isQuantity(value)) tree[key] = inSystem(value, system);
    else if (typeof value === 'object' && value !== null && !Array.isArray(value)) {
      switchSystem(value as Record<string, unknown>, system);
    }
  }
}
