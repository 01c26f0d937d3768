/**
 * Engineering values for documents, in the reader's unit system: the unit conversion of
 * `shared/thermal/units` with digit grouping ("2,778 lb/h") and sensible precision per kind.
 */
import { formatNumber } from '../../../shared/format';
import { fromSI, type PressureBasis, type QuantityKind, type UnitSystem } from '../../../shared/thermal/units';

export interface ShowOptions {
  pressureBasis?: PressureBasis;
  /** explicit mathjs unit instead of the system's display unit */
  unit?: string;
  /** significant digits (default 3; temperatures use one decimal instead) */
  digits?: number;
}

const decimals = new Map<string, Intl.NumberFormat>();

function numberFormat(key: string, make: () => Intl.NumberFormat): Intl.NumberFormat {
  let f = decimals.get(key);
  if (!f) decimals.set(key, (f = make()));
  return f;
}

/** A number with grouping and `digits` significant digits, e.g. 171,100 or 0.931 (shared/format.ts). */
export { formatNumber };

/** `value` (SI, as the engine keeps it) shown in `system`, e.g. "38 °C", "116 psig", "29.8 kPa". */
export function showQuantity(value: number, kind: QuantityKind, system: UnitSystem, options: ShowOptions = {}): string {
  const d = fromSI(value, kind, options.unit ? { unit: options.unit } : system, { pressureBasis: options.pressureBasis });
  const text =
    kind === 'temperature' && options.digits === undefined
      ? numberFormat('t1', () => new Intl.NumberFormat('en-US', { maximumFractionDigits: 1 })).format(d.value + 0)
      : formatNumber(d.value, options.digits ?? 3);
  return `${text} ${d.label}`;
}
