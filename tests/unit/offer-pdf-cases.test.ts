/**
 * The offer PDF's margin policy and operating cases (issue 11): the guaranteed outlet with the
 * prediction, its band and the margin; the fouling used; one row per operating case. Text read
 * with poppler's pdftotext as in offer-pdf.test.ts.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { renderOfferPdf } from '../../server/features/quotes/offer-pdf';
import { offerInput } from './offer-pdf.fixture';

const dir = mkdtempSync(join(tmpdir(), 'offer-cases-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

async function pdfText(input: ReturnType<typeof offerInput>): Promise<string> {
  const file = join(dir, `o-${Math.random().toString(36).slice(2)}.pdf`);
  writeFileSync(file, await renderOfferPdf(input));
  return execFileSync('pdftotext', ['-enc', 'UTF-8', file, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
}

describe('offer PDF: margin policy and operating cases', { timeout: 60000 }, () => {
  it('states the guaranteed outlet with the predicted band and the area margin, the fouling used, and each case', async () => {
    const base = offerInput();
    const rev = base.revision;
    const target = rev.duty.process.outletTemp_C;
    const design = {
      ...rev.design,
      designMargin_pct: 10,
      governingCase: 'Design point',
      rating: { ...rev.design.rating, outletTemp_C: target - 1.2, outletUncertainty_K: 1.1, foulingTube_m2K_W: 0.00035, foulingShell_m2K_W: 0.00018 },
      cases: [
        { name: 'Design point', outletTemp_C: target - 1.2, pressureDrop_Pa: 41000, shellPressureDrop_Pa: 23000, outletUncertainty_K: 1.1, targetOutletTemp_C: target, coolantInletTemp_C: 32, meets: true },
        { name: 'Winter', outletTemp_C: target - 9.4, pressureDrop_Pa: 39000, shellPressureDrop_Pa: 25000, outletUncertainty_K: 0.7, targetOutletTemp_C: target, coolantInletTemp_C: 15, meets: true },
      ],
    };
    const t = await pdfText({ ...base, revision: { ...rev, design } });
    expect(t).toContain(`Guaranteed process outlet at most ${target} °C; predicted ${(target - 1.2).toFixed(1)} ± 1.1 °C; 10 % area margin.`);
    expect(t).toContain('Fouling allowance: tube side 0.00035 m²K/W, shell side 0.00018 m²K/W');
    expect(t).toContain('Operating case');
    expect(t).toContain('Design point (governing)');
    expect(t).toMatch(/Winter 15 °C [\d.]+ °C ± 0\.7 K/);
    expect(t).toMatch(/41(\.0)? kPa/);
    expect(t).toMatch(/25(\.0)? kPa/);
  });

  it('an offer stored before the policy prints the over-surface and no case table', async () => {
    const t = await pdfText(offerInput());
    expect(t).toContain('Guaranteed process outlet at most');
    expect(t).toMatch(/\d+ % over-surface/);
    expect(t).not.toContain('Operating case');
  });
});
