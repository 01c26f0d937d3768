/**
 * The offer PDF of a design engine v2 design (issue 10), read back with poppler's pdftotext (Debian
 * poppler-utils): an invented hydraulic-oil cooler with the oil on the shell side, two shells in
 * series, end baffle spacings and a 30 % cut, rated by Bell–Delaware with Kern's h beside it. Every
 * figure of the design below is the test's own input (invented), so the test checks the wording,
 * not the engine. The old design of the offer fixture (no v2 fields) still reads as one shell with
 * the process in the tubes, and the cautions stand on both.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Revision } from '../../shared/schemas/quotes';
import { sizeRequestSchema, type Design } from '../../shared/schemas/thermal';
import { renderOfferPdf, OFFER_CAUTIONS, type OfferPdfInput } from '../../server/features/quotes/offer-pdf';
import { designSummary } from '../../server/features/quotes/present';
import { offerInput } from './offer-pdf.fixture';

const ATM = 101_325;
const REASON = 'Oil on the shell side: baffled crossflow keeps it turbulent where a tube would run laminar; the cooling water in the tubes can be cleaned mechanically.';

/** ISO VG 46 oil 1.2 kg/s from 62 to 47 °C at 4 bar(g), water 2 kg/s at 27 °C (invented duty). */
const oilDuty = sizeRequestSchema.parse({
  process: { fluid: 'oil-vg46', pressure_Pa: 4e5 + ATM, massFlow_kg_s: 1.2, inletTemp_C: 62, outletTemp_C: 47 },
  boundary: { kind: 'coolant', fluid: 'water', pressure_Pa: 3e5 + ATM, massFlow_kg_s: 2, inletTemp_C: 27 },
  constraints: { maxTubeLength_m: 3, maxPressureDrop_Pa: 70000 },
});

/** An old stored design: the v2 fields removed from the design and its rating. */
function withoutV2(d: Design): Design {
  const { processSide: _p, shellsInSeries: _n, baffleCut: _c, baffleCount: _b, inletBaffleSpacing_m: _i, outletBaffleSpacing_m: _o, allocationReason: _a, recommendedReason: _r, ...old } = d;
  const { shellMethod: _m, shellHtcKern_W_m2K: _k, shellCorrections: _j, shellReynolds: _re, processSide: _rp, shellsInSeries: _rn, ...rating } = d.rating;
  return { ...old, rating } as Design;
}

function oilInput(): OfferPdfInput {
  const base = offerInput();
  const old = withoutV2(base.revision.design);
  const design: Design = {
    ...old,
    shellInnerDiameter_m: 0.25446,
    shellLabel: 'NPS 10 STD',
    processSide: 'shell',
    shellsInSeries: 2,
    baffleSpacing_m: 0.15,
    inletBaffleSpacing_m: 0.25,
    outletBaffleSpacing_m: 0.25,
    baffleCut: 0.3,
    baffleCount: 12,
    area_m2: 2 * old.area_m2,
    allocationReason: REASON,
    rating: {
      ...old.rating,
      condensate_kg_s: undefined,
      latentDuty_W: undefined,
      shellMethod: 'bell-delaware',
      shellHtc_W_m2K: 812,
      shellHtcKern_W_m2K: 1530,
      shellReynolds: 2400,
      shellCorrections: { Jc: 1.02, Jl: 0.71, Jb: 0.86, Js: 0.94, Jr: 1 },
    },
  };
  const revision: Revision = { ...base.revision, duty: oilDuty, design, alternatives: [design].map(({ rating: _r, ...a }) => a) };
  return { ...base, revision };
}

let dir = '';
let oil = '';
let old = '';

const text = (file: string) => execFileSync('pdftotext', ['-enc', 'UTF-8', file, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'offer-pdf-v2-'));
  const a = join(dir, 'oil.pdf');
  writeFileSync(a, await renderOfferPdf(oilInput()));
  oil = text(a);
  const base = offerInput();
  const b = join(dir, 'old.pdf');
  writeFileSync(b, await renderOfferPdf({ ...base, revision: { ...base.revision, design: withoutV2(base.revision.design) } }));
  old = text(b);
}, 60000);

afterAll(() => {
  if (dir) rmSync(dir, { recursive: true, force: true });
});

describe('offer PDF of a v2 design: oil on the shell side, two shells', { timeout: 60000 }, () => {
  it('says where each fluid goes and why, in the duty table and the design', () => {
    expect(oil).toContain('Process side (on the shell side)');
    expect(oil).toContain('Cooling side (in the tubes)');
    expect(oil).toContain('Fluid allocation Water (coolant) in the tubes; Mineral oil ISO VG 46 (process) on the shell side');
    expect(oil).toContain(`Why this allocation: ${REASON}`);
  });
  it('counts the shells and gives the baffles: spacing with the end spacings, count and cut', () => {
    expect(oil).toContain('Shells in series 2 identical shells in series');
    // the tube label is the fixture's live-sized tube (an inch size with its BWG gauge, or a metric size)
    expect(oil).toMatch(/Tubes \d+ × (\S+ in OD, BWG \d+|\d+ mm OD, [\d.]+ mm) per shell/);
    expect(oil).toContain('Baffle spacing 150 mm (inlet 250 mm, outlet 250 mm)');
    // 0.30 × 254.46 mm = 76.3 mm
    expect(oil).toContain('Baffles 12 segmental per shell, cut 30 % of the shell ID (76.3 mm)');
    expect(oil).toContain('(2 shells in series,');
    // the alternatives table has the shell count and the side of the process
    expect(oil).toContain('Shells 2');
    expect(oil).toContain('Process in');
  });
  it('names the shell-side method, Kern’s h as the second opinion and the J factors on a technical line', () => {
    expect(oil).toContain('Shell-side heat transfer: Bell–Delaware method (Taborek, Heat Exchanger Design Handbook §3.3), h = 812 W/(m²·K), Reynolds number 2,400');
    expect(oil).toContain('Kern’s method (1950), as a second opinion, gives h = 1,530 W/(m²·K)'.replace('’', "'"));
    // 1.02 × 0.71 × 0.86 × 0.94 × 1 = 0.58544 (by hand)
    expect(oil).toContain('J_c 1.02 (baffle cut), J_l 0.71 (leakage), J_b 0.86 (bypass), J_s 0.94 (end spacing), J_r 1 (laminar); product 0.585');
  });
  it('keeps the cautions', () => {
    for (const c of OFFER_CAUTIONS) expect(oil).toContain(c);
  });
  it('the one-line summary says two shells and the oil on the shell side', () => {
    const s = designSummary(oilInput().revision.design, oilDuty);
    expect(s).toMatch(/, NPS 10 STD, 2 shells in series, oil on the shell side$/);
  });
});

describe('offer PDF of an old stored design (no v2 fields)', { timeout: 60000 }, () => {
  it('reads as one shell with the process in the tubes, Kern’s method on the shell side, the cautions kept', () => {
    expect(old).toContain('Process side (in the tubes)');
    expect(old).toContain('Fluid allocation Compressed air, humid (process) in the tubes; Water (coolant) on the shell side');
    expect(old).toContain('Shells in series 1 shell');
    expect(old).toContain('cut 25 % of the shell ID');
    expect(old).toContain("Shell-side heat transfer: Kern's method (1950)");
    expect(old).not.toContain('Bell–Delaware');
    for (const c of OFFER_CAUTIONS) expect(old).toContain(c);
  });
  it('the summary is the one it always was', () => {
    const d = withoutV2(offerInput().revision.design);
    expect(designSummary(d)).not.toMatch(/shell side|in series/);
  });
});

describe('the engine’s signs in a PDF', () => {
  it('become signs or words the shipped latin font has (no empty boxes)', async () => {
    const { latinText } = await import('../../server/lib/pdf/glyphs');
    expect(latinText('U 244 W/m²K, tube ΔP 22 kPa; ρv² above 2230; μ/μ_w; x₁ ≈ 3')).toBe('U 244 W/m²K, tube pressure drop 22 kPa; rho·v² above 2230; µ/µ_w; x1 about 3');
  });
});
