import type { Page } from 'playwright-core';
import { expect, test } from 'vitest';
import { BASE_URL, DEMO_PASSWORD, demoUsers, openPage, otherCustomer, pathOf, phone, sel, signInAs, submitSignIn, useBrowser, visit } from './support/browser';
import { apiAs } from './support/api';

const browser = useBrowser();

/** A 1×1 PNG (a real image, so the server's content check accepts it). */
const PNG = Buffer.from('iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNkYPhfDwAChwGA60e6kgAAAABJRU5ErkJggg==', 'base64');

/** The duty of the sizing page's defaults (30 % glycol cooled by plant water), in SI as the API takes it. */
const duty = {
  process: { fluid: 'ethylene-glycol-30', pressure_Pa: 401_325, massFlow_kg_s: 3.2, inletTemp_C: 72, outletTemp_C: 50 },
  boundary: { kind: 'coolant', fluid: 'water', pressure_Pa: 501_325, massFlow_kg_s: 4.5, inletTemp_C: 27 },
  constraints: { maxTubeLength_m: 3, maxPressureDrop_Pa: 60_000, maxShellPressureDrop_Pa: 60_000 },
};


type Created = { id: string; number: string; version: number };

/** A quote of Pellmar's, approved by the sales engineer: the state test 2 and 3 start from. */
async function approvedQuote(reference: string): Promise<Created> {
  const customer = await apiAs(demoUsers.customer.email);
  const quote = await customer<Created>('POST', '/quotes', { duty, quantity: 2, reference });
  const sales = await apiAs(demoUsers.sales.email);
  await sales('POST', `/quotes/${quote.id}/approve`, { version: quote.version, message: 'Reviewed: fouling allowance as stated.' });
  return quote;
}

async function setNumber(page: Page, field: string, value: number): Promise<void> {
  const input = page.locator(sel(field));
  await input.fill(String(value));
  await input.blur();
}

test('a customer sends a new request and lands on its budget offer, awaiting review', async (ctx) => {
  const page = await openPage(browser(), ctx);
  await signInAs(page, 'customer');
  await page.locator(sel('home-link-quote-new')).waitFor(); // the home page leads there
  await page.locator(sel('nav-quote-new')).click();
  await page.locator(sel('request-duty')).waitFor();
  expect(pathOf(page)).toBe('/quotes/new');

  await setNumber(page, 'process-flow', 2.8);
  await setNumber(page, 'coolant-inlet', 25);
  await page.locator(sel('preview-tubes')).waitFor(); // the live preview answers as on the sizing page
  await setNumber(page, 'request-quantity', 3);
  await page.locator(sel('request-reference')).fill(`Browser test ${Date.now()}`);

  // Files: one over 20 MB is refused in the browser; a drawing goes up after the quote exists.
  await page.locator(sel('attach-input')).setInputFiles([
    { name: 'huge-scan.pdf', mimeType: 'application/pdf', buffer: Buffer.alloc(21 * 1024 * 1024) },
    { name: 'nameplate.png', mimeType: 'image/png', buffer: PNG },
  ]);
  const refused = page.locator(`${sel('upload-row')}[data-status="refused"]`);
  expect(await refused.locator(sel('upload-message')).textContent()).toMatch(/20 MB/);

  await page.locator(sel('send-request')).click();
  await page.locator(sel('quote-offer')).waitFor({ timeout: 30_000 });
  expect(pathOf(page)).toMatch(/^\/quotes\/[0-9a-f-]{36}$/);
  expect(await page.locator(sel('quote-status')).getAttribute('data-status')).toBe('in-review');
  expect(await page.locator(sel('quote-awaiting-review')).textContent()).toMatch(/awaiting engineering review/);
  expect(await page.locator(sel('quote-price-range')).textContent()).toMatch(/\d[\d,.]* – .*\d/);
  expect(await page.locator(sel('quote-lead-time')).textContent()).toMatch(/\d+ weeks/);
  expect(Number(await page.locator(sel('quote-tube-count')).textContent())).toBeGreaterThan(0);
  expect(await page.locator(sel('quote-quantity')).textContent()).toMatch(/^3 units/);
  expect(await page.locator(sel('quote-caution')).textContent()).toMatch(/pressure-vessel code/);
  expect(await page.locator(sel('pdf-si')).count()).toBe(0); // no PDF before the offer is approved
  const files = page.locator(sel('attachment-link'));
  expect(await files.allTextContents()).toEqual(['nameplate.png']);
  expect(await page.locator(sel('quote-change')).isVisible()).toBe(true);
});

test('a customer finds an approved offer in My quotes and downloads its PDF', async (ctx) => {
  const reference = `PDF check ${Date.now()}`;
  const quote = await approvedQuote(reference);

  const page = await openPage(browser(), ctx);
  await signInAs(page, 'customer');
  await page.locator(sel('nav-quotes')).click();
  await page.locator(sel('quotes-table')).waitFor();
  await page.locator(sel('quotes-search')).fill(reference);
  await expect.poll(() => page.locator(sel('quote-row')).count()).toBe(1); // the search reached the server
  const row = page.locator(`${sel('quote-row')}[data-number="${quote.number}"]`);
  expect(new URL(page.url()).searchParams.get('q')).toBe(reference);
  expect(await row.locator(sel('quote-status')).getAttribute('data-status')).toBe('approved');
  await row.locator('td').nth(3).click(); // anywhere on the row

  await page.locator(sel('quote-offer')).waitFor();
  expect(pathOf(page)).toBe(`/quotes/${quote.id}`);
  expect(await page.locator(sel('quote-number')).textContent()).toBe(quote.number);
  expect(await page.locator(sel('quote-status')).textContent()).toMatch(/approved/i);
  expect(await page.locator(sel('quote-offer')).getAttribute('data-kind')).toBe('offer');
  expect(await page.locator(sel('quote-total')).textContent()).toMatch(/\d/);
  expect(await page.locator(sel('quote-valid-until')).textContent()).toMatch(/\d{4}/);
  expect(await page.locator(sel('quote-awaiting-review')).count()).toBe(0);
  const kinds = await page.locator(`${sel('quote-event')}`).evaluateAll((els) => els.map((e) => e.getAttribute('data-kind')));
  expect(kinds).toEqual(['submitted', 'approved']);

  const link = page.locator(`${sel('quote-offer')} ${sel('pdf-us')}`);
  const href = await link.getAttribute('href');
  expect(href).toMatch(/offer\.pdf\?revision=2&units=US$/);
  const pdf = await page.request.get(new URL(href!, BASE_URL).toString());
  expect(pdf.status()).toBe(200);
  expect(pdf.headers()['content-type']).toMatch(/^application\/pdf/);
  expect((await pdf.body()).subarray(0, 5).toString()).toBe('%PDF-');

  // at phone width the page fits the screen
  await page.setViewportSize(phone);
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(phone.width);

  // asking for a change reopens the review; the approved offer stays on the page meanwhile
  await page.locator(sel('change-message')).fill('Please quote 90/10 copper-nickel tubes as well.');
  await page.locator(sel('change-send')).click();
  await page.locator(sel('change-sent')).waitFor();
  expect(await page.locator(sel('quote-status')).getAttribute('data-status')).toBe('in-review');
  expect(await page.locator(sel('quote-event')).last().getAttribute('data-kind')).toBe('change-requested');
  expect(await page.locator(sel('quote-event-message')).last().textContent()).toContain('90/10 copper-nickel');
});

test('a customer of another organisation opening that quote sees "not found", not the quote', async (ctx) => {
  const quote = await approvedQuote(`Not yours ${Date.now()}`);
  const page = await openPage(browser(), ctx);
  await visit(page, '/sign-in');
  await submitSignIn(page, otherCustomer.email, DEMO_PASSWORD);
  await page.locator(sel('home-customer')).waitFor();
  await visit(page, `/quotes/${quote.id}`);
  await page.locator(sel('quote-not-found')).waitFor();
  expect(await page.locator(sel('quote-offer')).count()).toBe(0);
  expect(await page.locator(sel('quote-page')).textContent()).not.toContain(quote.number);
});

test('an impossible duty gets the explanation on the New request page, and nothing is sent', async (ctx) => {
  const page = await openPage(browser(), ctx);
  await signInAs(page, 'customer');
  await visit(page, '/quotes/new');
  await page.locator(sel('request-duty')).waitFor();
  await setNumber(page, 'coolant-inlet', 27);
  await setNumber(page, 'process-outlet', 20);
  await page.locator(sel('preview-refused')).waitFor();
  await page.locator(sel('send-request')).click();
  const explanation = page.locator(sel('sizing-explanation'));
  await explanation.waitFor();
  expect(await explanation.textContent()).toMatch(/coolant/i);
  expect(await explanation.textContent()).toMatch(/Nothing was sent/);
  // issue 12: the engine's words sit under the field they are about
  expect(await page.locator(`${sel('process-outlet-item')} .n-form-item-feedback`).textContent()).toMatch(/target outlet 20 °C is at or below the coolant inlet temperature 27 °C/);
  expect(pathOf(page)).toBe('/quotes/new');
});

test('a sales engineer following a quote link from an e-mail lands in their workspace', async (ctx) => {
  const customer = await apiAs(demoUsers.customer.email);
  const quote = await customer<Created>('POST', '/quotes', { duty, quantity: 1, reference: `E-mail link ${Date.now()}` });
  const page = await openPage(browser(), ctx);
  await signInAs(page, 'sales');
  await visit(page, `/quotes/${quote.id}`);
  await page.waitForURL(`**/review/${quote.id}`);
  expect(pathOf(page)).toBe(`/review/${quote.id}`);
});

test('a file the server refuses is reported without losing the request; the quote page takes more files', async (ctx) => {
  const page = await openPage(browser(), ctx);
  await signInAs(page, 'customer');
  await visit(page, '/quotes/new');
  await page.locator(sel('request-duty')).waitFor();
  await page.locator(sel('request-reference')).fill(`Disguised upload ${Date.now()}`);
  // named like a PDF, but plain text inside: the server checks the content
  await page.locator(sel('attach-input')).setInputFiles({ name: 'datasheet.pdf', mimeType: 'application/pdf', buffer: Buffer.from('not a pdf at all\n') });
  await page.locator(sel('send-request')).click();
  const outcome = page.locator(sel('request-upload-outcome'));
  await outcome.waitFor({ timeout: 30_000 });
  expect(await outcome.textContent()).toMatch(/Request Q-\d{4}-\d+ was sent/);
  const failed = page.locator(`${sel('upload-row')}[data-status="failed"]`);
  expect(await failed.locator(sel('upload-message')).textContent()).not.toBe('');
  expect(pathOf(page)).toBe('/quotes/new');

  await page.locator(sel('request-open-quote')).click();
  await page.locator(sel('quote-attachments')).waitFor();
  expect(await page.locator(sel('attachment-row')).count()).toBe(0);
  await page.locator(`${sel('quote-attachments')} ${sel('attach-input')}`).setInputFiles({ name: 'nameplate.png', mimeType: 'image/png', buffer: PNG });
  await page.locator(sel('attach-send')).click();
  await page.locator(sel('attachment-link')).waitFor();
  const href = await page.locator(sel('attachment-link')).getAttribute('href');
  const file = await page.request.get(new URL(href!, BASE_URL).toString());
  expect(file.headers()['content-type']).toMatch(/^image\/png/);
  expect(await page.locator(`${sel('quote-event')}[data-kind="attachment"]`).count()).toBe(1);
});
