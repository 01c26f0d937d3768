import type { Page } from 'playwright-core';
import { expect, test } from 'vitest';
import { desktop, openPage, pathOf, phone, sel, useBrowser, visit } from './support/browser';

const browser = useBrowser();

/** Types into a quantity field the way a person does (select all, type, leave the field). */
async function setNumber(page: Page, field: string, value: number): Promise<void> {
  const input = page.locator(sel(field));
  await input.fill(String(value));
  await input.blur();
}

/** Width and height of the chart's canvas inside a figure. */
async function canvasSize(page: Page, chart: string): Promise<{ width: number; height: number }> {
  const box = await page.locator(`${sel(chart)} canvas`).boundingBox();
  return { width: box?.width ?? 0, height: box?.height ?? 0 };
}

test('an anonymous visitor sizes a cooler: design, alternatives and both plots', async (ctx) => {
  const page = await openPage(browser(), ctx, desktop);
  await visit(page, '/size');
  await page.locator(sel('sizing-form')).waitFor();
  expect(pathOf(page)).toBe('/size'); // public: no detour to sign-in
  await page.locator(sel('sizing-guest')).waitFor();

  await setNumber(page, 'process-flow', 2.8);
  await setNumber(page, 'coolant-inlet', 25);
  // The browser's own preview answers before the server is asked.
  await page.locator(sel('preview-tubes')).waitFor();
  expect(Number(await page.locator(sel('preview-tubes')).textContent())).toBeGreaterThan(0);

  await page.locator(sel('size-it')).click();
  await page.locator(sel('sizing-design')).waitFor();
  expect(Number(await page.locator(sel('design-tube-count')).textContent())).toBeGreaterThan(0);
  expect(await page.locator(sel('design-tube-length')).textContent()).toMatch(/^\d+(\.\d+)? m$/);
  expect(await page.locator(sel('design-correlation')).textContent()).not.toBe('');
  expect(await page.locator(sel('sizing-caution')).textContent()).toMatch(/pressure-vessel code/);

  const rows = page.locator(`${sel('sizing-alternatives')} ${sel('alternative-row')}`);
  expect(await rows.count()).toBeGreaterThan(0);
  expect(await rows.first().getAttribute('data-rank')).toBe('1');

  for (const chart of ['chart-profile', 'chart-cost']) {
    const size = await canvasSize(page, chart);
    expect(size.width, chart).toBeGreaterThan(100);
    expect(size.height, chart).toBeGreaterThan(100);
  }
  expect(await page.locator(sel('sizing-explanation')).count()).toBe(0);
});

test('a target outlet below the coolant inlet gets an explanation, not a result', async (ctx) => {
  const page = await openPage(browser(), ctx, desktop);
  await visit(page, '/size');
  await page.locator(sel('sizing-form')).waitFor();
  await setNumber(page, 'coolant-inlet', 27);
  await setNumber(page, 'process-outlet', 20);
  await page.locator(sel('preview-refused')).waitFor();

  await page.locator(sel('size-it')).click();
  const explanation = page.locator(sel('sizing-explanation'));
  await explanation.waitFor();
  expect(await explanation.textContent()).toMatch(/coolant/i);
  expect(await page.locator(sel('sizing-design')).count()).toBe(0);
  expect(await page.locator(sel('sizing-alternatives')).count()).toBe(0);
  // The field the physics is about carries the engine's words (issue 12).
  expect(await page.locator(`${sel('process-outlet-item')} .n-form-item-feedback`).textContent()).toMatch(/target outlet 20 °C is at or below the coolant inlet temperature 27 °C/);
});

test('the US toggle converts every field and sizes the same duty', async (ctx) => {
  const page = await openPage(browser(), ctx, desktop);
  await visit(page, '/size');
  await page.locator(sel('sizing-form')).waitFor();
  await page.locator(sel('unit-us')).click();
  expect(await page.locator(sel('process-inlet')).inputValue()).toBe('161.6'); // 72 °C
  await page.locator(sel('size-it')).click();
  await page.locator(sel('sizing-design')).waitFor();
  expect(await page.locator(sel('design-tube-length')).textContent()).toMatch(/ ft$/);
  expect(await page.locator(sel('design-outlet')).textContent()).toMatch(/^[\d.]+ °F ± [\d.]+ °F /);
});

test('at phone width the panels stack and the result still shows', async (ctx) => {
  const page = await openPage(browser(), ctx, phone);
  await visit(page, '/size');
  const process = await page.locator(sel('sizing-process')).boundingBox();
  const cooling = await page.locator(sel('sizing-cooling')).boundingBox();
  expect(cooling!.y).toBeGreaterThan(process!.y + process!.height - 1);
  await page.locator(sel('size-it')).click();
  await page.locator(sel('sizing-design')).waitFor();
  const width = await page.evaluate(() => document.documentElement.scrollWidth);
  expect(width).toBeLessThanOrEqual(390);
});

test('the sign-in page leads to the sizing page, whose header offers sign-in, not sign-out', async (ctx) => {
  const page = await openPage(browser(), ctx, desktop);
  await visit(page, '/sign-in');
  await page.locator(sel('link-sizing')).click();
  await page.locator(sel('sizing-form')).waitFor();
  expect(pathOf(page)).toBe('/size');
  expect(await page.locator(sel('sign-out')).count()).toBe(0);
  await page.locator(sel('header-sign-in')).click();
  await page.locator(sel('sign-in-form')).waitFor();
});

test('a stated design point sizes the walls: the card shows it with construction, hydrotest, tie rods and nozzles', async (ctx) => {
  const page = await openPage(browser(), ctx, desktop);
  await visit(page, '/size');
  await page.locator(sel('sizing-form')).waitFor();
  await page.locator(`${sel('process-design-point')} .n-collapse-item__header`).click();
  await setNumber(page, 'process-design-pressure', 10);
  // both or neither: a pressure alone is refused at the temperature field
  await page.locator(sel('size-it')).click();
  expect(await page.locator(`${sel('process-design-temp-item')} .n-form-item-feedback`).textContent()).toMatch(/design temperature too/);
  await setNumber(page, 'process-design-temp', 120);
  await page.locator(sel('size-it')).click();
  await page.locator(sel('sizing-design')).waitFor();

  // the glycol loop goes in the tubes or on the shell side: its side shows the stated point, the other the default
  const points = (await page.locator(`${sel('design-point-tube')}, ${sel('design-point-shell')}`).allTextContents()).join(' | ');
  expect(points).toMatch(/10 bar\(g\) at 120 °C(?! \(default\))/);
  expect(points).toMatch(/\(default\)/);
  // UG-99(b): 1.3 × 10 bar(g) × a stress ratio ≥ 1 (memory) on the stated side
  const hydro = (await page.locator(sel('design-hydrotest')).textContent())!;
  expect(Math.max(...[...hydro.matchAll(/([\d.]+) bar\(g\)/g)].map((m) => Number(m[1])))).toBeGreaterThanOrEqual(13);
  expect(await page.locator(sel('design-construction')).textContent()).toMatch(/^(BEM|BEU|AES|AET): .*class [RCB]/);
  expect(await page.locator(sel('design-tube-wall')).textContent()).toMatch(/needs at least [\d.]+ mm/);
  expect(await page.locator(sel('design-tie-rods')).textContent()).toMatch(/^\d+ × [\d.]+ mm per shell/);
  expect(await page.locator(sel('design-nozzles-shell')).textContent()).toMatch(/NPS/);
  expect(await page.locator(sel('design-outlet')).textContent()).toMatch(/± [\d.]+ K/);
});
