/**
 * Messages under a quantity field in the unit the user chose (issue 12): the schema's bounds and the
 * engine's explanations state SI numbers ("between -1000 and 1000 kg/s", "got -5 kg/h", "500 °C is
 * outside …"); here every number written in a unit of the field's kind is rewritten in the field's
 * unit with four significant digits and digit grouping, e.g. "between -7,937,000 and 7,937,000 lb/h".
 */
import { fromSI, toSI, type QuantityKind } from '@shared/thermal/units';
import { flowUnit } from '@shared/thermal/flow-units';
import { unitLabel, type Quantity } from './use-units';

const NUM = String.raw`(-?\d[\d,]*(?:\.\d+)?(?:e[+-]?\d+)?)`;

/** How messages write SI units, per kind (as regular-expression text), and the unit each stands for. */
const UNIT_TEXT: Partial<Record<Quantity['kind'], [string, string][]>> = {
  temperature: [['°C', 'degC']],
  pressure: [
    ['Pa \\(absolute\\)', 'Pa'],
    ['bar\\(a\\)', 'bar'],
  ],
  pressureDrop: [['Pa\\b', 'Pa']],
  length: [['m\\b(?![²³/])', 'm']],
  flow: [
    ['kg/s', 'kg/s'],
    ['kg/h', 'kg/h'],
    ['m³/s', 'm^3/s'],
    ['m³/h', 'm^3/h'],
  ],
};

/** Per kind: a range written with its unit once ("between -100 and 600 °C", "above 0 and at most 12 m"), then single numbers. */
const WRITTEN: Partial<Record<Quantity['kind'], [RegExp, RegExp, string][]>> = Object.fromEntries(
  Object.entries(UNIT_TEXT).map(([kind, list]) => [
    kind,
    list!.map(([text, unit]) => [new RegExp(`${NUM}(\\s+(?:and at most|and|to)\\s+)${NUM}\\s*${text}`, 'g'), new RegExp(`${NUM}\\s*${text}`, 'g'), unit]),
  ]),
);

function shown(x: number): string {
  return (Number(x.toPrecision(4)) + 0).toLocaleString('en-US', { maximumSignificantDigits: 4 });
}

/** One number of a message, written in `unit` of the message, in the field's unit; null when it cannot be converted. */
function convert(value: number, written: string, q: Quantity): string | null {
  if (q.kind === 'flow') {
    // the message's number is in the SI of the field it is about: kg/s for a mass flow, m³/s for a
    // volume flow at its inlet state or at the request's own reference
    const target = flowUnit(q.unit);
    const mass = written.startsWith('kg');
    if (!target || mass !== (target.basis === 'mass')) return null;
    const si = written.endsWith('/h') ? value / 3600 : value;
    return `${shown(si / target.factor)} ${target.label}`;
  }
  try {
    const kind = q.kind as QuantityKind;
    const si = toSI({ value, unit: written }, kind, { pressureBasis: 'absolute' });
    const d = fromSI(si, kind, { unit: q.unit }, { pressureBasis: q.kind === 'pressure' ? 'absolute' : undefined });
    const label = q.kind === 'pressure' ? d.label : unitLabel(q.kind, q.unit);
    return `${shown(d.value)} ${label}`;
  } catch {
    return null;
  }
}

/** `message` with its numbers in the field's unit (unchanged where it speaks of other quantities). */
export function inFieldUnit(message: string | undefined, q: Quantity): string | undefined {
  if (!message) return message;
  let out = message;
  const read = (num: string) => Number(num.replace(/,/g, ''));
  for (const [range, single, written] of WRITTEN[q.kind] ?? []) {
    out = out.replace(range, (all, a: string, between: string, b: string) => {
      const from = convert(read(a), written, q);
      const to = convert(read(b), written, q);
      // "-148 and 1,112 °F": the unit once, after the second number
      return from && to ? `${from.slice(0, from.lastIndexOf(' '))}${between}${to}` : all;
    });
    out = out.replace(single, (all, num: string) => convert(read(num), written, q) ?? all);
  }
  return out;
}
