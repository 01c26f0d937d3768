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

export type { PressureBasis, QuantityKind, UnitSystem };

/** One quantity as a person typed it: a number (null while empty) in a unit (mathjs syntax). */
export interface Quantity {
  kind: QuantityKind;
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

export function unitLabel(kind: QuantityKind, unit: string): string {
  if (kind === 'pressure') return PRESSURE_LABELS[unit] ?? unit;
  return fromSI(0, kind, { unit }).label;
}

export type UnitOption = { label: string; value: string };

/** The unit choices of a field, SI first, then US customary, as select options. */
export function unitOptions(kind: QuantityKind): UnitOption[] {
  const units = UNITS[kind];
  if (!units) return [];
  return [...units.SI, ...units.US].map((value) => ({ label: unitLabel(kind, value), value }));
}

export function systemOfUnit(kind: QuantityKind, unit: string): UnitSystem {
  return UNITS[kind]?.US.includes(unit) ? 'US' : 'SI';
}

/** A quantity in the given unit, or in the default unit of the given system. */
export function quantity(kind: QuantityKind, value: number | null, unit: string, basis?: PressureBasis): Quantity {
  return basis ? { kind, value, unit, basis } : { kind, value, unit };
}

/** The SI value (pressures absolute); throws `UnitInputError` when it cannot be read. */
export function quantityToSI(q: Quantity): number {
  if (q.value === null) throw new Error('empty quantity');
  return toSI({ value: q.value, unit: q.unit }, q.kind, { pressureBasis: q.basis });
}

/** Five significant digits: enough for an engineer, short enough to read after a conversion. */
function tidy(value: number): number {
  return Number(value.toPrecision(5)) + 0;
}

/** The same quantity written in another unit (the number is converted, the quantity kept). */
export function inUnit(q: Quantity, unit: string): Quantity {
  if (unit === q.unit) return q;
  if (q.value === null) return { ...q, unit };
  try {
    const si = quantityToSI(q);
    return { ...q, unit, value: tidy(fromSI(si, q.kind, { unit }, { pressureBasis: q.basis }).value) };
  } catch {
    return { ...q, unit };
  }
}

/** The same quantity in the default unit of `system` (unchanged when its unit already belongs to it). */
export function inSystem(q: Quantity, system: UnitSystem): Quantity {
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
