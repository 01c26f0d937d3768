/**
 * Every character the PDFs print exists in the shipped font (issue 12): the offer (SI and US,
 * detailed price lines) and the build sheet are rendered from their fixtures, their text read back
 * with poppler's pdftotext (Debian poppler-utils), and each character looked up in the cmap of the
 * Source Sans 3 files the documents embed (fonts.ts), in every weight they use. A sign the font
 * lacks would print as an empty box.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import PDFDocument from 'pdfkit';
import { afterAll, describe, expect, it } from 'vitest';
import { renderBuildSheetPdf } from '../../server/features/orders/build-sheet-pdf';
import { renderOfferPdf } from '../../server/features/quotes/offer-pdf';
import { FONT, registerFonts } from '../../server/lib/pdf/fonts';
import { latinText } from '../../server/lib/pdf/glyphs';
import { buildSheetFixture, twoShellDesign } from './build-sheet-pdf.fixture';
import { offerInput } from './offer-pdf.fixture';

/** The very font objects pdfkit embeds (its fontkit font behind each registered weight). */
const doc = new PDFDocument();
registerFonts(doc);
const fonts = Object.values(FONT).map((name) => {
  doc.font(name);
  return (doc as unknown as { _font: { font: { hasGlyphForCodePoint(c: number): boolean } } })._font.font;
});
const dir = mkdtempSync(join(tmpdir(), 'pdf-glyphs-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function printed(pdf: Buffer, name: string): string {
  const file = join(dir, `${name}.pdf`);
  writeFileSync(file, pdf);
  return execFileSync('pdftotext', ['-enc', 'UTF-8', file, '-'], { encoding: 'utf8' });
}

/** The characters of `text` some weight of the font has no glyph for, with a little context. */
function missing(text: string): string[] {
  const out = new Map<string, string>();
  for (const [i, ch] of [...text].entries()) {
    if (/\s/.test(ch) || ch === '\f') continue;
    const cp = ch.codePointAt(0)!;
    if (fonts.every((f) => f.hasGlyphForCodePoint(cp))) continue;
    if (!out.has(ch)) out.set(ch, `${ch} U+${cp.toString(16).toUpperCase().padStart(4, '0')} in “${[...text].slice(Math.max(0, i - 20), i + 20).join('')}”`);
  }
  return [...out.values()];
}

describe('PDF glyphs', { timeout: 120_000 }, () => {
  it('the font has the signs the engineering text uses: superscripts, middle dot, minus, degree, ±, ×, Ø, µ', () => {
    expect(missing('m² m³ W/(m²·K) −5 °C ± × Ø µm – — … € £')).toEqual([]);
    // the check itself sees a sign the font lacks
    expect(missing('ΔP ≥ 2')).toEqual([expect.stringContaining('U+0394'), expect.stringContaining('U+2265')]);
    // and the substitutions cover what it lacks (Greek letters, ≥, →, subscripts)
    expect(missing(latinText('ΔP ρv² Δ μ ≥ ≤ ≈ → ⌀ √ ṁ T₁ hᵢ m⁴ ε α λ ν η'))).toEqual([]);
  });

  it('the offer prints only characters the font has, in SI and US units', async () => {
    const base = offerInput();
    for (const [name, input] of [
      ['offer-si', { ...base, showLines: 'detailed' as const }],
      ['offer-us', { ...base, units: 'US' as const, showLines: 'detailed' as const }],
    ] as const) {
      expect(missing(printed(await renderOfferPdf(input), name)), name).toEqual([]);
    }
  });

  it('the build sheet prints only characters the font has, one shell and two', async () => {
    expect(missing(printed(await renderBuildSheetPdf(buildSheetFixture()), 'sheet'))).toEqual([]);
    expect(missing(printed(await renderBuildSheetPdf(buildSheetFixture(twoShellDesign())), 'sheet-2'))).toEqual([]);
  });
});
