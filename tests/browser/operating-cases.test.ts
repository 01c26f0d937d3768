/**
 * Operating cases (issue 11): a customer adds a winter case to the duty on the new-request page and
 * sends it; the sales engineer approves through the API; the quote page and the offer PDF show the
 * design point and the winter case with their outlets and pressure drops.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { expect, test } from 'vitest';
import { BASE_URL, demoUsers, openPage, pathOf, sel, signInAs, useBrowser } from './support/browser';
import { apiAs, apiSignIn } from './support/api';

const browser = useBrowser();

test('a customer adds a winter case; the approved offer lists both cases', async (ctx) => {
  const page = await openPage(browser(), ctx);
  await signInAs(page, 'customer');
  await page.locator(sel('nav-quote-new')).click();
  await page.locator(sel('request-duty')).waitFor();

  await page.locator(sel('add-case')).click();
  await page.locator(sel('case-0-name')).fill('Winter');
  const inlet = page.locator(sel('case-0-coolant-inlet'));
  await inlet.fill('15');
  await inlet.blur();
  await page.locator(sel('request-reference')).fill(`Cases ${Date.now()}`);
  await page.locator(sel('send-request')).click();
  await page.locator(sel('quote-offer')).waitFor({ timeout: 30_000 });
  const id = pathOf(page).split('/').pop()!;

  const sales = await apiAs(demoUsers.sales.email);
  const quote = await sales<{ version: number; revision: { duty: { cases?: { name: string }[] } } }>('GET', `/quotes/${id}`);
  expect(quote.revision.duty.cases?.map((c) => c.name)).toEqual(['Winter']);
  await sales('POST', `/quotes/${id}/approve`, { version: quote.version });

  // the quote page: both cases with their outlets, the guarantee line
  await page.reload();
  await page.locator(sel('operating-cases-table')).waitFor();
  expect(await page.locator(sel('case-row-Design point')).textContent()).toMatch(/Design point \(governing\).*°C/);
  expect(await page.locator(sel('case-row-Winter')).textContent()).toMatch(/Winter\s*15 °C/);
  expect(await page.locator(sel('guarantee')).textContent()).toMatch(/Guaranteed process outlet at most 50 °C; predicted .* ± .*; 10 % area margin\./);

  // the offer PDF, read as text
  const cookie = await apiSignIn(demoUsers.customer.email);
  const res = await fetch(`${BASE_URL}/api/quotes/${id}/offer.pdf`, { headers: { Cookie: cookie } });
  expect(res.status).toBe(200);
  const dir = mkdtempSync(join(tmpdir(), 'cases-offer-'));
  try {
    const file = join(dir, 'offer.pdf');
    writeFileSync(file, Buffer.from(await res.arrayBuffer()));
    const text = execFileSync('pdftotext', ['-enc', 'UTF-8', file, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
    expect(text).toContain('Design point (governing)');
    expect(text).toMatch(/Winter 15 °C [\d.]+ °C ± [\d.]+ K 50 °C [\d.]+ kPa [\d.]+ kPa/);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
});
