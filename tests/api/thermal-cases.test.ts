/**
 * Margin and operating cases over the API (issue 11): a duty with a winter case sized and rated on
 * both, bad cases refused naming the field, a quote sized with the price book's design margin and
 * its offer PDF listing each case.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedIn, startTestApp, type TestApp } from './support/app';
import { oilCoolerDuty } from './support/quotes';
import { demoPriceBook } from '../../server/features/pricing/demo-price-book';
import { DEFAULT_DESIGN_MARGIN_PCT, designMarginOf } from '../../shared/schemas/price-book';

let t: TestApp;
let pellmar: Awaited<ReturnType<typeof signedIn>>;
let sales: Awaited<ReturnType<typeof signedIn>>;
const dir = mkdtempSync(join(tmpdir(), 'cases-pdf-'));
beforeAll(async () => {
  t = await startTestApp();
  [pellmar, sales] = await Promise.all([signedIn(t.app, 'customer@pellmar.example'), signedIn(t.app, 'sales@aldercreek.example')]);
});
afterAll(async () => {
  rmSync(dir, { recursive: true, force: true });
  await t.close();
});

const post = (path: string, body: unknown) => request(t.app).post(path).send(body as object);
/** The oil cooler with summer water at 32 °C as its design point. */
const summer = () => {
  const d = oilCoolerDuty();
  return { ...d, boundary: { ...d.boundary, inletTemp_C: 32 }, constraints: { ...d.constraints, maxTubeLength_m: 6 } };
};

describe('POST /api/thermal/size with operating cases', () => {
  it('summer water at 32 °C governs over winter at 15 °C; both are rated on the recommended design', async () => {
    const res = await post('/api/thermal/size', { ...summer(), cases: [{ name: 'Winter', boundary: { inletTemp_C: 15 } }] });
    expect(res.status).toBe(200);
    expect(res.body.governingCase).toBe('Design point');
    expect(res.body.cases.map((c: { name: string }) => c.name)).toEqual(['Design point', 'Winter']);
    for (const c of res.body.cases) {
      expect(c.meets).toBe(true);
      expect(c.outletTemp_C).toBeLessThanOrEqual(47 + 0.05);
      expect(c.pressureDrop_Pa).toBeGreaterThan(0);
      expect(c.shellPressureDrop_Pa).toBeGreaterThan(0);
      expect(c.outletUncertainty_K).toBeGreaterThan(0);
    }
    expect(res.body.cases[1].outletTemp_C).toBeLessThan(res.body.cases[0].outletTemp_C);
    expect(res.body.recommended.cases).toEqual(res.body.cases);
    expect(res.body.recommended.rating.outletUncertainty_K).toBeGreaterThan(0);
  });

  it('refuses five cases, two of one name, and a wall temperature on a coolant duty, naming the field', async () => {
    const five = Array.from({ length: 5 }, (_, i) => ({ name: `Case ${i}` }));
    const a = await post('/api/thermal/size', { ...summer(), cases: five });
    expect(a.status).toBe(400);
    expect(JSON.stringify(a.body.error)).toContain('cases');
    const b = await post('/api/thermal/size', { ...summer(), cases: [{ name: 'Winter' }, { name: 'winter' }] });
    expect(b.status).toBe(400);
    expect(JSON.stringify(b.body.error)).toMatch(/cases.*1.*name/);
    const c = await post('/api/thermal/size', { ...summer(), cases: [{ name: 'Cold', boundary: { wallTemp_C: 10 } }] });
    expect(c.status).toBe(400);
    expect(JSON.stringify(c.body.error)).toContain('wallTemp_C');
    const d = await post('/api/thermal/size', { ...summer(), cases: [{ name: 'Hot', boundary: { inletTemp_C: 900 } }] });
    expect(d.status).toBe(400);
  });

  it('a case no design can meet is a 422 naming the case', async () => {
    const res = await post('/api/thermal/size', { ...summer(), cases: [{ name: 'Heatwave', boundary: { inletTemp_C: 50 } }] });
    expect(res.status).toBe(422);
    expect(JSON.stringify(res.body.error)).toContain('Heatwave');
  });
});

describe('a quote sized with the price book margin and cases', () => {
  it("the design carries the book's 10 % margin (default), is at least 10 % over the required length; the offer lists each case", async () => {
    const duty = { ...summer(), cases: [{ name: 'Winter', boundary: { inletTemp_C: 15 } }] };
    const res = await pellmar.post('/api/quotes').send({ duty, quantity: 1 });
    expect(res.status).toBe(201);
    const d = res.body.revision.design;
    expect(d.designMargin_pct).toBe(10);
    expect(d.tubeLength_m).toBeGreaterThanOrEqual(d.requiredLength_m * 1.1 - 1e-6);
    expect(d.cases.map((c: { name: string }) => c.name)).toEqual(['Design point', 'Winter']);
    expect(res.body.revision.duty.cases).toEqual([{ name: 'Winter', boundary: { inletTemp_C: 15 } }]);
    const ok = await sales.post(`/api/quotes/${res.body.id}/approve`).send({ version: res.body.version });
    expect(ok.status).toBe(200);
    const pdf = await pellmar.get(`/api/quotes/${res.body.id}/offer.pdf`).buffer(true).parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => cb(null, Buffer.concat(chunks)));
    });
    expect(pdf.status).toBe(200);
    const file = join(dir, 'offer.pdf');
    writeFileSync(file, pdf.body as Buffer);
    const text = execFileSync('pdftotext', ['-enc', 'UTF-8', file, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
    expect(text).toContain('Design point (governing)');
    expect(text).toMatch(/Winter 15 °C/);
    expect(text).toMatch(/Guaranteed process outlet at most 47 °C; predicted [\d.]+ ± [\d.]+ °C; 10 % area margin\./);
  });
});

describe('the design margin in the price book', () => {
  it('a book saved before the field reads the stated default; a margin outside 0–50 % is a 400 naming it, saving nothing', async () => {
    const { designMargin_pct: _m, ...old } = demoPriceBook as typeof demoPriceBook & { designMargin_pct?: number };
    void _m;
    expect(designMarginOf(JSON.parse(JSON.stringify(old)) as { designMargin_pct?: number })).toBe(DEFAULT_DESIGN_MARGIN_PCT);
    expect(DEFAULT_DESIGN_MARGIN_PCT).toBe(10);
    const admin = await signedIn(t.app, 'admin@aldercreek.example');
    const before = (await admin.get('/api/admin/price-book').expect(200)).body.version as number;
    const res = await admin.put('/api/admin/price-book').send({ priceBook: { ...demoPriceBook, designMargin_pct: 60 }, baseVersion: before, note: 'margin' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty(['priceBook.designMargin_pct']);
    expect((await admin.get('/api/admin/price-book')).body.version).toBe(before);
  });
});
