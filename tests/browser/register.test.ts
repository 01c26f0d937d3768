import { expect, test } from 'vitest';
import type { TestContext } from 'vitest';
import { BASE_URL, openPage, pathOf, sel, signInAs, useBrowser, visit } from './support/browser';

const browser = useBrowser();

/** The link of the newest e-mail to `to` whose subject matches, read from the Outbox API as the admin. */
async function linkFromOutbox(ctx: TestContext, to: string, subject: RegExp, contains: string): Promise<URL> {
  const admin = await openPage(browser(), ctx);
  await signInAs(admin, 'admin');
  for (let attempt = 0; attempt < 40; attempt++) {
    const reply = (await (await admin.request.get(`${BASE_URL}/api/dev/outbox`)).json()) as
      | { items: { to: string[] | string; subject: string; links: string[] }[] }
      | { to: string[] | string; subject: string; links: string[] }[];
    const items = Array.isArray(reply) ? reply : reply.items;
    const mail = items.find((m) => String(m.to).includes(to) && subject.test(m.subject));
    const link = mail?.links.find((l) => l.includes(contains));
    if (link) return new URL(link);
    await admin.waitForTimeout(500);
  }
  throw new Error(`no e-mail to ${to} matching ${subject} in the Outbox`);
}

test('a customer registers with a new organisation, follows the e-mailed link and lands on the customer home page', async (ctx) => {
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

  // the same answer whether or not the address exists; the account is made by the e-mailed link
  await page.locator(sel('register-sent')).waitFor();
  const link = await linkFromOutbox(ctx, email, /Finish creating/, '/register/confirm?token=');
  await visit(page, link.pathname + link.search);
  await page.locator(sel('register-confirm-submit')).click();
  await page.locator(sel('home-customer')).waitFor();
  expect(pathOf(page)).toBe('/');
  expect(await page.locator(sel('user-organization')).textContent()).toBe(organization);
  expect(await page.locator(sel('home-email')).textContent()).toBe(email);
});
