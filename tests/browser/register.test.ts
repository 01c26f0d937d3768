import { expect, test } from 'vitest';
import { openPage, pathOf, sel, useBrowser, visit } from './support/browser';

const browser = useBrowser();

test('a customer registers with a new organisation and lands on the customer home page', async (ctx) => {
  const stamp = Date.now();
  const email = `engineer-${stamp}@fenwick-air.example`;
  const organization = `Fenwick Air Systems ${stamp}`;
  const page = await openPage(browser(), ctx);
  await visit(page, '/sign-in');
  await page.locator(sel('link-register')).click();
  await page.locator(sel('register-form')).waitFor();

  await page.locator(sel('register-submit')).click();
  await page.getByText('Enter your name.').waitFor();

  await page.locator(sel('register-name')).fill('Ada Lindqvist');
  await page.locator(sel('register-email')).fill(email);
  await page.locator(sel('register-password')).fill('short');
  await page.locator(sel('register-organization')).fill(organization);
  await page.getByText('Use at least 10 characters.').waitFor();
  await page.locator(sel('register-password')).fill('a-long-enough-password');
  await page.locator(sel('register-submit')).click();

  await page.locator(sel('home-customer')).waitFor();
  expect(pathOf(page)).toBe('/');
  expect(await page.locator(sel('user-organization')).textContent()).toBe(organization);
  expect(await page.locator(sel('home-email')).textContent()).toBe(email);
});
