/** GET/PUT /api/admin/price-book: the role matrix, validation naming the field, versions increasing. */
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
    const res = await admin.put(URL).send({ priceBook: changed, note: 'shop rate to 99 USD/h (demo)' });
    expect(res.status).toBe(201);
    expect(res.body.version).toBe(before + 1);
    expect(res.body.priceBook.shopRatePerHour_minor).toBe(9900);
    const after = await admin.get(URL).expect(200);
    expect(after.body.version).toBe(before + 1);
    expect(after.body.priceBook).toEqual(changed);
    const again = await admin.put(URL).send({ priceBook: demoPriceBook }).expect(201);
    expect(again.body.version).toBe(before + 2);
  });

  it('answers 400 naming the bad field and saves nothing', async () => {
    const admin = await signedIn(t.app, 'admin@aldercreek.example');
    const before = (await admin.get(URL).expect(200)).body.version as number;
    const res = await admin.put(URL).send({ priceBook: { ...demoPriceBook, margin_pct: 140 } });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid-input');
    expect(res.body.error.fields).toHaveProperty(['priceBook.margin_pct']);
    const missing = await admin.put(URL).send({ note: 'no book' });
    expect(missing.status).toBe(400);
    expect(missing.body.error.fields).toHaveProperty(['priceBook']);
    expect((await admin.get(URL)).body.version).toBe(before);
  });

  it('refuses customers (403) and anonymous callers (401)', async () => {
    const customer = await signedIn(t.app, 'customer@pellmar.example');
    expect((await customer.put(URL).send({ priceBook: demoPriceBook })).status).toBe(403);
    expect((await client(t.app).put(URL).send({ priceBook: demoPriceBook })).status).toBe(401);
  });
});
