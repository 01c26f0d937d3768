/**
 * The offer's datasheet page, the sales engineer's message, a first page that is filled, and every
 * printed character present in the shipped font (issue 12). The offer is the invented aftercooler of
 * offer-pdf.fixture.ts with a stated design point on the process side; read back with poppler's
 * pdftotext (Debian poppler-utils); the font's character map read with fontkit (pdfkit's own).
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { sizeRequestSchema } from '../../shared/schemas/thermal';
import { designConditions } from '../../shared/thermal/checks/walls';
import { renderOfferPdf } from '../../server/features/quotes/offer-pdf';
import { estimateWeights } from '../../server/features/pricing/weights';
import { createPdf } from '../../server/lib/pdf/document';
import { FONT } from '../../server/lib/pdf/fonts';
import { aftercoolerDuty, offerInput } from './offer-pdf.fixture';

const ATM = 101_325;
const MESSAGE = 'We kept the bundle removable for your maintenance team.\n\nThe freight is quoted to your dock in Rivermouth.';

let file = '';
let pages: string[] = [];
let all = '';

const pdftotext = (args: string[]) => execFileSync('pdftotext', ['-enc', 'UTF-8', ...args, file, '-'], { encoding: 'utf8' });

beforeAll(async () => {
  const base = offerInput();
  // a stated design point on the process side: 12 bar(g) at 180 °C (invented)
  const duty = sizeRequestSchema.parse({ ...aftercoolerDuty, process: { ...aftercoolerDuty.process, design: { pressure_Pa: 12e5 + ATM, temp_C: 180 } } });
  const input = { ...base, revision: { ...base.revision, duty, message: MESSAGE } };
  file = join(mkdtempSync(join(tmpdir(), 'offer-datasheet-')), 'offer.pdf');
  writeFileSync(file, await renderOfferPdf(input));
  const n = Number(/Pages:\s+(\d+)/.exec(execFileSync('pdfinfo', [file], { encoding: 'utf8' }))![1]);
  pages = Array.from({ length: n }, (_, i) => pdftotext(['-f', String(i + 1), '-l', String(i + 1)]).replace(/\s+/g, ' '));
  all = pages.join(' ');
}, 120_000); // the fixture sizes with the real engine

describe('the offer PDF', () => {
  it('has a datasheet page with both sides’ design pressure and temperature, connections, construction and weights', () => {
    const sheet = pages.find((p) => p.includes('Datasheet'))!;
    expect(sheet).toBeDefined();
    // the stated process design point, and the default for the water side: 3 bar(g) + 10 %, at least +1 bar = 4 bar(g)
    expect(sheet).toContain('12 bar(g) (as stated)');
    expect(sheet).toContain('180 °C');
    const water = designConditions(sizeRequestSchema.parse(aftercoolerDuty)).boundary;
    expect(water.gauge_Pa).toBeCloseTo(4e5, 0);
    expect(sheet).toContain('4 bar(g) (operating + 10 %, at least 1 bar more)');
    expect(sheet).toMatch(/Connections/);
    const d = offerInput().revision.design;
    expect(sheet).toContain(`TEMA type ${d.construction ?? 'BEM'} (`);
    expect(sheet).toContain(`TEMA class ${d.temaClass ?? 'C'} (`);
    const w = estimateWeights(d);
    expect(w.full_kg).toBeGreaterThan(w.empty_kg);
    expect(sheet).toMatch(/Empty weight about [\d,]+ kg/);
    expect(sheet).toMatch(/Full of water about [\d,]+ kg/);
  });

  it('draws the temperature profile with labelled axes', () => {
    const sheet = pages.find((p) => p.includes('Datasheet'))!;
    expect(sheet).toContain('Temperature profile');
    expect(sheet).toContain('Position along the flow path (m)');
    expect(sheet).toContain('Temperature (°C)');
  });

  it('prints the sales engineer’s message on the first page', () => {
    expect(pages[0]).toContain('We kept the bundle removable for your maintenance team.');
    expect(pages[0]).toContain('The freight is quoted to your dock in Rivermouth.');
  });

  it('fills the first page: the design section starts on it', () => {
    expect(pages[0]).toContain('1 Duty');
    expect(pages[0]).toContain('2 Design');
  });

  it('prints only characters the shipped font has (m² and ρv² included)', () => {
    // the shipped font as pdfkit loaded it (its fontkit font: pdfkit keeps it on the private `_font`)
    const doc = createPdf({ title: 't', author: 't', subject: 't', keywords: 't', createdAt: new Date(0) });
    const missing = new Set<string>();
    for (const name of Object.values(FONT)) {
      doc.font(name);
      const font = (doc as unknown as { _font: { font: { hasGlyphForCodePoint(c: number): boolean } } })._font.font;
      for (const ch of new Set([...all])) if (ch.trim() && !font.hasGlyphForCodePoint(ch.codePointAt(0)!)) missing.add(`${ch} U+${ch.codePointAt(0)!.toString(16)}`);
    }
    expect([...missing]).toEqual([]);
    expect(all).toContain('m²');
  });
});
