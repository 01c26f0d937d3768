/**
 * The offer's typeface: Source Sans 3 from the shipped `@fontsource/source-sans-3` package (latin
 * subset, .woff, unwrapped once to sfnt: see woff.ts). Nothing is fetched at run time. The latin subset
 * has no arrows, ≥ or ≈: write "to", "at least", "about" instead.
 */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { woffToSfnt } from './woff';

export const FONT = { regular: 'SourceSans3-Regular', semibold: 'SourceSans3-SemiBold', bold: 'SourceSans3-Bold' } as const;
export type FontName = (typeof FONT)[keyof typeof FONT];

const WEIGHTS: Record<keyof typeof FONT, number> = { regular: 400, semibold: 600, bold: 700 };
const require = createRequire(import.meta.url);
let cache: Map<string, Buffer> | undefined;

function fontFiles(): Map<string, Buffer> {
  if (!cache) {
    cache = new Map();
    for (const [key, weight] of Object.entries(WEIGHTS) as [keyof typeof FONT, number][]) {
      const path = require.resolve(`@fontsource/source-sans-3/files/source-sans-3-latin-${weight}-normal.woff`);
      cache.set(FONT[key], woffToSfnt(readFileSync(path)));
    }
  }
  return cache;
}

/** Registers the three weights on `doc` and selects the regular one. */
export function registerFonts(doc: PDFKit.PDFDocument): void {
  for (const [name, data] of fontFiles()) doc.registerFont(name, data);
  doc.font(FONT.regular);
}
