/**
 * Quantities typed by people ("500 kg/h", "104 degF", "8 bar(g)", "3/4 in") to SI numbers, and SI
 * numbers back to a chosen unit system for display. Unit arithmetic by a lean mathjs instance (only
 * its Unit type), so the client bundle does not carry the expression parser.
 *
 * SI results: mass flow kg/s, volumetric flow m³/s, temperature °C, temperature difference K,
 * pressure absolute Pa, pressure drop Pa, length m, area m², velocity m/s, fouling m²·K/W, heat-
 * transfer coefficient W/(m²·K), conductivity W/(m·K), power W, density kg/m³, specific heat
 * J/(kg·K), viscosity Pa·s, kinematic viscosity m²/s.
 *
 * Pressure basis: "8 bar(g)", "8 barg", "8 bar g", "120 psig" are gauge (plus the atmosphere,
 * 101 325 Pa unless `atmosphere_Pa` says otherwise); "8 bar(a)", "bara", "psia", "abs" are absolute.
 * A bare "8 bar" is ambiguous and is refused unless the caller passes `pressureBasis` (for instance
 * from a gauge/absolute selector beside the field). A basis written in the text wins over the option.
 * A bare number (no unit) is taken as already SI (absolute Pa for pressure).
 */
import { create, createUnitDependencies, unitDependencies } from 'mathjs';
import type { Unit } from 'mathjs';
import { formatNumber } from '../format';

const math = create({ unitDependencies, createUnitDependencies });
math.createUnit('gpm', '1 gal/minute'); // US gallons per minute
math.createUnit('cP', '0.001 Pa s');
math.createUnit('cSt', '1e-6 m^2/s');

/** Standard atmosphere, Pa (ISO 2533 / CGPM 1954). */
export const STANDARD_ATMOSPHERE_PA = 101325;

export type QuantityKind =
  | 'massFlow' | 'volumetricFlow' | 'temperature' | 'temperatureDifference' | 'pressure' | 'pressureDrop'
  | 'length' | 'area' | 'velocity' | 'fouling' | 'heatTransferCoefficient' | 'conductivity' | 'power'
  | 'density' | 'specificHeat' | 'viscosity' | 'kinematicViscosity';

export type PressureBasis = 'gauge' | 'absolute';
export type UnitSystem = 'SI' | 'US';
export type QuantityInput = string | number | { value: number; unit: string };

export interface ParseOptions {
  /** basis of a pressure written without (g)/(a) */
  pressureBasis?: PressureBasis;
  /** local atmospheric pressure for gauge values, Pa */
  atmosphere_Pa?: number;
  /** request field, copied onto the error */
  field?: string;
}

/** For each kind: its SI unit (mathjs syntax), words for messages, examples, display units. */
const KINDS: Record<QuantityKind, { si: string; words: string; examples: string; SI: string; US: string }> = {
  massFlow: { si: 'kg/s', words: 'a mass flow', examples: 'kg/s, kg/h, lb/h', SI: 'kg/h', US: 'lb/h' },
  volumetricFlow: { si: 'm^3/s', words: 'a volumetric flow', examples: 'm^3/h, l/min, gpm', SI: 'm^3/h', US: 'gpm' },
  temperature: { si: 'degC', words: 'a temperature', examples: 'degC, degF, K', SI: 'degC', US: 'degF' },
  temperatureDifference: { si: 'K', words: 'a temperature difference', examples: 'K, degC, degF', SI: 'K', US: 'degF' },
  pressure: { si: 'Pa', words: 'a pressure', examples: 'bar(g), bar(a), psig, kPa(a)', SI: 'bar', US: 'psi' },
  pressureDrop: { si: 'Pa', words: 'a pressure drop', examples: 'kPa, bar, psi', SI: 'kPa', US: 'psi' },
  length: { si: 'm', words: 'a length', examples: 'mm, m, in, ft', SI: 'mm', US: 'in' },
  area: { si: 'm^2', words: 'an area', examples: 'm^2, ft^2', SI: 'm^2', US: 'ft^2' },
  velocity: { si: 'm/s', words: 'a velocity', examples: 'm/s, ft/s', SI: 'm/s', US: 'ft/s' },
  fouling: { si: 'm^2 K/W', words: 'a fouling resistance', examples: 'm^2 K/W, h ft^2 degF/BTU', SI: 'm^2 K/W', US: 'h ft^2 degF/BTU' },
  heatTransferCoefficient: { si: 'W/(m^2 K)', words: 'a heat-transfer coefficient', examples: 'W/(m^2 K), BTU/(h ft^2 degF)', SI: 'W/(m^2 K)', US: 'BTU/(h ft^2 degF)' },
  conductivity: { si: 'W/(m K)', words: 'a thermal conductivity', examples: 'W/(m K), BTU/(h ft degF)', SI: 'W/(m K)', US: 'BTU/(h ft degF)' },
  power: { si: 'W', words: 'a heat duty or power', examples: 'kW, W, BTU/h', SI: 'kW', US: 'BTU/h' },
  density: { si: 'kg/m^3', words: 'a density', examples: 'kg/m^3, lb/ft^3', SI: 'kg/m^3', US: 'lb/ft^3' },
  specificHeat: { si: 'J/(kg K)', words: 'a specific heat', examples: 'J/(kg K), kJ/(kg K), BTU/(lb degF)', SI: 'kJ/(kg K)', US: 'BTU/(lb degF)' },
  viscosity: { si: 'Pa s', words: 'a dynamic viscosity', examples: 'Pa s, mPa s, cP', SI: 'mPa s', US: 'cP' },
  kinematicViscosity: { si: 'm^2/s', words: 'a kinematic viscosity', examples: 'mm^2/s, cSt', SI: 'mm^2/s', US: 'cSt' },
};

/** Error for a quantity that cannot be read as the expected kind. */
export class UnitInputError extends Error {
  readonly code: 'unit-syntax' | 'unit-kind' | 'pressure-basis' | 'unit-range';
  readonly kind: QuantityKind;
  readonly field?: string;
  constructor(code: UnitInputError['code'], kind: QuantityKind, message: string, field?: string) {
    super(message);
    this.name = 'UnitInputError';
    this.code = code;
    this.kind = kind;
    this.field = field;
  }
}

const NUMBER =
  /^\s*([+-]?)(?:(\d+)[\s-]+(\d+)\s*\/\s*(\d+)|(\d+)\s*\/\s*(\d+)|((?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?))\s*(.*)$/;
const PRESSURE_BASES: Record<string, string> = { bar: 'bar', mbar: 'mbar', psi: 'psi', kpa: 'kPa', mpa: 'MPa', pa: 'Pa' };
const BASIS_WORD: Record<string, PressureBasis> = { g: 'gauge', gauge: 'gauge', a: 'absolute', abs: 'absolute', absolute: 'absolute' };

/** Typographic forms to mathjs syntax: °C → degC, m³ → m^3, m2 → m^2, µ → u, · → space. */
function normaliseUnitText(text: string): string {
  return text
    .replace(/[°º]\s*C\b|℃/g, 'degC')
    .replace(/[°º]\s*F\b|℉/g, 'degF')
    .replace(/³/g, '^3')
    .replace(/²/g, '^2')
    .replace(/[µμ]/g, 'u')
    .replace(/[·⋅]/g, ' ')
    .replace(/\bGPM\b/g, 'gpm')
    .replace(/([a-zA-Z])([23])(?![\d^])/g, '$1^$2 ')
    .replace(/\s+/g, ' ')
    .trim();
}

/** Splits a gauge/absolute mark off a pressure unit: "bar(g)", "barg", "psi abs" … */
function splitBasis(unitText: string): { unit: string; basis?: PressureBasis } {
  const marked = /^(.*?)\s*(?:\(\s*(g|a|gauge|abs|absolute)\s*\)|\s(g|a|gauge|abs|absolute))$/i.exec(unitText);
  if (marked) return { unit: marked[1], basis: BASIS_WORD[(marked[2] ?? marked[3]).toLowerCase()] };
  const joined = /^(bar|mbar|psi|kpa|mpa|pa)(g|a)$/i.exec(unitText);
  if (joined) return { unit: PRESSURE_BASES[joined[1].toLowerCase()], basis: BASIS_WORD[joined[2].toLowerCase()] };
  return { unit: unitText };
}

function describe(input: QuantityInput): string {
  return typeof input === 'object' ? `${input.value} ${input.unit}` : String(input);
}

/** Reads `input` as a quantity of `kind` and returns its SI value (see the file comment). */
export function toSI(input: QuantityInput, kind: QuantityKind, options: ParseOptions = {}): number {
  const k = KINDS[kind];
  const shown = describe(input);
  const fail = (code: UnitInputError['code'], why: string): never => {
    throw new UnitInputError(code, kind, `'${shown}' ${why}`, options.field);
  };
  if (typeof input === 'number') {
    if (!Number.isFinite(input)) fail('unit-syntax', `is not a number; expected ${k.words}.`);
    return checkRange(input as number, kind, fail);
  }
  let value: number;
  let unitText: string;
  if (typeof input === 'object' && input !== null) {
    value = input.value;
    unitText = input.unit ?? '';
    if (!Number.isFinite(value)) fail('unit-syntax', `is not a number; expected ${k.words} such as '500 kg/h'.`);
  } else {
    const m = NUMBER.exec(String(input));
    if (!m) return fail('unit-syntax', `does not start with a number; expected ${k.words} such as '${exampleOf(kind)}'.`);
    const sign = m[1] === '-' ? -1 : 1;
    if (m[2] !== undefined) value = sign * (Number(m[2]) + Number(m[3]) / Number(m[4]));
    else if (m[5] !== undefined) value = (sign * Number(m[5])) / Number(m[6]);
    else value = sign * Number(m[7]);
    unitText = m[8];
    if (!Number.isFinite(value)) fail('unit-syntax', 'is not a finite number.');
  }
  let text = normaliseUnitText(unitText);
  let basis: PressureBasis | undefined;
  if (kind === 'pressure' || kind === 'pressureDrop') {
    const split = splitBasis(text);
    text = split.unit;
    basis = split.basis;
    if (kind === 'pressureDrop' && basis) {
      fail('pressure-basis', 'is a pressure drop, a difference: write it without (g)/(a), e.g. "0.3 bar".');
    }
  }
  if (text === '') return fail('unit-syntax', `has no unit; expected ${k.words} (${k.examples}).`);
  let unit: Unit;
  try {
    unit = math.unit(value, text);
  } catch {
    return fail('unit-syntax', `has a unit mathjs does not know ('${text}'); expected ${k.words} (${k.examples}).`);
  }
  if (!unit.equalBase(math.unit(1, k.si))) fail('unit-kind', `is not ${k.words} (expected units like ${k.examples}).`);
  let si: number;
  if (kind === 'temperatureDifference') {
    const scale = { K: 1, degC: 1, celsius: 1, degF: 5 / 9, degR: 5 / 9, R: 5 / 9, fahrenheit: 5 / 9 }[text];
    if (scale === undefined) fail('unit-syntax', 'must be in K, degC or degF.');
    si = value * (scale as number);
  } else {
    si = unit.toNumber(k.si);
  }
  if (kind === 'pressure') {
    const b = basis ?? options.pressureBasis;
    if (!b) {
      fail('pressure-basis', `does not say whether it is gauge or absolute: write e.g. '${value} ${text}(g)' or '${value} ${text}(a)'.`);
    }
    if (b === 'gauge') si += options.atmosphere_Pa ?? STANDARD_ATMOSPHERE_PA;
  }
  return checkRange(si, kind, fail);
}

function checkRange(si: number, kind: QuantityKind, fail: (c: UnitInputError['code'], why: string) => never): number {
  if (kind === 'temperature' && si < -273.15) fail('unit-range', 'is below absolute zero.');
  if (kind === 'pressure' && si <= 0) fail('unit-range', 'is at or below a perfect vacuum (absolute pressure ≤ 0).');
  return si;
}

function exampleOf(kind: QuantityKind): string {
  return `1 ${KINDS[kind].examples.split(',')[0]}`;
}

/** Display labels for the mathjs unit strings used by the display systems. */
const LABELS: Record<string, string> = {
  degC: '°C', degF: '°F', 'm^3/h': 'm³/h', 'm^2': 'm²', 'ft^2': 'ft²', 'm^2 K/W': 'm²·K/W',
  'h ft^2 degF/BTU': 'h·ft²·°F/Btu', 'W/(m^2 K)': 'W/(m²·K)', 'BTU/(h ft^2 degF)': 'Btu/(h·ft²·°F)',
  'W/(m K)': 'W/(m·K)', 'BTU/(h ft degF)': 'Btu/(h·ft·°F)', 'BTU/h': 'Btu/h', 'kg/m^3': 'kg/m³',
  'lb/ft^3': 'lb/ft³', 'kJ/(kg K)': 'kJ/(kg·K)', 'BTU/(lb degF)': 'Btu/(lb·°F)', 'mPa s': 'mPa·s', 'mm^2/s': 'mm²/s',
};

export interface DisplayQuantity {
  value: number;
  /** mathjs unit string, parseable again by `toSI` */
  unit: string;
  /** typographic label, e.g. "m³/h", "bar(g)" */
  label: string;
}

/**
 * Converts an SI value of `kind` to the display unit of `system` (or to an explicit mathjs unit).
 * Pressures are shown absolute unless `pressureBasis: 'gauge'`.
 */
export function fromSI(
  value: number,
  kind: QuantityKind,
  system: UnitSystem | { unit: string } = 'SI',
  options: { pressureBasis?: PressureBasis; atmosphere_Pa?: number } = {},
): DisplayQuantity {
  const k = KINDS[kind];
  const target = typeof system === 'object' ? system.unit : k[system];
  let v = value;
  if (kind === 'pressure' && options.pressureBasis === 'gauge') v -= options.atmosphere_Pa ?? STANDARD_ATMOSPHERE_PA;
  const out =
    kind === 'temperatureDifference'
      ? v * (target === 'degF' || target === 'degR' ? 9 / 5 : 1)
      : math.unit(v, k.si).toNumber(target);
  let label = LABELS[target] ?? target;
  if (kind === 'pressure') {
    const gauge = options.pressureBasis === 'gauge';
    label = target === 'psi' ? (gauge ? 'psig' : 'psia') : `${label}(${gauge ? 'g' : 'a'})`;
  }
  return { value: out, unit: target, label };
}

/** `fromSI` as text with `digits` significant digits and digit grouping, e.g. "104 °F", "8 bar(g)", "7,937 lb/h". */
export function formatQuantity(
  value: number,
  kind: QuantityKind,
  system: UnitSystem | { unit: string } = 'SI',
  options: { pressureBasis?: PressureBasis; atmosphere_Pa?: number; digits?: number } = {},
): string {
  const d = fromSI(value, kind, system, options);
  return `${formatNumber(d.value, options.digits ?? 4)} ${d.label}`;
}
