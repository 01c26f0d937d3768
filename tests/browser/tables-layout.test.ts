/**
 * The main pages at a phone's 390 px and a desktop's 1440 px (issue 12): no sideways scrolling of the
 * page, the key columns of each table in view (number and status on a phone; the total or customer
 * too on a desktop), a cue when columns are out of view, and record numbers that are real links
 * (an <a href> a middle or ctrl click opens in a new tab). Screenshots go to test-results/layout-*.png.
 */
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { beforeAll, describe, expect, test } from 'vitest';
import type { Role } from '../../shared/schemas/auth';
import { apiAs } from './support/api';
import { demoUsers, openPage, sel, signInAs, useBrowser, visit } from './support/browser';

const browser = useBrowser();
const RESULTS = join(process.cwd(), 'test-results');
const WIDTHS = [390, 1440] as const;

const duty = {
  process: { fluid: 'oil-vg46', pressure_Pa: 500_000, massFlow_kg_s: 1.2, inletTemp_C: 62, outletTemp_C: 47 },
  boundary: { kind: 'coolant', fluid: 'water', pressure_Pa: 350_000, massFlow_kg_s: 2.0, inletTemp_C: 27 },
  constraints: { maxTubeLength_m: 3.5, maxPressureDrop_Pa: 70_000, maxShellPressureDrop_Pa: 70_000 },
};
let quote: { id: string; number: string };

beforeAll(async () => {
  // at least one quote in every list (the lists of a fresh database may be empty)
  const customer = await apiAs(demoUsers.customer.email);
  quote = await customer<{ id: string; number: string }>('POST', '/quotes', { duty, quantity: 1, reference: 'Layout check, HPU-2' });
}, 60_000);

interface Screen {
  name: string;
  role: Role;
  path: () => string;
  /** waits for the page's content */
  ready: string;
  /** column keys that must be in full view: [on a phone, on a desktop] */
  columns?: [string[], string[]];
  /** a link to a record: its data-test and the path it leads to */
  link?: { test: string; href: RegExp };
}

const SCREENS: Screen[] = [
  { name: 'quotes', role: 'customer', path: () => '/quotes', ready: 'quote-row', columns: [['number', 'status'], ['number', 'status', 'priceTotal_minor']], link: { test: 'quote-link', href: /^\/quotes\/[0-9a-f-]{36}$/ } },
  { name: 'quote-detail', role: 'customer', path: () => `/quotes/${quote.id}`, ready: 'quote-number' },
  { name: 'review-queue', role: 'sales', path: () => '/review', ready: 'queue-row', columns: [['number', 'status'], ['number', 'status', 'value', 'customer']], link: { test: 'queue-link', href: /^\/review\/[0-9a-f-]{36}$/ } },
  { name: 'orders', role: 'customer', path: () => '/orders', ready: 'orders-page', columns: [['number', 'status'], ['number', 'status', 'total_minor']] },
  { name: 'staff-orders', role: 'sales', path: () => '/staff/orders', ready: 'orders-table', columns: [['number', 'status'], ['number', 'status', 'customer', 'total']] },
  { name: 'shop-board', role: 'shop', path: () => '/shop', ready: 'shop-board' },
  { name: 'price-book', role: 'admin', path: () => '/admin/price-book', ready: 'pb-tubes-row', columns: [['material'], ['material', 'od', 'wall', 'perMetre_minor']] },
];

/** Where each of `keys`' header cells sits against the viewport and its table's visible box. */
async function columnPlaces(page: Page, keys: string[]) {
  return page.evaluate((keys) => {
    const out: Record<string, { inView: boolean; left: number; right: number }> = {};
    for (const key of keys) {
      const th = document.querySelector<HTMLElement>(`th[data-col-key="${key}"]`);
      if (!th) continue;
      const r = th.getBoundingClientRect();
      const box = (th.closest('.n-data-table') as HTMLElement).getBoundingClientRect();
      const left = Math.max(0, box.left);
      const right = Math.min(document.documentElement.clientWidth, box.right);
      out[key] = { inView: r.left >= left - 1 && r.right <= right + 1, left: Math.round(r.left), right: Math.round(r.right) };
    }
    return out;
  }, keys);
}

/** Header cells of the first table that are out of its visible box (what the cue should count). */
async function hiddenColumns(page: Page): Promise<number> {
  return page.evaluate(() => {
    const table = document.querySelector<HTMLElement>('.n-data-table');
    if (!table) return 0;
    const box = table.getBoundingClientRect();
    return [...table.querySelectorAll<HTMLElement>('thead th')].filter((th) => {
      const r = th.getBoundingClientRect();
      return th.offsetWidth > 0 && (r.right > box.right + 1 || r.left < box.left - 1);
    }).length;
  });
}

for (const width of WIDTHS) {
  describe(`at ${width} px`, () => {
    for (const screen of SCREENS) {
      test(`${screen.name}: no sideways page scroll, key columns in view`, async (ctx) => {
        const page = await openPage(browser(), ctx, { width, height: 900 });
        page.setDefaultNavigationTimeout(60_000); // a loaded machine; nothing here is timed
        await signInAs(page, screen.role);
        await visit(page, screen.path());
        await page.locator(sel(screen.ready)).first().waitFor({ timeout: 60_000 });
        // the pager's "N quotes" must not run off the left edge either
        for (const pager of await page.locator('.n-data-table__pagination').all()) {
          expect((await pager.boundingBox())!.x).toBeGreaterThanOrEqual(0);
          const prefix = pager.locator('.n-pagination-prefix');
          if (await prefix.count()) expect((await prefix.boundingBox())!.x, 'the pager count is cut off').toBeGreaterThanOrEqual(0);
        }
        await page.evaluate(() => document.fonts.ready);
        mkdirSync(RESULTS, { recursive: true });
        await page.screenshot({ path: join(RESULTS, `layout-${screen.name}-${width}.png`), fullPage: true });

        const { scrollWidth, clientWidth } = await page.evaluate(() => ({ scrollWidth: document.documentElement.scrollWidth, clientWidth: document.documentElement.clientWidth }));
        expect(scrollWidth, 'the page scrolls sideways').toBeLessThanOrEqual(clientWidth);

        if (screen.columns) {
          const keys = screen.columns[width === 390 ? 0 : 1];
          const places = await columnPlaces(page, keys);
          for (const key of keys) expect(places[key], `column ${key}: ${JSON.stringify(places[key])}`).toMatchObject({ inView: true });
          const hidden = await hiddenColumns(page);
          const cue = page.locator(sel('columns-cue')).first();
          if (hidden > 0) {
            await cue.waitFor();
            expect(await cue.textContent()).toContain(`${hidden} more column${hidden === 1 ? '' : 's'}`);
          } else {
            expect(await page.locator(sel('columns-cue')).count()).toBe(0);
          }
        }
        if (screen.link) {
          const link = page.locator(sel(screen.link.test)).first();
          expect(await link.evaluate((a) => a.tagName)).toBe('A');
          expect(await link.getAttribute('href')).toMatch(screen.link.href);
        }
      });
    }
  });
}

test('a plain click on a queue number opens the workspace in the app; the cue follows sideways scrolling', async (ctx) => {
  const page = await openPage(browser(), ctx, { width: 390, height: 900 });
  page.setDefaultNavigationTimeout(60_000);
  await signInAs(page, 'sales');
  await visit(page, '/review');
  await page.locator(sel('queue-row')).first().waitFor({ timeout: 60_000 });
  const cue = page.locator(sel('columns-cue')).first();
  await cue.waitFor();
  const before = await cue.textContent();
  // scroll the table to its far right: the cue now counts the columns out of view on the left
  await page.evaluate(() => {
    for (const el of document.querySelectorAll<HTMLElement>('.n-data-table .n-scrollbar-container, .n-data-table-base-table-header')) el.scrollLeft = 10_000;
  });
  await expect.poll(() => cue.textContent()).not.toBe(before);
  const link = page.locator(sel('queue-link')).first();
  const number = await link.textContent();
  await link.click();
  await page.locator(sel('workspace-number')).waitFor({ timeout: 60_000 });
  expect(await page.locator(sel('workspace-number')).textContent()).toBe(number);
  expect(new URL(page.url()).pathname).toMatch(/^\/review\/[0-9a-f-]{36}$/);
});
