/**
 * From a paid deposit to a shipped cooler: the order is set up through the API (request, approval,
 * acceptance, the deposit paid on the Stripe fake, whose webhook creates the order); then in Chromium
 * sales release it and the shop moves it step by step, recording the hydrotest, and opens the build
 * sheet with its drilling pattern. Screenshots at 1280 and 390 px go to test-results/.
 */
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { expect, test } from 'vitest';
import { demoUsers, openPage, pathOf, phone, sel, signInAs, useBrowser, visit } from './support/browser';
import { api, apiSignIn } from './support/api';
import { paidOrder } from './support/orders';

const browser = useBrowser();
const SHOTS = join(process.cwd(), 'test-results');

async function shot(page: Page, name: string): Promise<void> {
  mkdirSync(SHOTS, { recursive: true });
  await page.screenshot({ path: join(SHOTS, `shop-board-${name}.png`), fullPage: true });
}

const card = (number: string, status?: string) => `${sel('board-card')}[data-number="${number}"]${status ? `[data-status="${status}"]` : ''}`;

/** Clicks a card's move; a step the customer is e-mailed about asks first, and the test continues. */
async function moveCard(page: Page, number: string, from: string, button = 'card-move'): Promise<void> {
  await page.locator(card(number, from)).locator(sel(button)).click();
  const confirm = page.locator(sel('confirm-continue'));
  if (['shell-and-heads', 'hydrotest', 'ready-to-ship', 'on-hold'].includes(from)) {
    await confirm.click();
    await confirm.waitFor({ state: 'detached' });
  }
}

test('sales release a paid order; the shop moves it to shipped, recording the hydrotest; the build sheet shows every hole', async (ctx) => {
  const order = await paidOrder();

  // Sales: Orders → the order → release to the shop.
  const sales = await openPage(browser(), ctx);
  await signInAs(sales, 'sales');
  await sales.locator(sel('nav-staff-orders')).click();
  await sales.locator(sel('orders-table')).waitFor();
  await sales.locator(sel('orders-search')).fill(order.number);
  await sales.locator(`${sel('orders-row')}[data-number="${order.number}"]`).waitFor();
  await shot(sales, 'orders-1280');
  await sales.locator(`${sel('orders-row')}[data-number="${order.number}"]`).click();
  await sales.locator(sel('order-header')).waitFor();
  expect(pathOf(sales)).toBe(`/staff/orders/${order.orderId}`);
  expect(await sales.locator(sel('order-status')).textContent()).toContain('Deposit paid');
  await shot(sales, 'order-1280');
  await sales.locator(sel('order-release')).click();
  await sales.waitForFunction(() => document.querySelector('[data-test="order-status"]')?.textContent?.includes('Released'));
  expect(await sales.locator(sel('order-event')).first().getAttribute('data-status')).toBe('released');
  expect(await sales.locator(sel('order-build-sheet')).getAttribute('href')).toBe(`/shop/orders/${order.orderId}/build-sheet`);

  // The shop: the card moves lane by lane.
  const shop = await openPage(browser(), ctx);
  await signInAs(shop, 'shop');
  await shop.locator(sel('nav-shop-board')).click();
  await shop.locator(card(order.number, 'released')).waitFor();
  await shop.locator(card(order.number)).locator(sel('card-tubes')).filter({ hasText: `${order.tubeCount} ×` }).waitFor();
  for (const [from, to] of [['released', 'cutting'], ['cutting', 'tubing'], ['tubing', 'shell-and-heads'], ['shell-and-heads', 'hydrotest']]) {
    await moveCard(shop, order.number, from!);
    await shop.locator(`${sel('board-column')}[data-step="${to}"] ${card(order.number, to)}`).waitFor();
  }
  await shot(shop, 'board-1280');

  // Hold (with a reason and the customer's wording) and resume at the same step.
  await shop.locator(card(order.number, 'hydrotest')).locator(sel('card-hold')).click();
  await shop.locator(sel('hold-reason')).fill('Gasket kit missing from the delivery.');
  await shop.locator(sel('hold-wording-awaiting-material')).click();
  await shop.locator(sel('hold-submit')).click();
  await shop.locator(`${sel('board-column')}[data-step="on-hold"] ${card(order.number, 'on-hold')}`).waitFor();
  await moveCard(shop, order.number, 'on-hold', 'card-resume');
  await shop.locator(card(order.number, 'hydrotest')).waitFor();

  // Each side's test at the build sheet's pressure: a failed side is kept and the order stays; then both pass.
  const salesCookie = await apiSignIn(demoUsers.sales.email);
  const need = await api<{ sides: { side: string; required_Pa: number }[] }>(salesCookie, 'GET', `/orders/${order.orderId}/hydrotest`);
  const barUp = (side: string) => String(Math.ceil(need.sides.find((s) => s.side === side)!.required_Pa / 1e4) / 10);
  await shop.locator(card(order.number, 'hydrotest')).locator(sel('card-hydrotest')).click();
  const dialog = shop.locator(sel('hydro-dialog'));
  await dialog.waitFor();
  for (const side of ['tube', 'shell']) {
    await shop.locator(sel(`hydro-pressure-${side}`)).fill(barUp(side));
    await shop.locator(sel(`hydro-hold-${side}`)).fill('30');
    await shop.locator(sel(side === 'tube' ? 'hydro-failed-tube' : 'hydro-passed-shell')).click();
  }
  await shop.locator(sel('hydro-submit')).click();
  expect(await shop.locator(sel('hydro-outcome')).textContent()).toMatch(/stays at the hydrotest until both sides pass: tube side failed/);
  await shot(shop, 'hydrotest-dialog-1280');
  await shop.locator(sel('hydro-pressure-tube')).fill(barUp('tube'));
  await shop.locator(sel('hydro-hold-tube')).fill('30');
  await shop.locator(sel('hydro-passed-tube')).click();
  await shop.locator(sel('hydro-submit')).click();
  expect(await shop.locator(sel('hydro-outcome')).textContent()).toMatch(/Both sides passed/);
  await shop.locator(sel('hydro-cancel')).click();
  await dialog.waitFor({ state: 'detached' });
  await moveCard(shop, order.number, 'hydrotest');
  await shop.locator(card(order.number, 'ready-to-ship')).waitFor();
  await moveCard(shop, order.number, 'ready-to-ship');
  await shop.locator(card(order.number)).waitFor({ state: 'detached' });
  expect(Number(await shop.locator(sel('shipped-count')).textContent())).toBeGreaterThan(0);
  await shop.locator(sel('shipped-toggle')).click();
  await shop.locator(`${sel('shipped-order')}[data-number="${order.number}"]`).locator(sel('shipped-build-sheet')).click();

  // The build sheet: every tube hole drawn, the documents linked, the CSV one line per hole.
  await shop.locator(sel('drilling-svg')).waitFor();
  expect(pathOf(shop)).toBe(`/shop/orders/${order.orderId}/build-sheet`);
  expect(await shop.locator(`${sel('drill-hole')}[data-kind="tube"]`).count()).toBe(order.tubeCount);
  expect(await shop.locator(sel('drill-count')).textContent()).toBe(String(order.tubeCount));
  expect(await shop.locator(sel('sheet-pdf')).getAttribute('href')).toBe(`/api/orders/${order.orderId}/build-sheet.pdf`);
  expect(await shop.locator(sel('sheet-caution')).count()).toBeGreaterThan(0);
  const holes = await shop.locator(sel('drill-hole')).count();
  const csv = await shop.request.get(`/api/orders/${order.orderId}/drilling.csv`);
  expect(csv.status()).toBe(200);
  const lines = (await csv.text()).trim().split('\n');
  expect(lines.length - 1).toBe(holes);
  expect(lines.slice(1).filter((l) => l.split(',')[3] === 'tube').length).toBe(order.tubeCount);
  await shot(shop, 'build-sheet-1280');

  // The customer's order now reads shipped, with a line per side of the hydrotest and the hold's wording, not its reason.
  const customer = await apiSignIn(demoUsers.customer.email);
  const seen = await api<{ status: string; timeline: { kind: string; status: string; note: string | null }[] }>(customer, 'GET', `/orders/${order.orderId}`);
  expect(seen.status).toBe('shipped');
  expect(seen.timeline.filter((e) => e.kind === 'hydrotest-passed').map((e) => e.note)).toEqual([
    `Shell side tested at ${Number(barUp('shell')).toFixed(1)} bar(g): passed.`,
    `Tube side tested at ${Number(barUp('tube')).toFixed(1)} bar(g): passed.`,
  ]);
  expect(JSON.stringify(seen)).not.toMatch(/Gasket|failed/);
});

test('on a phone the board stacks its columns and the build sheet still draws the tubesheet', async (ctx) => {
  const order = await paidOrder();
  const sales = await apiSignIn(demoUsers.sales.email);
  await api(sales, 'POST', `/orders/${order.orderId}/release`, {});
  const page = await openPage(browser(), ctx, phone);
  await signInAs(page, 'shop');
  await visit(page, '/shop');
  await page.locator(card(order.number, 'released')).waitFor();
  const columns = page.locator(sel('board-column'));
  const first = (await columns.nth(0).boundingBox())!;
  const second = (await columns.nth(1).boundingBox())!;
  expect(second.x).toBeCloseTo(first.x, 0);
  expect(second.y).toBeGreaterThan(first.y);
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(phone.width);
  await shot(page, 'board-390');
  await page.locator(card(order.number)).locator(sel('card-build-sheet')).click();
  await page.locator(sel('drilling-svg')).waitFor();
  expect(await page.locator(`${sel('drill-hole')}[data-kind="tube"]`).count()).toBe(order.tubeCount);
  // the shells, the fluids and the tubesheet count follow the order's sheet (two tubesheets a shell)
  const sheet = await api<{ shells: { inSeries: number }; allocation: { shellSide: { stream: string } } }>(sales, 'GET', `/orders/${order.orderId}/build-sheet`);
  expect(await page.locator(sel('sheet-shells')).getAttribute('data-shells')).toBe(String(sheet.shells.inSeries));
  expect(await page.locator(sel('drill-quantity')).getAttribute('data-quantity')).toBe(String(2 * sheet.shells.inSeries));
  expect(await page.locator(sel('alloc-shell')).getAttribute('data-stream')).toBe(sheet.allocation.shellSide.stream);
  expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(phone.width);
  await shot(page, 'build-sheet-390');
});

test('sales cancel a paid order with a reason; the timeline keeps it and the actions go', async (ctx) => {
  const order = await paidOrder();
  const page = await openPage(browser(), ctx);
  await signInAs(page, 'sales');
  await visit(page, `/staff/orders/${order.orderId}`);
  await page.locator(sel('order-cancel')).click();
  expect(await page.locator(sel('cancel-confirm')).isDisabled()).toBe(true);
  await page.locator(sel('cancel-reason')).fill('The customer’s compressor project was postponed.');
  await page.locator(sel('cancel-confirm')).click();
  await page.waitForFunction(() => document.querySelector('[data-test="order-status"]')?.textContent?.includes('Cancelled'));
  // the cancellation note (a second event records the refund when Stripe's webhook confirms it)
  await page.locator(`${sel('order-event')}[data-status="cancelled"]`).filter({ hasText: 'compressor project was postponed' }).waitFor();
  expect(await page.locator(sel('order-release')).count()).toBe(0);
  await page.locator(sel('order-no-actions')).waitFor();
});
