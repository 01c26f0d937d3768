import type { Page } from 'playwright-core';
import { expect, test } from 'vitest';
import {
  BASE_URL,
  DEMO_PASSWORD,
  openPage,
  pathOf,
  sel,
  signInAs,
  submitSignIn,
  useBrowser,
  visit,
} from './support/browser';

const browser = useBrowser();

/** Refreshes the Outbox until a row for `to` appears (mail goes out through a job queue). */
async function waitForMail(page: Page, to: string, subject: RegExp): Promise<void> {
  const row = page.locator(sel('outbox-row')).filter({ hasText: to }).filter({ hasText: subject });
  for (let attempt = 0; attempt < 20; attempt++) {
    if ((await row.count()) > 0) return;
    await page.waitForTimeout(750);
    await page.locator(sel('outbox-refresh')).click();
    await page.locator('.n-data-table .n-base-loading').waitFor({ state: 'detached' }).catch(() => undefined);
  }
  throw new Error(`no e-mail to ${to} matching ${subject} appeared in the Outbox`);
}

test('admin reads a password-reset e-mail in the Outbox; its link sets a new password', async (ctx) => {
  // A customer of our own, so the demo accounts keep their passwords.
  const email = `reset-${Date.now()}@fenwick-air.example`;
  const anonymous = await openPage(browser(), ctx);
  const headers = { Origin: BASE_URL, 'X-Requested-With': 'bundlesmith' };
  const requested = await anonymous.request.post(`${BASE_URL}/api/auth/register`, {
    headers,
    data: { name: 'Rosa Ekwueme', email, password: DEMO_PASSWORD, organizationName: `Fenwick Air ${Date.now()}` },
  });
  expect(requested.status()).toBe(202);

  const page = await openPage(browser(), ctx);
  await signInAs(page, 'admin');
  await page.locator(sel('nav-admin-outbox')).click();
  await page.locator(sel('outbox-table')).waitFor();
  expect(pathOf(page)).toBe('/admin/outbox');

  // the account is made by the link e-mailed at registration
  await waitForMail(page, email, /Finish creating/);
  await page.locator(sel('outbox-row')).filter({ hasText: email }).filter({ hasText: /Finish creating/ }).first().click();
  const confirmHref = await page.locator(sel('mail-detail')).locator(sel('mail-link')).first().getAttribute('href');
  const token = new URL(confirmHref!).searchParams.get('token');
  const created = await anonymous.request.post(`${BASE_URL}/api/auth/register/confirm`, { headers, data: { token } });
  expect(created.status()).toBe(201);
  await anonymous.context().clearCookies();
  await page.keyboard.press('Escape');
  await page.locator(sel('mail-detail')).waitFor({ state: 'detached' });
  await visit(anonymous, '/reset-password');
  await anonymous.locator(sel('reset-request-email')).fill(email);
  await anonymous.locator(sel('reset-request-submit')).click();
  await anonymous.locator(sel('reset-request-sent')).waitFor();

  await waitForMail(page, email, /password/i);
  await page.locator(sel('outbox-row')).filter({ hasText: email }).filter({ hasText: /password/i }).first().click();
  const detail = page.locator(sel('mail-detail'));
  await detail.waitFor();
  expect(await detail.locator(sel('mail-to')).textContent()).toContain(email);
  expect(await detail.locator(sel('mail-text')).textContent()).toBeTruthy();
  const href = await detail.locator(sel('mail-link')).first().getAttribute('href');
  expect(href).toMatch(/\/reset-password\/confirm\?token=/);

  const link = new URL(href!);
  await visit(anonymous, link.pathname + link.search);
  await anonymous.locator(sel('reset-confirm-password')).fill('a-brand-new-password');
  await anonymous.locator(sel('reset-confirm-submit')).click();
  await anonymous.locator(sel('reset-done')).waitFor();
  await submitSignIn(anonymous, email, 'a-brand-new-password');
  await anonymous.locator(sel('home-customer')).waitFor();

  // The link works once.
  await anonymous.locator(sel('sign-out')).click();
  await anonymous.locator(sel('sign-in-form')).waitFor();
  await visit(anonymous, link.pathname + link.search);
  await anonymous.locator(sel('reset-confirm-password')).fill('yet-another-password');
  await anonymous.locator(sel('reset-confirm-submit')).click();
  await anonymous.locator(sel('reset-confirm-error')).waitFor();
});

test('admin invites a sales engineer, who registers from the e-mailed link', async (ctx) => {
  const email = `new-sales-${Date.now()}@aldercreek.example`;
  const page = await openPage(browser(), ctx);
  await signInAs(page, 'admin');
  await page.locator(sel('nav-admin-invitations')).click();
  await page.locator(sel('invite-form')).waitFor();

  await page.locator(sel('invite-email')).fill(email);
  await page.locator(sel('invite-role')).click();
  await page.locator('.n-base-select-option').filter({ hasText: 'Sales engineer' }).click();
  await page.locator(sel('invite-submit')).click();
  await page.locator(sel('invite-sent-item')).filter({ hasText: email }).waitFor();

  await page.locator(sel('nav-admin-outbox')).click();
  await waitForMail(page, email, /invit/i);
  await page.locator(sel('outbox-row')).filter({ hasText: email }).first().click();
  const link = await page.locator(sel('mail-link')).filter({ hasText: 'invite=' }).first().getAttribute('href');
  expect(link).toBeTruthy();

  const invitee = await openPage(browser(), ctx);
  const url = new URL(link!);
  await visit(invitee, url.pathname + url.search);
  await invitee.locator(sel('register-invited')).waitFor();
  expect(await invitee.locator(sel('register-organization')).count()).toBe(0);
  await invitee.locator(sel('register-name')).fill('Noor Halvorsen');
  await invitee.locator(sel('register-email')).fill(email);
  await invitee.locator(sel('register-password')).fill(DEMO_PASSWORD);
  await invitee.locator(sel('register-submit')).click();
  await invitee.locator(sel('home-sales')).waitFor();
  expect(await invitee.locator(sel('user-name')).textContent()).toBe('Noor Halvorsen');
});
