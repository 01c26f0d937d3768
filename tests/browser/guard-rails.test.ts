/**
 * Guard rails (issue 12) as people meet them: a sales engineer cannot save or approve a bundle with
 * more tubes than its tubesheet holds, and a customer whose length limit is below the shortest
 * bundle the shop builds is told so, naming the limit.
 */
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, expect, test } from 'vitest';
import { createDatabase, type Database } from '../../db';
import { tubesheetHolds } from '../../shared/thermal/checks/hard-findings';
import { api, apiSignIn } from './support/api';
import { demoUsers, openPage, sel, signInAs, useBrowser, visit } from './support/browser';
import { paidOrder } from './support/orders';

const browser = useBrowser();
let database: Database;

beforeAll(() => {
  if (!process.env.DATABASE_URL?.includes('_test')) throw new Error('the guard-rails test writes to the test database only (run it through npm test)');
  database = createDatabase(process.env.DATABASE_URL, 2);
});
afterAll(() => database?.pool.end());

/** An invented duty: a hydraulic-oil cooler on plant water. */
type Design = { tubeCount: number; tubeLength_m: number; tubeOuterDiameter_m: number; tubePasses: number; shellInnerDiameter_m: number; layout: 30 | 45 | 60 | 90; tubePitch_m?: number };
async function customerRequest(): Promise<{ id: string; number: string; revision: { design: Design } }> {
  const cookie = await apiSignIn(demoUsers.customer.email);
  return api(cookie, 'POST', '/quotes', {
    quantity: 1,
    reference: `Guard rails ${Date.now()}`,
    duty: {
      process: { fluid: 'oil-vg46', pressure_Pa: 5e5, massFlow_kg_s: 1.2, inletTemp_C: 62, outletTemp_C: 47 },
      boundary: { kind: 'coolant', fluid: 'water', pressure_Pa: 3.5e5, massFlow_kg_s: 2, inletTemp_C: 27 },
      constraints: { maxTubeLength_m: 3.5, maxPressureDrop_Pa: 70e3, maxShellPressureDrop_Pa: 70e3 },
    },
  });
}

async function setNumber(page: Page, field: string, value: number): Promise<void> {
  const input = page.locator(sel(field));
  await input.fill(String(value));
  await input.blur();
}

test('a sales engineer sets more tubes than the shell holds: the hard finding shows in red and the edit cannot be saved, the reason beside the button', async (ctx) => {
  const quote = await customerRequest();
  const page = await openPage(browser(), ctx);
  await signInAs(page, 'sales');
  await visit(page, `/review/${quote.id}`);
  await page.locator(sel('geometry-editor')).waitFor({ timeout: 60_000 });
  expect(await page.locator(sel('live-hard-findings')).count()).toBe(0);
  expect(await page.locator(sel('action-approve')).isDisabled()).toBe(false);

  // one row of tubes more than the sized shell's laid-out tubesheet holds, shared evenly among the passes
  const d = quote.revision.design;
  const holds = tubesheetHolds({ ...d, rating: { warnings: [] } })!;
  const count = (Math.floor(holds / d.tubePasses) + 1) * d.tubePasses;
  await setNumber(page, 'geo-tube-count', count);
  const hard = page.locator(sel('live-hard-findings'));
  await hard.waitFor();
  expect(await hard.locator('h3').textContent()).toBe('Cannot be built as it stands');
  expect(await hard.locator('li').first().textContent()).toMatch(new RegExp(`^${count} tubes do not fit: the [\\d,]+ mm shell's tubesheet, .* holds ${holds}\\. Use at most ${holds} tubes or a larger shell\\.$`));
  expect(await hard.locator('li').first().getAttribute('data-code')).toBe('tubes-do-not-fit');
  expect(await page.locator(sel('geo-save')).isDisabled()).toBe(true);
  expect(await page.locator(sel('geo-save-blocked')).textContent()).toContain(`Cannot save: this bundle cannot be built as it stands (${count} tubes do not fit`);

  // the saved design is buildable: approving it stays possible, and the edit was never stored
  expect(await page.locator(sel('saved-hard-findings')).count()).toBe(0);
  const cookie = await apiSignIn(demoUsers.sales.email);
  const stored = await api<{ revision: { number: number; design: { tubeCount: number } } }>(cookie, 'GET', `/quotes/${quote.id}`);
  expect(stored.revision).toMatchObject({ number: 1, design: { tubeCount: quote.revision.design.tubeCount } });
  expect(await page.locator(sel('action-approve')).isDisabled()).toBe(false);
});

test('a saved design that cannot be built is listed in red in the decision, and approval is disabled with the reason', async (ctx) => {
  const quote = await customerRequest();
  // a revision stored before the guard existed: 5,000 tubes in the sized shell
  await database.pool.query(`update quote_revisions set data = jsonb_set(data, '{design,tubeCount}', '5000'::jsonb) where quote_id = $1 and number = 1`, [quote.id]);
  const page = await openPage(browser(), ctx);
  await signInAs(page, 'sales');
  await visit(page, `/review/${quote.id}`);
  const hard = page.locator(sel('saved-hard-findings'));
  await hard.waitFor({ timeout: 60_000 });
  expect(await hard.locator('li').first().textContent()).toMatch(/^5000 tubes do not fit/);
  expect(await page.locator(sel('action-approve')).isDisabled()).toBe(true);
  expect(await page.locator(sel('action-approve-blocked')).textContent()).toMatch(/^Cannot approve: the saved design cannot be built as it stands/);

  // a bundle shorter than the shortest the shop builds (1.0 m, the price book's default) is hard too
  await setNumber(page, 'geo-tube-count', quote.revision.design.tubeCount);
  await setNumber(page, 'geo-length', 0.8);
  const live = page.locator(sel('live-hard-findings'));
  await page.waitForFunction(() => document.querySelector('[data-test="live-hard-findings"]')?.textContent?.includes('0.8 m'));
  expect(await live.textContent()).toContain('The tube length 0.8 m is below the shortest bundle this shop builds, 1.0 m.');
  expect(await page.locator(sel('geo-save')).isDisabled()).toBe(true);
});

test('a customer whose maximum tube length is 0.2 m is told it is below the shortest bundle the shop builds, and nothing is sent', async (ctx) => {
  const page = await openPage(browser(), ctx);
  await signInAs(page, 'customer');
  await page.locator(sel('nav-quote-new')).click();
  await page.locator(sel('request-duty')).waitFor({ timeout: 60_000 });
  await setNumber(page, 'max-length', 0.2);
  await page.locator(sel('send-request')).click();
  const message = page.locator(sel('sizing-explanation-message'));
  await message.waitFor({ timeout: 30_000 });
  expect(await message.textContent()).toContain('The maximum tube length 0.2 m is below the shortest bundle this shop builds, 1.0 m: allow at least 1.0 m.');
  expect(await page.locator(sel('quote-offer')).count()).toBe(0);
});

test('a paid order whose design the shop cannot drill: release is refused with the reason, and the drilling CSV shows the reason instead of saving a file', async (ctx) => {
  const order = await paidOrder();
  // an order from before the guard: its accepted revision has more tubes than its tubesheet holds
  await database.pool.query(
    `update quote_revisions r set data = jsonb_set(r.data, '{design,tubeCount}', '5000'::jsonb) from orders o where o.id = $1 and r.quote_id = o.quote_id and r.number = o.revision_number`,
    [order.orderId],
  );
  const page = await openPage(browser(), ctx);
  await signInAs(page, 'sales');
  await visit(page, `/staff/orders/${order.orderId}`);
  await page.locator(sel('order-release')).waitFor({ timeout: 60_000 });
  await page.locator(sel('order-release')).click();
  const refused = page.locator(sel('release-error'));
  await refused.waitFor();
  expect(await refused.textContent()).toMatch(/^This order cannot be released to the shop: Cannot be built as it stands: 5000 tubes do not fit/);

  let downloaded = false;
  page.on('download', () => (downloaded = true));
  await page.locator(sel('order-drilling-csv')).click();
  const docError = page.locator(sel('order-doc-error'));
  await docError.waitFor();
  expect(await docError.textContent()).toMatch(/holds \d+ tubes at this pitch and layout, fewer than the 5000 of the design/);
  expect(downloaded).toBe(false);
  expect(await page.locator(sel('order-status')).textContent()).toMatch(/deposit/i);
});
