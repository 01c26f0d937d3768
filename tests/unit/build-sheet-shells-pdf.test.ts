/**
 * The build sheet of a cooler of two identical shells in series with the process on the shell side
 * (issue 10): the JSON counts the shells (cut list, tubesheets, baffles, spools), says which fluid
 * goes where and tests each side at its own fluid's pressure; the drilling data states the
 * tubesheet quantity; the PDF, read back with poppler's pdftotext (Debian poppler-utils), shows
 * it all. The old single-shell design (no v2 fields) still builds as one shell in the tubes.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BuildSheet } from '../../shared/schemas/build-sheet';
import { renderBuildSheetPdf } from '../../server/features/orders/build-sheet-pdf';
import { drillingCsv, drillingPattern } from '../../server/features/orders/drilling';
import { buildSheetFixture, glycolDesign, HYDROTEST, twoShellDesign } from './build-sheet-pdf.fixture';

const GLYCOL = 'Ethylene glycol–water, 50 % by mass';
let dir = '';
let sheet: BuildSheet;
let all = '';

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'build-sheet-shells-'));
  sheet = buildSheetFixture(twoShellDesign());
  const file = join(dir, 'sheet.pdf');
  writeFileSync(file, await renderBuildSheetPdf(sheet));
  // reading order (no -layout): a two-column facts table reads label, value, label, value
  all = execFileSync('pdftotext', ['-enc', 'UTF-8', file, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
}, 60000);

afterAll(() => {
  if (dir) rmSync(dir, { recursive: true, force: true });
});

describe('build sheet of two shells in series, process on the shell side (JSON)', () => {
  it('counts the shells: build 2, tubes per shell and in all, 4 tubesheets, one spool a side', () => {
    expect(sheet.shells.inSeries).toBe(2);
    expect(sheet.shells.instruction).toMatch(/^Build 2 identical shells/);
    expect(sheet.shells.interconnections.map((c) => `${c.from}-${c.to}-${c.side}`)).toEqual(['1-2-tube', '1-2-shell']);
    expect(sheet.design).toMatchObject({ tubeCount: 56, shellsInSeries: 2 });
    expect(sheet.design.areaPerShell_m2 * 2).toBeCloseTo(sheet.design.area_m2, 9);
    // 56 tubes a shell × 2 shells; 56 × (1.9 + 0.05) m = 109.2 m a shell, 218.4 m in all
    expect(sheet.cutList).toMatchObject({ tubes: 56, shells: 2, tubesAllShells: 112 });
    expect(sheet.cutList.totalLength_m).toBeCloseTo(218.4, 9);
    expect(sheet.tubesheet.quantity).toBe(4);
    expect(sheet.tubesheet.holeCount).toBe(56); // one pattern, the same in every shell
  });

  it('says which fluid goes where, marks the nozzles and tests each side at its fluid’s pressure', () => {
    expect(sheet.allocation.tubeSide).toEqual({ stream: 'coolant', fluid: 'Water' });
    expect(sheet.allocation.shellSide).toEqual({ stream: 'process', fluid: GLYCOL });
    expect(sheet.allocation.reason).toMatch(/^Glycol on the shell side/);
    expect(sheet.nozzles.find((n) => n.side === 'shell')?.fluid).toBe(`${GLYCOL} (process)`);
    // the glycol (4 bar(g)) is now on the shell side, the water (3 bar(g)) in the tubes: the
    // pressures of the one-shell sheet swap sides (6.5 and 5.2 bar by hand in the fixture)
    expect(sheet.hydrotest).toMatchObject({ tubeSide_Pa: HYDROTEST.shellSide_Pa, shellSide_Pa: HYDROTEST.tubeSide_Pa, tubeSideFluid: 'Water', shellSideFluid: GLYCOL, shells: 2 });
  });

  it('gives the baffles per shell and in all, the central and end spacings and the cut in % and mm', () => {
    // cut 0.30 × 254.46 mm = 76.3 → 76 mm
    expect(sheet.baffles).toMatchObject({ count: 14, total: 28, spacing_mm: 200, inletSpacing_mm: 300, outletSpacing_mm: 300, cut_pct: 30, cut_mm: 76 });
  });

  it('multiplies the bill: tubes, tubesheets, baffles, spools, hydrotest of each shell', () => {
    const bom = (key: string) => sheet.billOfMaterials.find((b) => b.key === key);
    expect(bom('tubes')?.quantity).toBeCloseTo(218.4, 9);
    expect(bom('heads')?.quantity).toBe(2);
    expect(sheet.billOfMaterials.filter((b) => b.key.startsWith('interconnection-'))).toHaveLength(2);
    expect(sheet.labour.find((l) => l.key === 'labour-baffles')?.hours).toBe(14); // 28 × 0.5 h
    expect(sheet.labour.find((l) => l.key === 'labour-hydrotest')?.hours).toBe(6); // 2 × 3 h
  });

  it('the drilling data states the tubesheet quantity (2 × shells) on every hole line', () => {
    const pattern = drillingPattern(twoShellDesign());
    expect(pattern).toMatchObject({ shells: 2, tubesheets: 4 });
    const [header, ...rows] = drillingCsv(pattern).trim().split('\n');
    expect(header).toBe('hole,x_mm,y_mm,kind,pass,diameter_mm,tubesheets');
    expect(rows).toHaveLength(60); // 56 tube holes + 4 tie rods
    for (const r of rows) expect(r.split(',')[6]).toBe('4');
  });
});

describe('build sheet of two shells in series (PDF)', { timeout: 60000 }, () => {
  it('shows the shells, the allocation and its reason', () => {
    expect(all).toContain('Shells in series 2: build 2 identical shells');
    expect(all).toContain('In the tubes Water (coolant)');
    expect(all).toContain(`On the shell side ${GLYCOL} (process)`);
    expect(all).toContain('Why this allocation Glycol on the shell side');
    expect(all).toContain('Build 2 identical shells to this sheet and connect them in series');
  });
  it('shows the cut list per shell and for both shells', () => {
    expect(all).toContain('56 1,950 mm 1,900 mm + 50 mm Carbon steel 3/4 in BWG 20 109.2 m');
    expect(all).toContain('112 1,950 mm × 2 shells Carbon steel 3/4 in BWG 20 218.4 m');
  });
  it('shows the baffles per shell and in all, spacings and cut, and the spools', () => {
    expect(all).toContain('14 segmental per shell; 28 in all (2 shells)');
    expect(all).toContain('200 mm central; inlet 300 mm, outlet 300 mm');
    expect(all).toContain('30 % of the shell ID (76 mm)');
    expect(all).toContain('Interconnection 1 to 2 tube side, flanged spool');
  });
  it('states the tubesheet quantity on the tubesheet section and the drilling page', () => {
    expect(all).toContain('3 Tubesheets (4: two per shell, all drilled alike)');
    expect(all).toContain('Tubesheets to drill 4 (2 per shell × 2 shells)');
    expect(all).toContain('Drill 4 tubesheets to this pattern (2 per shell × 2 shells)');
  });
  it('tests each side with its fluid, every shell', () => {
    expect(all).toContain('Tube side Water 5.2 bar(g) 76 psig');
    expect(all).toContain(`Shell side ${GLYCOL} 6.5 bar(g) 95 psig`);
    expect(all).toContain('Test each of the 2 shells on both sides.');
    expect(all).toContain('Hydrotest each of the 2 shells: shell side, then tube side');
  });
});

describe('an old stored design (no v2 fields)', () => {
  it('builds as one shell with the process in the tubes, 25 % cut, baffles from its spacing', () => {
    const d = glycolDesign();
    expect(d.shellsInSeries).toBeUndefined();
    const one = buildSheetFixture(d);
    expect(one.shells).toEqual({ inSeries: 1, instruction: 'Build 1 shell.', interconnections: [] });
    expect(one.allocation.tubeSide).toEqual({ stream: 'process', fluid: GLYCOL });
    expect(one.tubesheet.quantity).toBe(2);
    // round(1.9 / 0.101784) − 1 = round(18.67) − 1 = 18; cut 25 % × 254.46 = 63.6 → 64 mm
    expect(one.baffles).toMatchObject({ count: 18, total: 18, spacing_mm: 102, inletSpacing_mm: 102, cut_pct: 25, cut_mm: 64 });
    expect(one.hydrotest).toMatchObject(HYDROTEST);
  });
});
