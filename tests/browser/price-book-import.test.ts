/**
 * The admin imports the price book's tube table from CSV (issue 12): a file with mistakes is shown
 * line by line with the column at fault and nothing can be saved; a corrected file previews what
 * changes (a price changed, a row removed) and, confirmed, becomes the next price-book version.
 */
import { afterAll, expect, test } from 'vitest';
import { parseCsv, csvLine } from '../../shared/csv';
import type { PriceBook } from '../../shared/schemas/price-book';
import { apiAs, apiSignIn } from './support/api';
import { BASE_URL, demoUsers, openPage, sel, signInAs, useBrowser, visit } from './support/browser';

const browser = useBrowser();
type Stored = { version: number; priceBook: PriceBook };
let original: Stored | undefined;

afterAll(async () => {
  // other tests price from the active book: put its tubes back as they were
  if (!original) return;
  const admin = await apiAs(demoUsers.admin.email);
  const now = await admin<Stored>('GET', '/admin/price-book');
  if (JSON.stringify(now.priceBook.tubes) !== JSON.stringify(original.priceBook.tubes)) {
    await admin('PUT', '/admin/price-book', { priceBook: { ...now.priceBook, tubes: original.priceBook.tubes }, baseVersion: now.version, note: 'tubes back (browser test)' });
  }
});

test('an admin previews a CSV of tube prices, sees each mistake by line and column, then saves a corrected file as a new version', async (ctx) => {
  const admin = await apiAs(demoUsers.admin.email);
  original = await admin<Stored>('GET', '/admin/price-book');
  const cookie = await apiSignIn(demoUsers.admin.email);
  const exported = await (await fetch(`${BASE_URL}/api/admin/price-book/tables/tubes.csv`, { headers: { Cookie: cookie } })).text();
  const [head, ...rows] = parseCsv(exported);

  const page = await openPage(browser(), ctx);
  await signInAs(page, 'admin');
  await visit(page, '/admin/price-book');
  await page.locator(sel('pb-tubes-row')).first().waitFor({ timeout: 60_000 });
  expect(await page.locator(sel('pb-tubes-csv')).getAttribute('href')).toBe('/api/admin/price-book/tables/tubes.csv');

  // a file with mistakes: nothing can be saved, each mistake names its line and column
  const bad = [head!.cells, ['Carbon steel', '3/4 in', 'BWG 16', '12.40'], ['unobtainium', '1 in', 'BWG 18', '5'], ['Copper', '1 in', 'BWG 18', 'twelve']].map((r) => csvLine(r)).join('');
  await page.locator(sel('tube-import-file')).setInputFiles({ name: 'tubes-bad.csv', mimeType: 'text/csv', buffer: Buffer.from(bad) });
  await page.locator(sel('tube-import-problem')).first().waitFor({ timeout: 30_000 });
  const problems = await page.locator(sel('tube-import-problem')).allTextContents();
  expect(problems[0]).toMatch(/^\s*Line 3, Material: “unobtainium” is not a tube material/);
  expect(problems[1]).toMatch(/^\s*Line 4, Per metre: “twelve” is not a price/);
  expect(await page.locator(sel('tube-import-confirm')).count()).toBe(0);

  // the corrected file: the first row's price changed, the last row dropped
  const first = rows[0]!.cells;
  const good = [head!.cells, [first[0], first[1], first[2], '77.77'], ...rows.slice(1, -1).map((r) => r.cells)].map((r) => csvLine(r)).join('');
  await page.locator(sel('tube-import-file')).setInputFiles({ name: 'tubes-2027.csv', mimeType: 'text/csv', buffer: Buffer.from(good) });
  await page.locator(sel('tube-import-summary')).waitFor({ timeout: 30_000 });
  expect((await page.locator(sel('tube-import-summary')).textContent())!.replace(/\s+/g, ' ').trim()).toBe(
    `0 rows added, 1 changed, 1 removed, ${rows.length - 2} unchanged.`,
  );
  expect(await page.locator(sel('tube-import-changed')).textContent()).toContain(`${first[0]}, ${first[1]}, ${first[2]}: US$${first[3]} to US$77.77 per metre`);
  expect(await page.locator(sel('tube-import-removed')).textContent()).toContain(rows.at(-1)!.cells[1]);
  expect(await page.locator(sel('tube-import-note')).inputValue()).toBe('Tube prices imported from tubes-2027.csv');

  await page.locator(sel('tube-import-confirm')).click();
  await page.locator(sel('price-book-saved')).waitFor({ timeout: 30_000 });
  expect(await page.locator(sel('price-book-saved')).textContent()).toContain(`Saved as version ${original.version + 1}`);
  expect(await page.locator(sel('tube-import-preview')).count()).toBe(0);
  const saved = await admin<Stored>('GET', '/admin/price-book');
  expect(saved.version).toBe(original.version + 1);
  expect(saved.priceBook.tubes).toHaveLength(rows.length - 1);
  expect(saved.priceBook.tubes[0]!.perMetre_minor).toBe(7777);
  const history = await admin<{ versions: { version: number; note: string }[] }>('GET', '/admin/price-book/versions');
  expect(history.versions[0]).toMatchObject({ version: saved.version, note: 'Tube prices imported from tubes-2027.csv' });
}, 180_000);
