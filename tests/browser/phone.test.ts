import { expect, test } from 'vitest';
import { openPage, pathOf, phone, sel, signInAs, useBrowser, visit } from './support/browser';

const browser = useBrowser();

test('at phone width the navigation lives in a menu drawer', async (ctx) => {
  const page = await openPage(browser(), ctx, phone);
  await signInAs(page, 'admin');

  const header = page.locator(sel('app-header'));
  expect(await header.locator(sel('nav-admin-outbox')).isVisible()).toBe(false);
  expect(await page.locator(sel('sign-out')).isVisible()).toBe(false);
  const pageWidth = await page.evaluate(() => document.documentElement.scrollWidth);
  expect(pageWidth).toBeLessThanOrEqual(phone.width);

  await page.locator(sel('nav-toggle')).click();
  const drawer = page.locator('.n-drawer');
  await drawer.locator(sel('nav-admin-outbox')).waitFor();
  expect(await drawer.locator(sel('user-role')).textContent()).toBe('Administrator');
  await drawer.locator(sel('nav-admin-outbox')).click();
  await page.locator(sel('outbox-page')).waitFor();
  expect(pathOf(page)).toBe('/admin/outbox');
  await drawer.waitFor({ state: 'hidden' });

  await page.locator(sel('nav-toggle')).click();
  await page.locator(sel('drawer-sign-out')).click();
  await page.locator(sel('sign-in-form')).waitFor();
  expect(pathOf(page)).toBe('/sign-in');
});

test('the sign-in page fits a phone screen', async (ctx) => {
  const page = await openPage(browser(), ctx, phone);
  await visit(page, '/sign-in');
  await page.locator(sel('sign-in-form')).waitFor();
  expect(await page.locator(sel('sign-in-submit')).isVisible()).toBe(true);
  const pageWidth = await page.evaluate(() => document.documentElement.scrollWidth);
  expect(pageWidth).toBeLessThanOrEqual(phone.width);
});
