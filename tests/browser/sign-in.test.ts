import { expect, test } from 'vitest';
import { roles, type Role } from '../../shared/schemas/auth';
import {
  DEMO_PASSWORD,
  demoUsers,
  openPage,
  otherCustomer,
  pathOf,
  sel,
  signInAs,
  submitSignIn,
  useBrowser,
  visit,
} from './support/browser';

const browser = useBrowser();

const roleText: Record<Role, string> = {
  customer: 'Customer',
  sales: 'Sales engineer',
  shop: 'Shop',
  admin: 'Administrator',
};
const adminOnlyNav = ['nav-admin-invitations', 'nav-admin-outbox'];

test.for(roles)('%s signs in through the form and lands on their own home page', async (role, ctx) => {
  const page = await openPage(browser(), ctx);
  await visit(page, '/');
  await page.locator(sel('sign-in-form')).waitFor();
  expect(pathOf(page)).toBe('/sign-in');

  await signInAs(page, role);
  expect(pathOf(page)).toBe('/');
  await expect(page.locator(sel('user-name')).textContent()).resolves.toBeTruthy();
  expect(await page.locator(sel('user-role')).textContent()).toBe(roleText[role]);
  expect(await page.locator(sel('user-organization')).textContent()).toBe(demoUsers[role].organization);
  expect(await page.locator(sel('home-email')).textContent()).toBe(demoUsers[role].email);
  expect(await page.locator(sel('home-heading')).isVisible()).toBe(true);

  expect(await page.locator(sel('nav-home')).isVisible()).toBe(true);
  for (const item of adminOnlyNav) {
    expect(await page.locator(sel(item)).count(), item).toBe(role === 'admin' ? 1 : 0);
  }
  if (role === 'admin') {
    expect(await page.locator(sel('home-link-admin-outbox')).isVisible()).toBe(true);
  } else {
    expect(await page.getByText('Outbox', { exact: true }).count()).toBe(0);
  }
});

test('sign-out returns to the sign-in page and the session is gone', async (ctx) => {
  const page = await openPage(browser(), ctx);
  await signInAs(page, 'sales');
  await page.locator(sel('sign-out')).click();
  await page.locator(sel('sign-in-form')).waitFor();
  expect(pathOf(page)).toBe('/sign-in');

  await visit(page, '/');
  await page.locator(sel('sign-in-form')).waitFor();
  expect(pathOf(page)).toBe('/sign-in');
});

test('a wrong password shows the error and stays on the sign-in page', async (ctx) => {
  const page = await openPage(browser(), ctx);
  await submitSignIn(page, demoUsers.shop.email, 'not-the-password');
  const error = page.locator(sel('sign-in-error'));
  await error.waitFor();
  expect(await error.textContent()).toMatch(/do not match an account/);
  expect(pathOf(page)).toBe('/sign-in');
});

test('the form checks the fields before asking the server', async (ctx) => {
  const page = await openPage(browser(), ctx);
  await submitSignIn(page, 'not-an-address', '');
  await page.getByText('Enter a valid e-mail address.').waitFor();
  await page.getByText('Enter your password.').waitFor();
  expect(await page.locator(sel('sign-in-error')).count()).toBe(0);
});

test('a customer sent to an admin page is brought home with a notice', async (ctx) => {
  const page = await openPage(browser(), ctx);
  await signInAs(page, 'customer');
  await visit(page, '/admin/outbox');
  await page.locator(sel('notice')).waitFor();
  expect(pathOf(page)).toBe('/');
  expect(await page.locator(sel('outbox-page')).count()).toBe(0);
});

test('an anonymous visitor to a page signs in and comes back to it', async (ctx) => {
  const page = await openPage(browser(), ctx);
  await visit(page, '/admin/outbox');
  await page.locator(sel('sign-in-form')).waitFor();
  expect(new URL(page.url()).searchParams.get('next')).toBe('/admin/outbox');
  await submitSignIn(page, demoUsers.admin.email, DEMO_PASSWORD);
  await page.locator(sel('outbox-page')).waitFor();
  expect(pathOf(page)).toBe('/admin/outbox');
});

test('an unknown address shows the not-found page', async (ctx) => {
  const page = await openPage(browser(), ctx);
  await visit(page, '/no/such/page');
  await page.locator(sel('not-found')).waitFor();
  expect(await page.locator(sel('not-found-sign-in')).isVisible()).toBe(true);
});

test('a customer of another organisation sees their own organisation', async (ctx) => {
  const page = await openPage(browser(), ctx);
  await submitSignIn(page, otherCustomer.email, DEMO_PASSWORD);
  await page.locator(sel('home-customer')).waitFor();
  expect(await page.locator(sel('user-organization')).textContent()).toBe(otherCustomer.organization);
});

test('when the session ends on the server, the next request leads to sign-in and back', async (ctx) => {
  const page = await openPage(browser(), ctx);
  await signInAs(page, 'admin');
  await page.locator(sel('nav-admin-outbox')).click();
  // Wait for the first load to finish: a button that is still loading ignores clicks.
  await page.locator(`${sel('outbox-row')}, ${sel('outbox-empty')}`).first().waitFor();

  await page.context().clearCookies();
  await page.locator(sel('outbox-refresh')).click();
  await page.locator(sel('sign-in-form')).waitFor();
  expect(new URL(page.url()).searchParams.get('next')).toBe('/admin/outbox');
  await submitSignIn(page, demoUsers.admin.email, DEMO_PASSWORD);
  await page.locator(sel('outbox-page')).waitFor();
});
