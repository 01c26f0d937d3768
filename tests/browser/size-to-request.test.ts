/**
 * Issue 12, sizing to request in one flow: a visitor enters 60 L/min of ISO VG 46 oil on the sizing
 * page, sizes, picks an alternative in the table, clicks "Request this design", signs in as the
 * customer and comes back to the new-request page, which shows the same design; the request is sent
 * and the quote holds that same design (tube count, length, shell).
 */
import type { Page } from 'playwright-core';
import { expect, test } from 'vitest';
import { DEMO_PASSWORD, demoUsers, openPage, pathOf, sel, submitSignIn, useBrowser, visit } from './support/browser';

const browser = useBrowser();

/** Opens a select, types to filter when it is filterable (long lists render only what is in view), picks the option. */
async function choose(page: Page, select: string, option: string | RegExp, typed?: string): Promise<void> {
  await page.locator(sel(select)).click();
  if (typed) await page.keyboard.type(typed);
  await page.locator('.n-base-select-option').filter({ hasText: option }).first().click();
}

/** Tube count, length and shell of the design a page shows. */
async function designOf(page: Page, count: string, length: string): Promise<string[]> {
  return Promise.all([page.locator(sel(count)).first().textContent(), page.locator(sel(length)).first().textContent(), page.locator(sel('design-shell')).first().textContent()]) as Promise<string[]>;
}

test('60 L/min of oil: size, pick an alternative, request it after signing in, the quote holds that design', { timeout: 240_000 }, async (ctx) => {
  const page = await openPage(browser(), ctx);
  await visit(page, '/size');
  await page.locator(sel('sizing-form')).waitFor({ timeout: 60_000 });

  await choose(page, 'process-fluid', 'Mineral oil ISO VG 46', 'VG 46');
  await choose(page, 'process-flow-unit', /^L\/min$/);
  const flow = page.locator(sel('process-flow'));
  await flow.fill('60');
  await flow.blur();
  // the unit menu offers volume and normal/standard flows besides mass flows
  await page.locator(sel('process-flow-unit')).click();
  for (const unit of ['kg/s', 'lb/h', 'm³/h', 'US gpm', 'Nm³/h', 'Nm³/min', 'SCFM']) {
    await page.locator('.n-base-select-option').filter({ hasText: new RegExp(`^${unit.replace('/', '\\/')}$`) }).first().waitFor();
  }
  await page.keyboard.press('Escape');

  await page.locator(sel('size-it')).click();
  await page.locator(sel('sizing-design')).waitFor({ timeout: 60_000 });
  const rows = page.locator(`${sel('sizing-alternatives')} ${sel('alternative-row')}`);
  expect(await rows.count()).toBeGreaterThan(1);
  // every row shows its relative cost; the recommended one is 100
  expect(await page.locator(`${sel('alternative-row')}[data-recommended="true"] ${sel('alternative-cost')}`).textContent()).toBe('100');
  expect(await rows.nth(1).locator(sel('alternative-cost')).textContent()).toMatch(/^\d+$/);

  // picking the second row makes it the design shown and the one the request carries
  await rows.nth(1).click();
  expect(await page.locator(sel('design-label')).textContent()).toBe('Picked: alternative 2');
  expect(await rows.nth(1).getAttribute('data-picked')).toBe('true');
  expect(await page.locator(sel('request-design-bar')).textContent()).toMatch(/Alternative 2:.*Sign in to ask for a priced offer/);
  const seen = await designOf(page, 'design-tube-count', 'design-tube-length');

  // a guest goes through sign-in and comes back to the request page with the duty and the design
  await page.locator(sel('request-design')).click();
  await page.waitForURL(/\/sign-in/);
  await submitSignIn(page, demoUsers.customer.email, DEMO_PASSWORD);
  await page.locator(sel('request-page')).waitFor();
  expect(pathOf(page)).toBe('/quotes/new');
  await page.locator(`${sel('request-answer')} ${sel('sizing-design')}`).waitFor({ timeout: 60_000 });
  expect(await page.locator(sel('request-chosen')).textContent()).toMatch(/alternative 2/);
  expect(await designOf(page, 'design-tube-count', 'design-tube-length')).toEqual(seen);
  expect(await page.locator(sel('process-flow')).inputValue()).toBe('60');
  // the same answer as the sizing page: the alternatives with the picked row marked
  expect(await page.locator(`${sel('request-answer')} ${sel('alternative-row')}`).nth(1).getAttribute('data-picked')).toBe('true');

  await page.locator(sel('request-reference')).fill(`Oil 60 L/min ${Date.now()}`);
  await page.locator(sel('send-request')).click();
  await page.locator(sel('quote-offer')).waitFor({ timeout: 60_000 });
  expect(await designOf(page, 'quote-tube-count', 'quote-tube-length')).toEqual(seen);
});
