/**
 * GET/PUT /api/admin/price-book: the role matrix, validation naming the field, versions increasing,
 * no lost update between two admins (baseVersion, 409 stale-version), a required change note, the
 * history and its line-by-line difference.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seedPriceBook } from '../../db/seed-price-book';
import { demoPriceBook } from '../../server/features/pricing/demo-price-book';
import { client, signedIn, startTestApp, type TestApp } from './support/app';

const URL = '/api/admin/price-book';
let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
  await seedPriceBook(t.database.db); // the test database may not have been seeded with a book yet
});
afterAll(() => t.close());

describe('seedPriceBook', () => {
  it('adds nothing when a price book exists (idempotent)', async () => {
    expect(await seedPriceBook(t.database.db)).toBeUndefined();
  });
});

describe('GET /api/admin/price-book', () => {
  it('answers 401 anonymous, 403 to a customer and to sales, 200 to an admin with the active book', async () => {
    const anon = await client(t.app).get(URL);
    expect(anon.status).toBe(401);
    expect(anon.body.error.code).toBe('unauthorized');
    const customer = await signedIn(t.app, 'customer@pellmar.example');
    expect((await customer.get(URL)).status).toBe(403);
    const sales = await signedIn(t.app, 'sales@aldercreek.example');
    expect((await sales.get(URL)).body.error.code).toBe('forbidden');
    const admin = await signedIn(t.app, 'admin@aldercreek.example');
    const res = await admin.get(URL).expect(200);
    expect(res.body.version).toBeGreaterThanOrEqual(1);
    expect(typeof res.body.createdAt).toBe('string');
    expect(res.body.priceBook.currency).toBeDefined();
    expect(res.body.priceBook.tubes.length).toBeGreaterThan(0);
  });
});

describe('PUT /api/admin/price-book', () => {
  it('saves a new version (201) that GET then returns', async () => {
    const admin = await signedIn(t.app, 'admin@aldercreek.example');
    const before = (await admin.get(URL).expect(200)).body.version as number;
    const changed = { ...demoPriceBook, shopRatePerHour_minor: 9900 };
    const res = await admin.put(URL).send({ priceBook: changed, baseVersion: before, note: 'shop rate to 99 USD/h (demo)' });
    expect(res.status).toBe(201);
    expect(res.body.version).toBe(before + 1);
    expect(res.body.priceBook.shopRatePerHour_minor).toBe(9900);
    const after = await admin.get(URL).expect(200);
    expect(after.body.version).toBe(before + 1);
    expect(after.body.priceBook).toEqual(changed);
    const again = await admin.put(URL).send({ priceBook: demoPriceBook, baseVersion: before + 1, note: 'back to the demo book' }).expect(201);
    expect(again.body.version).toBe(before + 2);
  });

  it('answers 400 naming the bad field and saves nothing', async () => {
    const admin = await signedIn(t.app, 'admin@aldercreek.example');
    const before = (await admin.get(URL).expect(200)).body.version as number;
    const res = await admin.put(URL).send({ priceBook: { ...demoPriceBook, margin_pct: 140 }, baseVersion: before, note: 'margin' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid-input');
    expect(res.body.error.fields).toHaveProperty(['priceBook.margin_pct']);
    const missing = await admin.put(URL).send({ note: 'no book', baseVersion: before });
    expect(missing.status).toBe(400);
    expect(missing.body.error.fields).toHaveProperty(['priceBook']);
    expect((await admin.get(URL)).body.version).toBe(before);
  });

  it('refuses customers (403) and anonymous callers (401)', async () => {
    const customer = await signedIn(t.app, 'customer@pellmar.example');
    expect((await customer.put(URL).send({ priceBook: demoPriceBook })).status).toBe(403);
    expect((await client(t.app).put(URL).send({ priceBook: demoPriceBook })).status).toBe(401);
  });

  it('lets the second of two admins saving from the same version fail with 409 stale-version (no lost update)', async () => {
    const first = await signedIn(t.app, 'admin@aldercreek.example');
    const second = await signedIn(t.app, 'admin@aldercreek.example');
    const base = (await first.get(URL).expect(200)).body.version as number;
    await first.put(URL).send({ priceBook: { ...demoPriceBook, expedite_pct: 12 }, baseVersion: base, note: 'expedite 12 %' }).expect(201);
    const late = await second.put(URL).send({ priceBook: { ...demoPriceBook, margin_pct: 30 }, baseVersion: base, note: 'margin 30 %' });
    expect(late.status).toBe(409);
    expect(late.body.error.code).toBe('stale-version');
    expect(late.body.error.message).toContain(String(base + 1));
    const active = (await first.get(URL).expect(200)).body;
    expect(active.version).toBe(base + 1);
    expect(active.priceBook.expedite_pct).toBe(12); // the first admin's change is still there
    expect(active.priceBook.margin_pct).toBe(demoPriceBook.margin_pct);
  });

  it('lets exactly one of two simultaneous saves from the same version win', async () => {
    const admin = await signedIn(t.app, 'admin@aldercreek.example');
    const base = (await admin.get(URL).expect(200)).body.version as number;
    const results = await Promise.all(
      [11, 13].map((pct) => admin.put(URL).send({ priceBook: { ...demoPriceBook, overhead_pct: pct }, baseVersion: base, note: `overhead ${pct} %` })),
    );
    expect(results.map((r) => r.status).sort()).toEqual([201, 409]);
    expect((await admin.get(URL).expect(200)).body.version).toBe(base + 1);
  });

  it('requires a change note (400 naming note): missing, blank, longer than 500 characters or with a control character', async () => {
    const admin = await signedIn(t.app, 'admin@aldercreek.example');
    const base = (await admin.get(URL).expect(200)).body.version as number;
    for (const note of [undefined, '   ', 'x'.repeat(501), 'bad\u0000note']) {
      const res = await admin.put(URL).send({ priceBook: demoPriceBook, baseVersion: base, note });
      expect(res.status, JSON.stringify(note)).toBe(400);
      expect(res.body.error.fields).toHaveProperty(['note']);
    }
    const noBase = await admin.put(URL).send({ priceBook: demoPriceBook, note: 'no base' });
    expect(noBase.status).toBe(400);
    expect(noBase.body.error.fields).toHaveProperty(['baseVersion']);
    expect((await admin.get(URL)).body.version).toBe(base);
    const ok = await admin.put(URL).send({ priceBook: demoPriceBook, baseVersion: base, note: '  '.concat('x'.repeat(500), '  ') }).expect(201);
    expect(ok.body.version).toBe(base + 1);
  });
});

describe('GET /api/admin/price-book/versions and /versions/:version/diff', () => {
  it('lists versions newest first with note, who and when, and shows what a version changed line by line', async () => {
    const admin = await signedIn(t.app, 'admin@aldercreek.example');
    const base = (await admin.get(URL).expect(200)).body.version as number;
    await admin.put(URL).send({ priceBook: demoPriceBook, baseVersion: base, note: 'reset to the demo book' }).expect(201);
    const changed = structuredClone(demoPriceBook);
    changed.tubes[0]!.perMetre_minor += 150;
    changed.quantityBreaks = [...changed.quantityBreaks, { minQuantity: 50, discount_pct: 9 }];
    changed.margin_pct = demoPriceBook.margin_pct + 1;
    const saved = await admin.put(URL).send({ priceBook: changed, baseVersion: base + 1, note: 'tube 0 up, break at 50, margin up 1 point' }).expect(201);
    const version = saved.body.version as number;

    const list = await admin.get(`${URL}/versions`).expect(200);
    const [newest, previous] = list.body.versions;
    expect(newest).toMatchObject({ version, note: 'tube 0 up, break at 50, margin up 1 point', createdBy: expect.any(String) });
    expect(Number.isNaN(Date.parse(newest.createdAt))).toBe(false);
    expect(previous).toMatchObject({ version: version - 1, note: 'reset to the demo book' });

    const diff = await admin.get(`${URL}/versions/${version}/diff`).expect(200);
    expect(diff.body.version).toBe(version);
    expect(diff.body.previousVersion).toBe(version - 1);
    const n = demoPriceBook.quantityBreaks.length;
    expect(diff.body.changes).toEqual([
      { path: 'margin_pct', before: demoPriceBook.margin_pct, after: demoPriceBook.margin_pct + 1 },
      { path: `quantityBreaks.${n}.discount_pct`, before: null, after: 9 },
      { path: `quantityBreaks.${n}.minQuantity`, before: null, after: 50 },
      { path: 'tubes.0.perMetre_minor', before: demoPriceBook.tubes[0]!.perMetre_minor, after: demoPriceBook.tubes[0]!.perMetre_minor + 150 },
    ]);
    const unchanged = await admin.get(`${URL}/versions/${version - 1}/diff`).expect(200);
    expect(unchanged.body.changes).toEqual([]); // saved the demo book over the demo book
  });

  it('answers 404 for a version that does not exist, 400 for a bad number, 403 to sales', async () => {
    const admin = await signedIn(t.app, 'admin@aldercreek.example');
    expect((await admin.get(`${URL}/versions/999999/diff`)).status).toBe(404);
    const bad = await admin.get(`${URL}/versions/abc/diff`);
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toHaveProperty(['version']);
    const sales = await signedIn(t.app, 'sales@aldercreek.example');
    expect((await sales.get(`${URL}/versions`)).status).toBe(403);
  });
});
