/**
 * The order journey of issue 5 in Chromium: the buyer accepts an approved offer, pays the deposit on
 * the Stripe fake's test page, comes back to "order created"; sales release it, the shop takes it to
 * shipped, the buyer reads the whole timeline, and the e-mails are in the Outbox. Then the declined
 * card: the failure and "Pay again" show, no order exists until the retry succeeds.
 * The request and its approval are set up through the API (their pages have their own tests).
 */
import type { Page } from 'playwright-core';
import { expect, test } from 'vitest';
import { orderSteps } from '../../shared/schemas/orders';
import { BASE_URL, demoUsers, desktop, openPage, pathOf, phone, sel, signInAs, useBrowser, visit } from './support/browser';
import { apiAs } from './support/api';

const browser = useBrowser();

/** The duty of the sizing page's defaults (30 % glycol cooled by plant water), in SI as the API takes it. */
const duty = {
  process: { fluid: 'ethylene-glycol-30', pressure_Pa: 401_325, massFlow_kg_s: 3.2, inletTemp_C: 72, outletTemp_C: 50 },
  boundary: { kind: 'coolant', fluid: 'water', pressure_Pa: 501_325, massFlow_kg_s: 4.5, inletTemp_C: 27 },
  constraints: { maxTubeLength_m: 3, maxPressureDrop_Pa: 60_000, maxShellPressureDrop_Pa: 60_000 },
};


type Created = { id: string; number: string; version: number };

/** A quote of Pellmar's, approved by the sales engineer. */
async function approvedQuote(reference: string): Promise<Created> {
  const customer = await apiAs(demoUsers.customer.email);
  const quote = await customer<Created>('POST', '/quotes', { duty, quantity: 1, reference });
  const sales = await apiAs(demoUsers.sales.email);
  await sales('POST', `/quotes/${quote.id}/approve`, { version: quote.version, message: 'Reviewed: ready to order.' });
  return quote;
}

/** Fills the accept form (PO, contact, address), looks over the confirmation and accepts. */
async function acceptOffer(page: Page, po: string): Promise<void> {
  await page.locator(sel('accept-offer')).waitFor();
  await page.locator(sel('accept-po')).fill(po);
  await page.locator(sel('accept-contact-name')).fill('Imke Vandersloot');
  await page.locator(sel('accept-contact-email')).fill('not-an-address');
  await page.locator(sel('accept-address-line1')).fill('Hafenstraße 14');
  await page.locator(sel('accept-address-postal-code')).fill('28217');
  await page.locator(sel('accept-address-city')).fill('Bremen');
  await page.locator(sel('accept-address-country')).fill('Germany');
  await page.locator(sel('accept-review')).click();
  // The schema's own message for the bad e-mail, and no step forward.
  await page.getByText('Enter a valid e-mail address.').waitFor();
  expect(await page.locator(sel('accept-offer')).getAttribute('data-step')).toBe('form');
  await page.locator(sel('accept-contact-email')).fill('Imke.Vandersloot@Pellmar.example');
  await page.locator(sel('accept-review')).click();
  await page.locator(sel('accept-confirm')).waitFor();
  await page.screenshot({ path: `test-results/order-journey-accept-${page.viewportSize()?.width}.png`, fullPage: true });
  expect(await page.locator(sel('accept-confirm-po')).textContent()).toBe(po);
  await page.locator(sel('accept-submit')).click();
}

/** On the fake's hosted test page: choose the outcome; it sends the browser back to the quote. */
async function payOnTestPage(page: Page, quoteId: string, outcome: 'succeeds' | 'is declined'): Promise<void> {
  await page.waitForURL((url) => url.pathname.startsWith('/pay/pi_'), { timeout: 15_000 });
  expect(new URL(page.url()).origin).not.toBe(new URL(BASE_URL).origin); // the card processor's page, not ours
  await page.getByRole('button', { name: `Pay with a test card that ${outcome}` }).click();
  await page.waitForURL((url) => url.pathname === `/quotes/${quoteId}` && url.searchParams.get('payment') === 'returned', { timeout: 15_000 });
}

async function ordersOfCustomer(): Promise<{ quoteId: string; id: string; number: string }[]> {
  const customer = await apiAs(demoUsers.customer.email);
  return (await customer<{ items: { quoteId: string; id: string; number: string }[] }>('GET', '/orders?pageSize=100')).items;
}

/** Refreshes the Outbox until a row with this subject appears (mail goes out through a job queue). */
async function waitForMail(page: Page, subject: string): Promise<void> {
  const row = page.locator(sel('outbox-row')).filter({ hasText: subject });
  for (let attempt = 0; attempt < 30; attempt++) {
    if ((await row.count()) > 0) return;
    await page.waitForTimeout(750);
    await page.locator(sel('outbox-refresh')).click();
    await page.locator('.n-data-table .n-base-loading').waitFor({ state: 'detached' }).catch(() => undefined);
  }
  throw new Error(`no e-mail "${subject}" appeared in the Outbox`);
}

test('the buyer accepts and pays; sales release; the shop ships; the buyer reads the timeline; the e-mails are out', async (ctx) => {
  const quote = await approvedQuote(`Order journey ${Date.now()}`);
  const page = await openPage(browser(), ctx);
  await signInAs(page, 'customer');
  await page.locator(sel('home-link-orders')).waitFor(); // the home page leads to My orders
  await visit(page, `/quotes/${quote.id}`);

  await acceptOffer(page, `PO-J-${Date.now() % 100000}`);
  await payOnTestPage(page, quote.id, 'succeeds');
  // Back on the quote page: the app waits for the webhook, then shows the order.
  await page.locator(sel('deposit-paid')).waitFor({ timeout: 35_000 });
  await expect.poll(() => page.locator(sel('deposit-order-number')).textContent()).toMatch(/order \S+/);
  await page.screenshot({ path: 'test-results/order-journey-paid-1280.png', fullPage: true });
  await page.locator(sel('deposit-order-link')).click();
  await page.locator(sel('order-timeline')).waitFor();
  const orderId = pathOf(page).split('/').pop()!;
  expect(await page.locator(sel('order-status')).getAttribute('data-status')).toBe('deposit-paid');
  expect(await page.locator(sel('order-cancel-start')).isVisible()).toBe(true);
  expect(await page.locator(sel('timeline-to-come')).count()).toBe(orderSteps.length - 1);
  const number = (await page.locator(sel('order-number')).textContent())!.trim();

  // Sales release it on their order page.
  const sales = await openPage(browser(), ctx);
  await signInAs(sales, 'sales');
  await visit(sales, `/orders/${orderId}`); // the e-mail link: staff land on their own page
  await sales.locator(sel('order-release')).click();
  await expect.poll(() => sales.locator(sel('order-status')).textContent()).toMatch(/Released/);

  // The shop moves it through every step to shipped (through the API), with the hydrotest record.
  const shop = await apiAs(demoUsers.shop.email);
  for (const to of orderSteps.slice(2)) {
    if (to === 'ready-to-ship') {
      const test = await shop<{ sides: { side: 'tube' | 'shell'; required_Pa: number }[] }>('GET', `/orders/${orderId}/hydrotest`);
      const record = Object.fromEntries(test.sides.map((s) => [s.side, { pressure_Pa: s.required_Pa + 50_000, holdTime_min: 30, passed: true }]));
      await shop('POST', `/orders/${orderId}/hydrotest`, record);
    }
    await shop('POST', `/orders/${orderId}/advance`, { to, customerNote: to === 'shipped' ? 'Truck 12, waybill 448-2291.' : undefined });
  }

  // The buyer sees the whole timeline, who and when, the hydrotest and the waybill; nothing to come.
  await page.reload();
  await page.locator(sel('order-timeline')).waitFor();
  expect(await page.locator(sel('order-status')).getAttribute('data-status')).toBe('shipped');
  const events = page.locator(`${sel('timeline-event')}[data-kind="step"]`);
  expect(await events.evaluateAll((els) => els.map((e) => e.getAttribute('data-status')))).toEqual([...orderSteps]);
  expect(await page.locator(sel('timeline-to-come')).count()).toBe(0);
  expect(await page.locator(sel('timeline-note')).allTextContents()).toEqual(
    expect.arrayContaining([expect.stringMatching(/^Tube side tested at [\d.]+ bar\(g\): passed\.$/), expect.stringMatching(/^Shell side tested at/), 'Truck 12, waybill 448-2291.']),
  );
  expect(await events.nth(1).locator(sel('timeline-meta')).textContent()).toMatch(/\d{4}.*·\s*\S+/); // when · who
  expect(await page.locator(sel('order-cancel-start')).count()).toBe(0);
  await page.screenshot({ path: 'test-results/order-journey-timeline-1280.png', fullPage: true });

  // My orders lists it; the row opens it.
  await page.locator(sel('nav-orders')).click();
  await page.locator(`${sel('order-row')}[data-number="${number}"]`).click();
  await page.locator(sel('order-timeline')).waitFor();
  expect(pathOf(page)).toBe(`/orders/${orderId}`);

  // The admin finds the receipt and a step e-mail in the Outbox.
  const admin = await openPage(browser(), ctx);
  await signInAs(admin, 'admin');
  await admin.locator(sel('nav-admin-outbox')).click();
  await admin.locator(sel('outbox-table')).waitFor();
  await waitForMail(admin, `Receipt: deposit for order ${number}`);
  await waitForMail(admin, `Order ${number}: Shipped`);
});

test('a declined card: the reason and "Pay again" show, no order exists; paying again creates it', async (ctx) => {
  const quote = await approvedQuote(`Declined card ${Date.now()}`);
  const page = await openPage(browser(), ctx, phone);
  await signInAs(page, 'customer');
  await visit(page, `/quotes/${quote.id}`);

  await acceptOffer(page, `PO-D-${Date.now() % 100000}`);
  await payOnTestPage(page, quote.id, 'is declined');
  const due = page.locator(`${sel('deposit-due')}[data-failed="true"]`);
  await due.waitFor({ timeout: 35_000 });
  expect((await page.locator(sel('payment-error')).textContent())!.trim().length).toBeGreaterThan(5);
  expect(await page.locator(sel('pay-again')).textContent()).toMatch(/Pay again/);
  await page.screenshot({ path: 'test-results/order-journey-declined-390.png', fullPage: true });
  expect((await ordersOfCustomer()).some((o) => o.quoteId === quote.id)).toBe(false);

  await page.locator(sel('pay-again')).click();
  await payOnTestPage(page, quote.id, 'succeeds');
  await page.locator(sel('deposit-paid')).waitFor({ timeout: 35_000 });
  const orders = (await ordersOfCustomer()).filter((o) => o.quoteId === quote.id);
  expect(orders).toHaveLength(1);
  await page.locator(sel('deposit-order-link')).click();
  await page.locator(sel('order-timeline')).waitFor();
  await page.setViewportSize(phone);
  await page.screenshot({ path: 'test-results/order-journey-order-390.png', fullPage: true });
  await page.setViewportSize(desktop);
});
