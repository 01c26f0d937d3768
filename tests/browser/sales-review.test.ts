import type { Page } from 'playwright-core';
import { expect, test } from 'vitest';
import { demoUsers, openPage, pathOf, sel, signInAs, useBrowser, visit } from './support/browser';
import { api, apiSignIn } from './support/api';

const browser = useBrowser();



/** An invented duty: a hydraulic-oil cooler on plant water. */
async function customerRequest(reference: string): Promise<{ id: string; number: string }> {
  const cookie = await apiSignIn(demoUsers.customer.email);
  return api(cookie, 'POST', '/quotes', {
    quantity: 1,
    reference,
    duty: {
      process: { fluid: 'oil-vg46', pressure_Pa: 5e5, massFlow_kg_s: 1.2, inletTemp_C: 62, outletTemp_C: 47 },
      boundary: { kind: 'coolant', fluid: 'water', pressure_Pa: 3.5e5, massFlow_kg_s: 2, inletTemp_C: 27 },
      constraints: { maxTubeLength_m: 3.5, maxPressureDrop_Pa: 70e3, maxShellPressureDrop_Pa: 70e3 },
    },
  });
}

/** Picks an option of a naive-ui select by its visible label. */
async function choose(page: Page, select: string, label: string): Promise<void> {
  await page.locator(sel(select)).click();
  await page.locator('.n-base-select-option').filter({ hasText: label }).first().click();
}

async function openFromQueue(page: Page, number: string): Promise<void> {
  await page.locator(sel('nav-review-queue')).click();
  await page.locator(sel('queue-table')).waitFor();
  await page.locator(sel('queue-search')).fill(number);
  const row = page.locator(`${sel('queue-row')}[data-number="${number}"]`);
  await row.waitFor();
  expect(await row.locator(sel('queue-age')).textContent()).toMatch(/\d+ h of \d+ h/);
  await row.click();
  await page.locator(sel('geometry-editor')).waitFor();
}

test('a sales engineer changes the tube material, sees the U of the bundle and the price move, saves and approves; the offer e-mail goes out', async (ctx) => {
  const quote = await customerRequest(`HPU-${Date.now()}`);
  const page = await openPage(browser(), ctx);
  await signInAs(page, 'sales');
  await openFromQueue(page, quote.number);
  expect(pathOf(page)).toBe(`/review/${quote.id}`);
  expect(await page.locator(sel('workspace-number')).textContent()).toBe(quote.number);

  // stainless conducts about a third as well as carbon steel: the bundle's U falls at once. (The
  // margin may stay put: the length this bundle needs can sit where one more baffle fits, a step
  // that a small change of U does not move.)
  const uBefore = await page.locator(sel('live-u')).textContent();
  await choose(page, 'geo-material', 'Stainless steel 316');
  await page.waitForFunction((before) => document.querySelector('[data-test="live-u"]')?.textContent !== before, uBefore);
  expect(parseFloat((await page.locator(sel('live-u')).textContent())!)).toBeLessThan(parseFloat(uBefore!));
  expect(await page.locator(sel('live-margin')).textContent()).toMatch(/^-?\d+\.\d %$/);
  await page.locator(sel('live-price')).waitFor();
  expect(await page.locator(sel('live-price-delta')).textContent()).toMatch(/^\+/);
  expect(await page.locator(sel('live-price-margin')).textContent()).toMatch(/margin/);

  await page.locator(sel('geo-save')).click();
  await page.waitForFunction(() => document.querySelector('[data-test="workspace-header"]')?.textContent?.includes('(draft)'));
  expect(await page.locator(sel('design-tube')).first().textContent()).toBeTruthy();
  await page.locator('.n-tabs-tab').filter({ hasText: 'Notes and history' }).click();
  await page.locator(sel('event-internal')).first().waitFor();

  await page.locator(sel('action-message')).fill('Stainless tubes as agreed on the phone.');
  await page.locator(sel('action-approve')).click();
  await page.waitForFunction(() => document.querySelector('[data-test="workspace-status"]')?.textContent?.includes('Approved'));
  expect(await page.locator(sel('workspace-offer-pdf')).getAttribute('href')).toBe(`/api/quotes/${quote.id}/offer.pdf`);

  const admin = await openPage(browser(), ctx);
  await signInAs(admin, 'admin');
  await admin.locator(sel('nav-admin-outbox')).click();
  await admin.locator(sel('outbox-table')).waitFor();
  const row = admin.locator(sel('outbox-row')).filter({ hasText: demoUsers.customer.email }).filter({ hasText: /is ready/ }).filter({ hasText: quote.number });
  for (let attempt = 0; attempt < 20 && (await row.count()) === 0; attempt++) {
    await admin.waitForTimeout(750);
    await admin.locator(sel('outbox-refresh')).click();
  }
  expect(await row.count()).toBeGreaterThan(0);
});

test('a save over someone else\'s change is refused with a reload message; what was typed stays', async (ctx) => {
  const quote = await customerRequest(`HPU-stale-${Date.now()}`);
  const page = await openPage(browser(), ctx);
  await signInAs(page, 'sales');
  await visit(page, `/review/${quote.id}`);
  await page.locator(sel('geometry-editor')).waitFor();

  // Another engineer adds a note through the API: the version the page holds is now stale.
  const other = await apiSignIn(demoUsers.sales.email);
  const current = await api<{ version: number }>(other, 'GET', `/quotes/${quote.id}`);
  await api(other, 'PATCH', `/quotes/${quote.id}`, { version: current.version, internalNote: 'Checked the water analysis.' });

  await choose(page, 'geo-material', 'Titanium grade 2');
  await page.locator(sel('geo-save')).click();
  await page.locator(sel('stale-banner')).waitFor();
  expect(await page.locator(sel('stale-banner')).textContent()).toContain('reload to see their change');
  expect(await page.locator(sel('geo-save-error')).textContent()).toContain('someone else');

  await page.locator(sel('stale-reload')).click();
  await page.locator(sel('stale-banner')).waitFor({ state: 'detached' });
  expect(await page.locator(sel('geo-material')).textContent()).toContain('Titanium');
  await page.locator(sel('geo-save')).click();
  await page.waitForFunction(() => document.querySelector('[data-test="workspace-header"]')?.textContent?.includes('(draft)'));
});
