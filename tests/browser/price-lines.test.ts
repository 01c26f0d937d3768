/**
 * Price lines in the review workspace (issue 12): column headings and words instead of codes; a sales
 * engineer adds a freight line with its reason, sees the total move by the amount, approves, and then
 * no editing control is left on the page (not merely disabled).
 */
import { expect, test } from 'vitest';
import { demoUsers, openPage, sel, signInAs, useBrowser, visit } from './support/browser';
import { api, apiSignIn } from './support/api';

const browser = useBrowser();

/** An invented hydraulic-oil cooler on plant water, requested through the API. */
async function customerRequest(): Promise<{ id: string; number: string }> {
  const cookie = await apiSignIn(demoUsers.customer.email);
  return api(cookie, 'POST', '/quotes', {
    quantity: 1,
    reference: `HPU-freight-${Date.now()}`,
    duty: {
      process: { fluid: 'oil-vg46', pressure_Pa: 5e5, massFlow_kg_s: 1.2, inletTemp_C: 62, outletTemp_C: 47 },
      boundary: { kind: 'coolant', fluid: 'water', pressure_Pa: 3.5e5, massFlow_kg_s: 2, inletTemp_C: 27 },
      constraints: { maxTubeLength_m: 3.5, maxPressureDrop_Pa: 70e3, maxShellPressureDrop_Pa: 70e3 },
    },
  });
}

/** "£12,345.60" / "US$12,345.60" → 12345.6 */
const amount = (text: string | null) => Number((text ?? '').replace(/[^\d.]/g, ''));

test('a sales engineer adds a freight line with a reason, the total moves, and after approval the editing controls are gone', async (ctx) => {
  const quote = await customerRequest();
  const page = await openPage(browser(), ctx);
  await signInAs(page, 'sales');
  await visit(page, `/review/${quote.id}`);
  await page.locator(sel('geometry-editor')).waitFor({ timeout: 60_000 });
  await page.locator('.n-tabs-tab').filter({ hasText: /^Price$/ }).click();
  const lines = page.locator(sel('price-lines'));
  await lines.waitFor();

  // headings over the columns, group names and words rather than codes
  expect(await lines.locator('thead th').allTextContents()).toEqual(['Item', 'Quantity', 'Rate', 'Amount']);
  const body = (await lines.textContent()) ?? '';
  expect(body).toContain('Material');
  expect(body).toContain('Labour');
  expect(body).not.toMatch(/carbon-steel|perTubeEnd|fitUp/);

  const before = amount(await page.locator(sel('price-total')).textContent());
  await page.locator(sel('free-line-add')).click();
  await page.locator(sel('free-line-description-0')).fill('DAP Rotterdam, two pallets');
  await page.locator(sel('free-line-amount-0')).fill('1850');
  await page.locator(sel('free-line-amount-0')).blur(); // the number field takes its value on blur
  // without a reason the line cannot be saved
  expect(await page.locator(sel('free-line-problem-0')).textContent()).toContain('Say why');
  expect(await page.locator(sel('price-save')).isDisabled()).toBe(true);
  await page.locator(sel('free-line-reason-0')).fill('Carrier quote 4471 (invented)');
  await page.locator(sel('price-save')).click();
  await page.waitForFunction(
    (old) => document.querySelector('[data-test="price-total"]')?.textContent?.replace(/[^\d.]/g, '') !== String(old.toFixed(2)),
    before,
  );
  expect(amount(await page.locator(sel('price-total')).textContent())).toBeCloseTo(before + 1850, 2);
  const freight = page.locator(sel('price-group-extra')).locator(sel('price-line'));
  expect(await freight.locator(sel('price-line-description')).textContent()).toBe('Freight: DAP Rotterdam, two pallets');
  expect(await freight.textContent()).toContain('Carrier quote 4471 (invented)');

  await page.locator(sel('action-message')).fill('Freight to your dock included.');
  await page.locator(sel('action-approve')).click();
  await page.waitForFunction(() => document.querySelector('[data-test="workspace-status"]')?.textContent?.includes('Approved'));

  // nothing left to edit: no override, no added-line editor, no save, no geometry editor, no duty save
  await page.locator('.n-tabs-tab').filter({ hasText: /^Price$/ }).click();
  await page.locator(sel('price-group-extra')).waitFor();
  expect(amount(await page.locator(sel('price-total')).textContent())).toBeCloseTo(before + 1850, 2);
  for (const control of ['price-override', 'free-line-add', 'free-lines', 'price-save', 'override-editor']) {
    expect(await page.locator(sel(control)).count(), control).toBe(0);
  }
  await page.locator('.n-tabs-tab').filter({ hasText: /^Design$/ }).click();
  await page.locator(sel('saved-design')).waitFor();
  expect(await page.locator(sel('geometry-editor')).count()).toBe(0);
  expect(await page.locator(sel('geo-save')).count()).toBe(0);
  await page.locator('.n-tabs-tab').filter({ hasText: /^Duty$/ }).click();
  await page.locator(sel('duty-read-only')).waitFor();
  expect(await page.locator(sel('duty-save')).count()).toBe(0);
});
