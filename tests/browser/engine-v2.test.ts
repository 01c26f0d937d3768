/**
 * Design engine v2 in the browser: a sales engineer switches where the process goes and the baffle
 * spacing of the seeded hydraulic-oil cooler and sees the rating follow, then saves; a visitor reads
 * the sizing page's alternatives (chart and table, the recommended design marked). Screenshots at
 * 1280 px go to test-results/ for the README and the review.
 */
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { expect, test } from 'vitest';
import { desktop, openPage, otherCustomer, sel, signInAs, useBrowser, visit } from './support/browser';
import { api, apiSignIn } from './support/api';

const browser = useBrowser();
const SHOTS = join(process.cwd(), 'test-results');

/** Quarry Hill Hydraulics' ISO VG 46 return-line cooler, as db/seed-quotes.ts states it. */
const SEEDED_REFERENCE = 'HPU-7 return line';
const oilDuty = {
  process: { fluid: 'oil-vg46', pressure_Pa: 500000, massFlow_kg_s: 1.2, inletTemp_C: 62, outletTemp_C: 47 },
  boundary: { kind: 'coolant', fluid: 'water', pressure_Pa: 350000, massFlow_kg_s: 2.0, inletTemp_C: 27 },
  constraints: { maxTubeLength_m: 3.5, maxPressureDrop_Pa: 70000, maxShellPressureDrop_Pa: 70000 },
};

interface ListItem {
  id: string;
  reference: string | null;
  organizationName: string;
  can?: { edit?: boolean };
}

/** The seeded quote (a copy of its duty when the seed is missing or the quote is no longer editable). */
async function seededOilQuote(): Promise<string> {
  const sales = await apiSignIn('sales@aldercreek.example');
  const list = await api<{ items: ListItem[] }>(sales, 'GET', `/quotes?q=${encodeURIComponent(SEEDED_REFERENCE)}&pageSize=100`);
  for (const item of list.items.filter((i) => i.reference === SEEDED_REFERENCE && i.organizationName === otherCustomer.organization)) {
    const detail = await api<{ can: { edit: boolean } }>(sales, 'GET', `/quotes/${item.id}`);
    if (detail.can.edit) return item.id;
  }
  const buyer = await apiSignIn(otherCustomer.email);
  const created = await api<{ id: string }>(buyer, 'POST', '/quotes', { quantity: 6, reference: SEEDED_REFERENCE, duty: oilDuty });
  return created.id;
}

const text = async (page: Page, test: string) => ((await page.locator(sel(test)).textContent()) ?? '').trim();
const figures = async (page: Page) => ({
  u: await text(page, 'live-u'),
  tubeDp: await text(page, 'live-dp'),
  shellDp: await text(page, 'live-shell-dp'),
  outlet: await text(page, 'live-outlet'),
});

/** Waits until the live figure `test` no longer reads `before`. */
async function changes(page: Page, test: string, before: string): Promise<void> {
  await page.waitForFunction(
    ([t, b]) => (document.querySelector(`[data-test="${t}"]`)?.textContent ?? '').trim() !== b,
    [test, before] as const,
  );
}

test('a sales engineer switches the allocation and the baffle spacing of the oil cooler, sees the rating change and saves', async (ctx) => {
  const id = await seededOilQuote();
  const page = await openPage(browser(), ctx, desktop);
  await signInAs(page, 'sales');
  await visit(page, `/review/${id}`);
  await page.locator(sel('geometry-editor')).waitFor();
  await page.locator(sel('live-u')).waitFor();

  // Switch the process stream to the other side from the one the saved design uses.
  const wasShell = (await text(page, 'live-allocation')).includes('oil on the shell side');
  const to = wasShell ? 'tubes' : 'shell';
  const before = await figures(page);
  await page.locator(sel(`geo-side-${to}`)).click();
  await changes(page, 'live-u', before.u);
  const switched = await figures(page);
  expect(switched.u).not.toBe(before.u);
  expect(switched.tubeDp).not.toBe(before.tubeDp);
  expect(switched.shellDp).not.toBe(before.shellDp);
  expect(switched.outlet).not.toBe(before.outlet);
  expect(await text(page, 'live-allocation')).toContain(to === 'shell' ? 'ISO VG 46 oil on the shell side, cooling water in the tubes' : 'ISO VG 46 oil in the tubes, cooling water on the shell side');

  // A wider baffle spacing slows the shell-side stream: its pressure drop and U move again.
  const spacingInput = page.locator(sel('geo-baffle-spacing'));
  const spacing = Number(await spacingInput.inputValue());
  expect(spacing).toBeGreaterThan(0);
  const wider = Math.round(spacing * 1.6);
  await spacingInput.fill(String(wider));
  await spacingInput.blur();
  await changes(page, 'live-shell-dp', switched.shellDp);
  const spaced = await figures(page);
  expect(spaced.shellDp).not.toBe(switched.shellDp);
  expect(spaced.u).not.toBe(switched.u);
  await page.locator(sel('live-price')).waitFor();

  mkdirSync(SHOTS, { recursive: true });
  await page.screenshot({ path: join(SHOTS, 'engine-v2-workspace-1280.png'), fullPage: true });

  await page.locator(sel('geo-save')).click();
  await page.waitForFunction(() => document.querySelector('[data-test="workspace-header"]')?.textContent?.includes('(draft)'));
  // The saved design now states the new allocation and spacing.
  const saved = page.locator(sel('saved-design'));
  await page.waitForFunction(
    (want) => document.querySelector('[data-test="saved-design"] [data-test="design-allocation"]')?.textContent?.includes(want),
    to === 'shell' ? 'oil on the shell side' : 'oil in the tubes',
  );
  expect(await saved.locator(sel('design-baffles')).textContent()).toContain(`spacing ${wider} mm`);
  expect(await page.locator(sel('geo-save')).isDisabled()).toBe(true);
});

test('the sizing page lets the engine choose the side, charts cost against both pressure drops and length, and marks the recommended design', async (ctx) => {
  const page = await openPage(browser(), ctx, desktop);
  await visit(page, '/size');
  await page.locator(sel('sizing-form')).waitFor();
  expect(await page.locator(sel('limit-process-side')).textContent()).toContain('Either');

  await page.locator(sel('size-it')).click();
  await page.locator(sel('sizing-design')).waitFor();
  expect(await text(page, 'design-allocation')).toMatch(/30 % ethylene glycol (in the tubes|on the shell side), cooling water (in the tubes|on the shell side)/);
  expect(await text(page, 'design-shell-method')).toMatch(/Bell–Delaware/);
  expect(await text(page, 'design-shell-kern')).toMatch(/W\/\(m²·K\)|W\/m²K|W/);
  expect(await text(page, 'design-shell-j')).toMatch(/cut [\d.]+ · leakage [\d.]+ · bypass [\d.]+/);
  // no engine codes on screen
  const card = (await page.locator(sel('sizing-design')).textContent()) ?? '';
  expect(card).not.toMatch(/bell-delaware|sieder-tate|gnielinski-|processSide|\btubes\b\s*\|/);

  const rows = page.locator(`${sel('sizing-alternatives')} ${sel('alternative-row')}`);
  expect(await rows.count()).toBeGreaterThan(1);
  expect(await page.locator(`${sel('alternative-row')}[data-recommended="true"]`).count()).toBe(1);
  await page.locator(sel('alternatives-recommended-reason')).waitFor();

  for (const axis of ['shellDp', 'length', 'tubeDp']) {
    await page.locator(sel(`chart-axis-${axis}`)).click();
    await page.waitForFunction((a) => document.querySelector('[data-test="chart-cost"]')?.getAttribute('data-axis') === a, axis);
    expect(await page.locator(`${sel('chart-cost')} canvas`).getAttribute('aria-label')).toMatch(/recommended design costs/);
  }
  await rows.nth(1).click();
  await page.locator(sel('picked-design')).waitFor();
  expect(await text(page, 'picked-headline')).toMatch(/^Picked: \d+ tubes ×/);
  expect(await rows.nth(1).getAttribute('data-picked')).toBe('true');

  mkdirSync(SHOTS, { recursive: true });
  await page.locator(sel('sizing-plots')).scrollIntoViewIfNeeded();
  await page.locator(sel('chart-cost')).screenshot({ path: join(SHOTS, 'engine-v2-alternatives-chart-1280.png') });
  await page.screenshot({ path: join(SHOTS, 'engine-v2-sizing-1280.png'), fullPage: true });

  // Fixing the side: the process goes on the shell side and the result says so.
  await page.locator(sel('limit-process-side')).click();
  await page.locator('.n-base-select-option').filter({ hasText: 'On the shell side' }).first().click();
  await page.locator(sel('size-it')).click();
  await page.waitForFunction(() => document.querySelector('[data-test="design-allocation"]')?.textContent?.includes('glycol on the shell side'));
});
