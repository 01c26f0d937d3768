/**
 * The build-sheet PDF (issue 5): render the build sheet of an engine-sized glycol cooler (fixture
 * beside this file), read it back with poppler (Debian poppler-utils: pdftotext -layout, pdfinfo,
 * pdffonts, pdftoppm) and find the order, the cut list, the tubesheet, the hydrotest in both units
 * with its basis, the checklist, the cautions, and a drilling drawing measured on the raster to be
 * at the stated scale. Conversions by hand: 1 psi = 6894.757 Pa; 1 in = 25.4 mm = 72 pt.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BuildSheet } from '../../shared/schemas/build-sheet';
import { renderBuildSheetPdf } from '../../server/features/orders/build-sheet-pdf';
import { buildSheetFixture, HYDROTEST_BASIS } from './build-sheet-pdf.fixture';

/** Domain brief section 4, in the build sheet's words. */
const CAUTIONS = [
  'Pressure equipment: dimensions, thicknesses and test pressures on this sheet are estimates from the quotation design.',
  'Build only to drawings and calculations released by the fabricator’s responsible engineer under the pressure-vessel code in force where the unit is installed (ASME Section VIII, PED or local rules), and to the customer’s site rules.',
];

let dir = '';
let sheet: BuildSheet;
let pdf: Buffer;
let file = '';
let pages = 0;

const run = (tool: string, args: string[]) => execFileSync(tool, args, { encoding: 'utf8', stdio: ['ignore', 'pipe', 'pipe'] });

/** `pdftotext -layout` of the file or one page, runs of white space made one space. */
function text(page?: number): string {
  const range = page ? ['-f', String(page), '-l', String(page)] : [];
  return run('pdftotext', ['-layout', '-enc', 'UTF-8', ...range, file, '-']).replace(/\s+/g, ' ');
}

function info(): Record<string, string> {
  const out: Record<string, string> = {};
  for (const line of run('pdfinfo', ['-isodates', file]).split('\n')) {
    const m = /^([^:]+):\s*(.*)$/.exec(line);
    if (m) out[m[1]] = m[2].trim();
  }
  return out;
}

/** Grey raster (binary PGM) of one page at `dpi`: width, height and one byte a pixel. */
function raster(page: number, dpi: number): { width: number; height: number; px: Buffer } {
  const base = join(dir, `page-${page}-${dpi}`);
  run('pdftoppm', ['-gray', '-r', String(dpi), '-f', String(page), '-l', String(page), '-singlefile', file, base]);
  const data = readFileSync(`${base}.pgm`);
  const m = /^P5\s+(\d+)\s+(\d+)\s+(\d+)\s/.exec(data.subarray(0, 40).toString('latin1'))!;
  return { width: Number(m[1]), height: Number(m[2]), px: data.subarray(m[0].length) };
}

beforeAll(async () => {
  try {
    run('pdftotext', ['-v']);
  } catch {
    throw new Error('pdftotext is missing: install Debian poppler-utils (apt-get install -y poppler-utils).');
  }
  dir = mkdtempSync(join(tmpdir(), 'build-sheet-pdf-'));
  sheet = buildSheetFixture();
  pdf = await renderBuildSheetPdf(sheet);
  file = join(dir, 'sheet.pdf');
  writeFileSync(file, pdf);
  pages = Number(info().Pages);
}, 60000);

afterAll(() => {
  if (dir) rmSync(dir, { recursive: true, force: true });
});

describe('build-sheet PDF', { timeout: 60000 }, () => {
  it('opens with the order: number, quote, customer, PO, need-by, quantity, status', () => {
    const first = text(1);
    for (const s of ['Build sheet O-2026-0017', 'Q-2026-0051', 'Harwick Process Cooling', 'HPC-PO-88412', '15 Jul 2026', '1 unit', 'Released to the shop']) {
      expect(first).toContain(s);
    }
  });

  it('puts both cautions of the domain brief on the first page', () => {
    const first = text(1);
    for (const c of CAUTIONS) expect(first).toContain(c);
  });

  it('gives the cut list: tubes × cut length = finished length + 50 mm allowance, and the total', () => {
    const c = sheet.cutList;
    const finished = Math.round(c.finishedLength_m * 1000);
    const cut = finished + 50; // demo price book: 0.05 m cut allowance per tube
    const total = Math.round((c.tubes * cut) / 10) / 100; // m, two decimals
    const group = (n: number) => n.toLocaleString('en-US');
    const all = text();
    expect(all).toContain(`${c.tubes} ${group(cut)} mm ${group(finished)} mm + 50 mm Carbon steel 3/4 in BWG 20 ${group(total)} m`);
    expect(c.tubes).toBe(sheet.design.tubeCount);
  });

  it('lists the bill of materials and the labour hours, with the diameter sign the font can show', () => {
    const all = text();
    for (const b of sheet.billOfMaterials.filter((x) => !x.description.includes('⌀'))) expect(all).toContain(b.description.split(' (')[0]);
    expect(all).toContain(`2 × Ø${sheet.tubesheet.diameter_mm} mm`); // bom.ts writes ⌀ (U+2300), not in the latin subset
    for (const l of sheet.labour) expect(all).toContain(l.description);
    expect(all).toContain('Total labour');
  });

  it('describes the tubesheet: hole count equal to the tube count, tie rods, hole Ø, pitch, lanes', () => {
    const all = text();
    const t = sheet.tubesheet;
    expect(t.holeCount).toBe(sheet.design.tubeCount);
    expect(all).toContain(`Tube holes ${t.holeCount}`);
    expect(all).toContain(`Tie-rod holes ${t.tieRodHoles}`);
    expect(all).toContain('Hole diameter 19.25 mm'); // 3/4 in = 19.05 mm + 0.2 mm
    expect(all).toContain(`Pitch ${t.pitch_mm} mm`);
    expect(all).toContain('Pass-partition lanes 2'); // four passes: one horizontal and one vertical lane
    expect(all).toContain('30° triangular');
  });

  it('states the hydrotest pressures in bar(g) and psig, rounded up, with the code basis', () => {
    const all = text();
    // 650 000 Pa = 6.5 bar; / 6894.757 = 94.27 psi, up to 95. 520 000 Pa = 5.2 bar; 75.42 psi, up to 76.
    expect(all).toContain('Tube side Ethylene glycol–water, 50 % by mass 6.5 bar(g) 95 psig');
    expect(all).toContain('Shell side Water 5.2 bar(g) 76 psig');
    expect(all).toContain(`Basis: ${HYDROTEST_BASIS}`);
  });

  it('has every inspection point with checked-by and date columns', () => {
    const all = text();
    expect(all).toContain('Done Inspection point Checked by Date');
    for (const item of sheet.inspection) expect(all).toContain(item);
    expect(all).toContain('Hydrotest shell side, then tube side, at the pressures above, held and inspected for leaks');
    expect(all).toContain('Nozzles marked for their side: tube side Ethylene glycol–water, 50 % by mass (process), shell side Water (coolant)');
  });

  it('numbers every page "page x of y" and sets title, author, subject and a fixed date', () => {
    expect(pages).toBeGreaterThanOrEqual(2);
    for (let p = 1; p <= pages; p += 1) {
      const page = text(p);
      expect(page).toContain(`page ${p} of ${pages}`);
      expect(page).toContain('O-2026-0017 · quote Q-2026-0051');
    }
    const meta = info();
    expect(meta.Title).toBe('Build sheet O-2026-0017');
    expect(meta.Author).toBe('Alder Creek Thermal Works');
    expect(meta.Subject).toContain('Harwick Process Cooling');
    expect(meta.CreationDate).toMatch(/^1970-01-01T00:00:00/);
    expect(run('pdffonts', [file])).toContain('SourceSans3-Regular');
  });

  it('renders the same sheet to the same bytes', async () => {
    expect((await renderBuildSheetPdf(sheet)).equals(pdf)).toBe(true);
  });

  it('draws the drilling pattern on its own last page at the stated scale', () => {
    const last = text(pages);
    // tubesheet Ø 1.2 × 254.46 + 100 = 405 mm: at 1:2 it would take 202.5 mm of the 210 mm A4 width,
    // at 1:2.5 it takes 162 mm (= 459.2 pt), so 1:2.5 is the largest standard scale that fits
    expect(sheet.tubesheet.diameter_mm).toBe(405);
    expect(last).toContain('Tubesheet drilling pattern, scale 1:2.5');
    expect(last).toContain('Scale 1:2.5 on A4');
    expect(last).toContain('Pass 1: 14 tube holes'); // 56 tubes in four passes
    expect(last).toContain(`Tie-rod holes: ${sheet.tubesheet.tieRodHoles} (filled)`);
    expect(text(pages - 1)).not.toContain('Tubesheet drilling pattern, scale');
  });

  it('draws the tubesheet outline 162 mm across on paper (measured on a 72 dpi raster: 459 pt)', () => {
    const { width, height, px } = raster(pages, 72);
    const dark = (x: number, y: number) => px[y * width + x]! < 128;
    // the centre lines are the longest dark row and column of the page's middle band
    let cy = 0;
    let best = 0;
    for (let y = Math.round(height * 0.2); y < Math.round(height * 0.75); y += 1) {
      let n = 0;
      for (let x = 0; x < width; x += 1) if (dark(x, y)) n += 1;
      if (n > best) [best, cy] = [n, y];
    }
    const row = cy + 4; // just off the horizontal centre line, inside the pass lane
    let left = -1;
    let right = -1;
    for (let x = 0; x < width; x += 1) if (dark(x, row)) { if (left < 0) left = x; right = x; }
    expect(right - left + 1).toBeGreaterThan(459.2 - 3);
    expect(right - left + 1).toBeLessThan(459.2 + 3);
  });
});
