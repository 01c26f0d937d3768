/**
 * Text for the shipped font's latin subset (fonts.ts), which lacks a few signs the data uses:
 * each becomes a sign or words the subset has, instead of an empty box in the PDF.
 */
const SUBSTITUTES: [RegExp, string][] = [
  [/⌀/g, 'Ø'], // U+2300 diameter sign to U+00D8, the usual stand-in on drawings
  [/\s*≥\s*/g, ' at least '],
  [/\s*≤\s*/g, ' at most '],
  [/\s*≈\s*/g, ' about '],
  [/\s*→\s*/g, ' to '],
];

export function latinText(text: string): string {
  return SUBSTITUTES.reduce((t, [re, by]) => t.replace(re, by), text);
}

/** `value` with `latinText` applied to every string inside it (plain data: objects, arrays). */
export function latinStrings<T>(value: T): T {
  if (typeof value === 'string') return latinText(value) as T;
  if (Array.isArray(value)) return value.map((v) => latinStrings(v)) as T;
  if (value && typeof value === 'object') {
    return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, latinStrings(v)])) as T;
  }
  return value;
}
