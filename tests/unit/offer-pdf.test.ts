/**
 * The offer PDF (issue 4): render an invented offer, extract its text with poppler's pdftotext
 * (Debian package poppler-utils) and find the duty in the customer's units, the design, the
 * price and the cautions of the domain brief (section 4). Unit conversions below are worked by
 * hand from exact definitions (°F = °C × 9/5 + 32; 1 lb = 0.45359237 kg; 1 psi = 6894.757 Pa).
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { PriceLine } from '../../shared/schemas/price-book';
import { TUBE_MATERIALS } from '../../shared/thermal/geometry/materials';
import { renderOfferPdf, type OfferPdfInput } from '../../server/features/quotes/offer-pdf';
import { handMadePrice, offerInput } from './offer-pdf.fixture';

/** Domain brief section 4, in the offer's words. */
const CAUTIONS = [
  'The results in this offer are engineering estimates for quotation.',
  'The final design is checked by the fabricator’s responsible engineer under the pressure-vessel code in force where the unit is installed (ASME Section VIII, PED or local rules) and the customer’s site rules.',
];

let dir = '';
let counter = 0;
let base: OfferPdfInput;

function poppler(tool: 'pdftotext' | 'pdfinfo' | 'pdffonts', args: string[]): string {
  return execFileSync(tool, args, { encoding: 'utf8', stdio: ['ignore', 'pipe', 'pipe'] });
}

function save(pdf: Buffer): string {
  const file = join(dir, `offer-${(counter += 1)}.pdf`);
  writeFileSync(file, pdf);
  return file;
}

/** Text of the PDF (or of one page) with all runs of white space made one space. */
function text(file: string, page?: number): string {
  const range = page ? ['-f', String(page), '-l', String(page)] : [];
  return poppler('pdftotext', ['-enc', 'UTF-8', ...range, file, '-']).replace(/\s+/g, ' ');
}

function info(file: string): Record<string, string> {
  const out: Record<string, string> = {};
  for (const line of poppler('pdfinfo', [file]).split('\n')) {
    const m = /^([^:]+):\s*(.*)$/.exec(line);
    if (m) out[m[1]] = m[2].trim();
  }
  return out;
}

beforeAll(() => {
  try {
    poppler('pdftotext', ['-v']);
  } catch {
    throw new Error('pdftotext is missing: install Debian poppler-utils (apt-get install -y poppler-utils).');
  }
  dir = mkdtempSync(join(tmpdir(), 'offer-pdf-'));
  base = offerInput();
}, 60000);

afterAll(() => {
  if (dir) rmSync(dir, { recursive: true, force: true });
});

describe('offer PDF', { timeout: 60000 }, () => {
  let si = '';
  let siFile = '';

  beforeAll(async () => {
    siFile = save(await renderOfferPdf(base));
    si = text(siFile);
  }, 60000);

  it('names the fabricator, the customer, the quote, its revision and dates', () => {
    for (const s of ['Alder Creek Thermal Works', 'offers@aldercreek-thermal.example', 'Pellmar Compression', 'Jonas Pellmar', 'Offer Q-2026-0042', 'Revision 3 (offer)', '12 Mar 2026', '11 Apr 2026', 'PC-75 screw package, aftercooler', '8 weeks']) {
      expect(si).toContain(s);
    }
  });

  it('shows the duty in SI: flows, temperatures, gauge pressures, intake air', () => {
    expect(si).toContain('Compressed air, humid');
    expect(si).toContain('1,260 kg/h'); // 0.35 kg/s × 3600 s/h
    expect(si).toContain('9,000 kg/h'); // 2.5 kg/s × 3600 s/h
    for (const s of ['150 °C', '38 °C', '28 °C', '8 bar(g)', '3 bar(g)', '30 °C, 60 % RH, 1 bar(a)']) expect(si).toContain(s);
    expect(si).not.toContain('°F');
  });

  it('shows the design and the predicted performance of the revision', () => {
    const d = base.revision.design;
    const material = TUBE_MATERIALS.find((m) => m.id === d.tubeMaterial)!.name;
    expect(si).toContain(`${d.tubeCount} × `);
    expect(si).toContain(d.tubeWallLabel);
    expect(si).toContain(material);
    expect(si).toContain(d.shellLabel!);
    expect(si).toContain(`${Number((d.rating.duty_W / 1000).toPrecision(3))} kW`);
    expect(si).toContain(d.rating.correlationName);
    expect(si).toContain('Condensate (water)');
  });

  it('shows the summary price: per unit, quantity, the discount line, total, deposit and balance', () => {
    // sums by hand in the fixture: 2 × $6,157.70 − $369.46 = $11,945.94; 30 % deposit $3,583.78
    for (const s of ['$6,157.70', '$12,315.40', 'Quantity discount, 2 units or more (3 %)', '-US$369.46', '$11,945.94', '$3,583.78', '$8,362.16']) {
      expect(si).toContain(s);
    }
    expect(si).not.toContain('Tubes, carbon steel 3/4 in BWG 20'); // per-line detail stays out of a summary
  });

  it('carries the cautions of the domain brief and the payment terms', () => {
    for (const c of CAUTIONS) expect(si).toContain(c);
    expect(si).toContain('balance net 30 days');
  });

  it('numbers every page and repeats the quote in the footer; sets the metadata; embeds the shipped font', () => {
    const meta = info(siFile);
    const pages = Number(meta.Pages);
    expect(pages).toBeGreaterThanOrEqual(1);
    for (let p = 1; p <= pages; p += 1) {
      const page = text(siFile, p);
      expect(page).toContain(`page ${p} of ${pages}`);
      expect(page).toContain('Q-2026-0042 · revision 3');
      expect(page).toContain('Alder Creek Thermal Works');
    }
    expect(meta.Title).toContain('Q-2026-0042');
    expect(meta.Author).toBe('Alder Creek Thermal Works');
    expect(meta.Subject).toContain('Pellmar Compression');
    const fonts = poppler('pdffonts', [siFile]);
    expect(fonts).toContain('SourceSans3-Regular');
    expect(fonts).toContain('SourceSans3-SemiBold');
    expect(fonts).not.toMatch(/Helvetica/);
  });

  it('shows US customary units (°F, psig, lb/h) and every price line when asked', async () => {
    const us = text(save(await renderOfferPdf({ ...base, units: 'US', showLines: 'detailed' })));
    expect(us).toContain('302 °F'); // 150 °C
    expect(us).toContain('100.4 °F'); // 38 °C
    expect(us).toContain('82.4 °F'); // 28 °C
    expect(us).toContain('116 psig'); // 800 kPa / 6.894757 kPa per psi = 116.03
    expect(us).toContain('2,778 lb/h'); // 1260 kg/h / 0.45359237 kg/lb = 2777.8
    expect(us).not.toContain('bar(g)');
    expect(us).not.toContain('°C');
    for (const l of handMadePrice.lines) expect(us).toContain(l.description);
    expect(us).toContain('Price per unit');
    expect(us).toContain('$11,945.94');
  });

  it('adds the rating’s own caution and warnings to the cautions box', async () => {
    const rating = {
      ...base.revision.design.rating,
      caution: 'Invented caution for this test: check the shell nozzle against impingement.',
      warnings: [{ code: 'test', message: 'Invented warning for this test: velocity near the upper limit.' }],
    };
    const out = text(save(await renderOfferPdf({ ...base, revision: { ...base.revision, design: { ...base.revision.design, rating } } })));
    expect(out).toContain(rating.caution);
    expect(out).toContain(rating.warnings[0].message);
    for (const c of CAUTIONS) expect(out).toContain(c);
  });

  it('breaks a long price table between rows and repeats its header on the next page', async () => {
    const lines: PriceLine[] = Array.from({ length: 60 }, (_, i) => ({
      key: `l${i}`, group: 'material', description: `Invented line ${i + 1}`, quantity: 1, unit: 'each', rate_minor: 1000, amount_minor: 1000, source: 'test',
    }));
    const price = { ...handMadePrice, lines, unit_minor: 60000, quantity: 1, total_minor: 60000 };
    const file = save(await renderOfferPdf({ ...base, showLines: 'detailed', revision: { ...base.revision, price } }));
    const pages = Number(info(file).Pages);
    const all = text(file);
    for (const l of lines) expect(all).toContain(`${l.description} `);
    const first = Array.from({ length: pages }, (_, i) => i + 1).find((p) => text(file, p).includes('Invented line 1 '))!;
    const last = Array.from({ length: pages }, (_, i) => i + 1).find((p) => text(file, p).includes('Invented line 60 '))!;
    expect(last).toBeGreaterThan(first);
    expect(text(file, last)).toContain('Description Qty Unit Rate Amount');
  });
});
