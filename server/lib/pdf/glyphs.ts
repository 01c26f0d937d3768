/**
 * Text for the shipped font's latin subset (fonts.ts), which lacks a few signs the data uses
 * (arrows, ≥, ≈, Greek letters, subscripts): each becomes a sign or words the subset has, instead
 * of an empty box in the PDF.
 */
type Substitute = [RegExp, string | ((c: string) => string)];

const SUBSTITUTES: Substitute[] = [
  [/⌀/g, 'Ø'], // U+2300 diameter sign to U+00D8, the usual stand-in on drawings
  [/\s*≥\s*/g, ' at least '],
  [/\s*≤\s*/g, ' at most '],
  [/\s*≈\s*/g, ' about '],
  [/\s*→\s*/g, ' to '],
  // the engine's words (warnings, reasons) use a few Greek letters and symbols the subset lacks
  [/ΔP/g, 'pressure drop'],
  [/ρv/g, 'rho·v'],
  [/Δ/g, 'delta '],
  [/μ/g, 'µ'], // Greek mu to the micro sign, which the subset has
  [/⋅/g, '·'],
  [/ṁ/g, 'm'],
  [/√/g, 'sqrt'],
  [/[₀-₉]/g, (c: string) => String(c.charCodeAt(0) - 0x2080)],
  [/ᵢ/g, 'i'],
  [/⁴/g, '^4'],
  ...(
    [['ρ', 'rho'], ['ε', 'eps'], ['α', 'alpha'], ['π', 'pi'], ['θ', 'theta'], ['γ', 'gamma'], ['λ', 'lambda'], ['ν', 'nu'],
      ['η', 'eta'], ['τ', 'tau'], ['δ', 'delta'], ['Σ', 'sum '], ['Φ', 'phi']] as const
  ).map(([g, name]): Substitute => [new RegExp(g, 'g'), name]),
];

export function latinText(text: string): string {
  return SUBSTITUTES.reduce((t, [re, by]) => (typeof by === 'string' ? t.replace(re, by) : t.replace(re, by)), text);
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
