/**
 * The price book's tables as CSV and the tube import preview (issue 12): GET
 * /api/admin/price-book/tables/<table>.csv (admin only) and POST /tubes/import-preview, which reads a
 * file, names each problem by line and column, compares it with the active book and stores nothing;
 * the confirmed table is then saved as a new version through the ordinary PUT.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seedPriceBook } from '../../db/seed-price-book';
import { demoPriceBook } from '../../server/features/pricing/demo-price-book';
import { csvLine, parseCsv } from '../../shared/csv';
import { client, signedIn, startTestApp, type TestApp } from './support/app';

const URL = '/api/admin/price-book';
let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
  await seedPriceBook(t.database.db);
  // start from the demo book's tubes (an earlier run or another file may have saved others)
  const admin = await signedIn(t.app, 'admin@aldercreek.example');
  const active = (await admin.get(URL).expect(200)).body;
  if (JSON.stringify(active.priceBook.tubes) !== JSON.stringify(demoPriceBook.tubes)) {
    await admin.put(URL).send({ priceBook: { ...active.priceBook, tubes: demoPriceBook.tubes }, baseVersion: active.version, note: 'demo tubes (test)' }).expect(201);
  }
});
afterAll(() => t.close());

const versionCount = async () => Number((await t.database.pool.query('select count(*) from price_books')).rows[0].count);

describe('GET /api/admin/price-book/tables/<table>.csv', () => {
  it('gives an admin each table with words for materials and prices in major units', async () => {
    const admin = await signedIn(t.app, 'admin@aldercreek.example');
    const book = (await admin.get(URL).expect(200)).body;
    const res = await admin.get(`${URL}/tables/tubes.csv`).expect(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv/);
    expect(res.headers['content-disposition']).toMatch(new RegExp(`^attachment; filename="price-book-v${book.version}-tubes-\\d{4}-\\d{2}-\\d{2}\\.csv"$`));
    const [head, first] = parseCsv(res.text);
    expect(head!.cells).toEqual(['Material', 'OD', 'Wall', `Per metre (${book.priceBook.currency})`]);
    expect(first!.cells[0]).not.toMatch(/-/); // "Copper (C12200)", not "copper" or "carbon-steel"
    expect(first!.cells[3]).toBe((book.priceBook.tubes[0].perMetre_minor / 100).toFixed(2));
    expect(parseCsv(res.text)).toHaveLength(book.priceBook.tubes.length + 1);
    for (const table of ['plate', 'shellPipe', 'heads', 'nozzles', 'quantityBreaks']) await admin.get(`${URL}/tables/${table}.csv`).expect(200);
  });

  it('is refused to sales and customers, and a JSON 400 for an unknown table', async () => {
    expect((await (await signedIn(t.app, 'sales@aldercreek.example')).get(`${URL}/tables/tubes.csv`)).status).toBe(403);
    expect((await (await signedIn(t.app, 'customer@pellmar.example')).get(`${URL}/tables/tubes.csv`)).status).toBe(403);
    expect((await client(t.app).get(`${URL}/tables/tubes.csv`)).status).toBe(401);
    const admin = await signedIn(t.app, 'admin@aldercreek.example');
    const bad = await admin.get(`${URL}/tables/secrets.csv`).expect(400);
    expect(bad.body.error.fields).toHaveProperty('file');
  });
});

describe('POST /api/admin/price-book/tubes/import-preview', () => {
  it('lists added, changed and removed rows against the active book and stores nothing', async () => {
    const admin = await signedIn(t.app, 'admin@aldercreek.example');
    const exported = (await admin.get(`${URL}/tables/tubes.csv`).expect(200)).text;
    const [head, ...rows] = parseCsv(exported);
    const edited = [
      head!.cells,
      [rows[0]!.cells[0], rows[0]!.cells[1], rows[0]!.cells[2], '999.99'], // changed
      ...rows.slice(2).map((r) => r.cells), // row 2 removed
      ['stainless-316', '7/8 in', 'BWG 14', '$1,234.50'], // added, by id, with a currency sign and grouping
    ];
    const before = await versionCount();
    const res = await admin.post(`${URL}/tubes/import-preview`).send({ csv: edited.map((r) => csvLine(r)).join('') }).expect(200);
    expect(res.body.problems).toEqual([]);
    expect(res.body.changed).toHaveLength(1);
    expect(res.body.changed[0].after.perMetre_minor).toBe(99_999);
    expect(res.body.removed).toHaveLength(1);
    expect(res.body.added).toEqual([{ material: 'stainless-316', od: '7/8 in', wall: 'BWG 14', perMetre_minor: 123_450 }]);
    expect(res.body.unchanged).toBe(rows.length - 2);
    expect(res.body.tubes).toHaveLength(rows.length);
    expect(await versionCount()).toBe(before);
    // the admin confirms: the ordinary save path stores it as the next version
    const book = (await admin.get(URL).expect(200)).body;
    const saved = await admin.put(URL).send({ priceBook: { ...book.priceBook, tubes: res.body.tubes }, baseVersion: res.body.baseVersion, note: 'tube prices from CSV' }).expect(201);
    expect(saved.body.version).toBe(book.version + 1);
    expect(saved.body.priceBook.tubes).toContainEqual({ material: 'stainless-316', od: '7/8 in', wall: 'BWG 14', perMetre_minor: 123_450 });
    // other test files price from the active book: put the tubes back as they were
    await admin.put(URL).send({ priceBook: book.priceBook, baseVersion: saved.body.version, note: 'tube prices back (test)' }).expect(201);
  });

  it('names the line and the column of every problem and previews nothing', async () => {
    const admin = await signedIn(t.app, 'admin@aldercreek.example');
    const csv = [
      'Material,OD,Wall,Per metre (USD)',
      'Carbon steel,3/4 in,BWG 16,12.40',
      'unobtainium,3/4 in,BWG 16,5',
      'Carbon steel,,BWG 16,abc',
      'Copper (C12200),1 in,BWG 18,1.234',
      'carbon-steel,3/4 in,bwg 16,13',
    ].join('\n');
    const res = await admin.post(`${URL}/tubes/import-preview`).send({ csv }).expect(200);
    expect(res.body.tubes).toEqual([]);
    expect(res.body.problems).toEqual([
      { line: 3, column: 'Material', message: expect.stringContaining('“unobtainium” is not a tube material') },
      { line: 4, column: 'OD', message: expect.stringContaining('outside diameter') },
      { line: 4, column: 'Per metre', message: expect.stringContaining('“abc” is not a price') },
      { line: 5, column: 'Per metre', message: 'Use at most 2 decimals.' },
      { line: 6, column: null, message: 'The same tube as on line 2.' },
    ]);
  });

  it('names a missing column, another currency and an unclosed quote', async () => {
    const admin = await signedIn(t.app, 'admin@aldercreek.example');
    const noWall = await admin.post(`${URL}/tubes/import-preview`).send({ csv: 'Material,OD,Per metre\nCopper,1 in,3\n' }).expect(200);
    expect(noWall.body.problems).toEqual([{ line: 1, column: null, message: expect.stringContaining('missing: Wall') }]);
    const euro = await admin.post(`${URL}/tubes/import-preview`).send({ csv: 'Material,OD,Wall,Per metre (EUR)\nCopper,1 in,BWG 18,3\n' }).expect(200);
    expect(euro.body.problems[0]).toMatchObject({ line: 1, column: 'Per metre (EUR)', message: 'Prices are in EUR; the book is in USD.' });
    const open = await admin.post(`${URL}/tubes/import-preview`).send({ csv: 'Material,OD,Wall,Per metre\nCopper,"1 in,BWG 18,3\n' }).expect(200);
    expect(open.body.problems).toEqual([{ line: 2, column: null, message: 'a quoted field is not closed.' }]);
  });

  it('answers 400 naming csv for an empty body, 403 to sales', async () => {
    const admin = await signedIn(t.app, 'admin@aldercreek.example');
    const empty = await admin.post(`${URL}/tubes/import-preview`).send({ csv: '' }).expect(400);
    expect(empty.body.error.fields).toEqual({ csv: 'The file is empty.' });
    const sales = await signedIn(t.app, 'sales@aldercreek.example');
    expect((await sales.post(`${URL}/tubes/import-preview`).send({ csv: 'a' })).status).toBe(403);
  });
});
