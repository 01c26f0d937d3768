/**
 * The admin's Mail log: a message that could not be sent is found under Failed, opened, and resent;
 * the copy appears as a new row and the running app's mail worker delivers it.
 *
 * The failure is made the way the worker records one: its delivery step against an SMTP address
 * where nothing listens (127.0.0.1:1), on a logged message no queue job carries.
 */
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, expect, test } from 'vitest';
import { createDatabase, type Database } from '../../db';
import { mailLog } from '../../db/schema';
import { createTransport, deliverLogged } from '../../server/lib/mail';
import { openPage, pathOf, sel, signInAs, useBrowser } from './support/browser';

const browser = useBrowser();
let database: Database;

beforeAll(() => {
  if (!process.env.DATABASE_URL?.includes('_test')) throw new Error('the Mail log test writes to the test database only (run it through npm test)');
  database = createDatabase(process.env.DATABASE_URL, 2);
});
afterAll(() => database?.pool.end());

async function failedMessage(to: string, subject: string): Promise<string> {
  const [row] = await database.db
    .insert(mailLog)
    .values({ to, subject, text: `Hello,\n\nYour order has moved to the hydrotest.\n\nAlder Creek Thermal Works · Bundlesmith` })
    .returning({ id: mailLog.id });
  const delivery = await deliverLogged(database.db, createTransport('smtp://127.0.0.1:1'), 'bundlesmith@aldercreek.example', row!.id, true);
  expect(delivery.status).toBe('failed');
  return row!.id;
}

/** Waits for the table to finish loading. */
async function settled(page: Page): Promise<void> {
  await page.locator('.n-data-table .n-base-loading').waitFor({ state: 'detached' }).catch(() => undefined);
}

test('admin filters the failed e-mail, reads why it failed, resends it and sees the copy sent', async (ctx) => {
  const tag = `bounce-${Date.now().toString(36)}`;
  const to = `${tag}@fenwick-air.example`;
  await failedMessage(to, `Order update for ${tag}`);

  const page = await openPage(browser(), ctx);
  await signInAs(page, 'admin');
  await page.locator(sel('nav-admin-mail-log')).click();
  await page.locator(sel('mail-log-table')).waitFor();
  expect(pathOf(page)).toBe('/admin/mail');

  await page.locator(sel('mail-log-status-failed')).click();
  await page.locator(sel('mail-log-search')).fill(tag);
  const rows = page.locator(sel('mail-log-row')).filter({ hasText: to });
  await rows.first().waitFor();
  await settled(page);
  expect(await rows.count()).toBe(1);
  // only failures are listed
  const statuses = await page.locator(sel('mail-log-row')).evaluateAll((els) => els.map((e) => e.getAttribute('data-status')));
  expect(new Set(statuses)).toEqual(new Set(['failed']));
  expect(await rows.first().textContent()).toContain('refused the connection');

  await rows.first().click();
  const detail = page.locator(sel('mail-log-detail'));
  await detail.locator(sel('mail-log-detail-text')).waitFor();
  expect(await detail.locator(sel('mail-log-detail-to')).textContent()).toBe(to);
  expect(await detail.locator(sel('mail-log-detail-status')).textContent()).toBe('Failed');
  expect(await detail.locator(sel('mail-log-detail-attempts')).textContent()).toBe('1');
  expect(await detail.locator(sel('mail-log-detail-problem')).textContent()).toContain('refused the connection');
  expect(await detail.locator(sel('mail-log-detail-last-error')).textContent()).toContain('ECONNREFUSED');
  expect(await detail.locator(sel('mail-log-detail-text')).textContent()).toContain('moved to the hydrotest');

  await detail.locator(sel('mail-log-resend')).click();
  await detail.locator(sel('mail-log-resend-confirm')).click();
  await detail.locator(sel('mail-log-resent')).waitFor();
  expect(await detail.locator(sel('mail-log-detail-status')).textContent()).toBe('Waiting to send');
  expect(await detail.locator(sel('mail-log-detail-attempts')).textContent()).toBe('0');
  await page.screenshot({ path: 'test-results/mail-log-resent-1280.png', fullPage: true });
  await page.keyboard.press('Escape');
  await detail.locator(sel('mail-log-detail-text')).waitFor({ state: 'hidden' });

  // every status again: the copy is the newest row, the original stays failed below it
  await settled(page);
  await rows.nth(1).waitFor();
  expect(await rows.count()).toBe(2);
  expect(await rows.first().locator(sel('mail-log-copy')).count()).toBe(1);
  expect(await rows.nth(1).getAttribute('data-status')).toBe('failed');

  // the app's mail worker sends the copy
  for (let attempt = 0; attempt < 20 && (await rows.first().getAttribute('data-status')) !== 'sent'; attempt++) {
    await page.waitForTimeout(750);
    await page.locator(sel('mail-log-refresh')).click();
    await settled(page);
  }
  expect(await rows.first().getAttribute('data-status')).toBe('sent');
  expect(await rows.first().locator(sel('mail-log-row-status')).textContent()).toBe('Sent');
});
