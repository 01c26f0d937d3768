/**
 * No stock texts of the component library on our pages (issue 12): no "Please Input", "Please
 * Select", "Select Date" placeholders nor "No Data" in an empty table, on the pages each role uses.
 */
import { beforeAll, expect, test } from 'vitest';
import type { Role } from '../../shared/schemas/auth';
import { apiAs } from './support/api';
import { demoUsers, openPage, signInAs, useBrowser, visit } from './support/browser';

const browser = useBrowser();
const STOCK = /^(Please (Input|Select)|Select (Date|Time|Date and Time)|Start Date|End Date|No Data)$/i;
let quoteId = '';

beforeAll(async () => {
  const customer = await apiAs(demoUsers.customer.email);
  const duty = {
    process: { fluid: 'oil-vg46', pressure_Pa: 500_000, massFlow_kg_s: 1.2, inletTemp_C: 62, outletTemp_C: 47 },
    boundary: { kind: 'coolant', fluid: 'water', pressure_Pa: 350_000, massFlow_kg_s: 2.0, inletTemp_C: 27 },
    constraints: { maxTubeLength_m: 3.5, maxPressureDrop_Pa: 70_000, maxShellPressureDrop_Pa: 70_000 },
  };
  quoteId = (await customer<{ id: string }>('POST', '/quotes', { duty, quantity: 1, reference: 'Placeholder check' })).id;
}, 60_000);

const PAGES: [Role, () => string, string][] = [
  ['customer', () => '/size', 'form'],
  ['customer', () => '/quotes/new', 'form'],
  ['customer', () => `/quotes/${quoteId}`, '[data-test="quote-number"]'],
  ['customer', () => '/orders?status=cancelled', '[data-test="orders-page"]'],
  ['sales', () => `/review/${quoteId}`, '[data-test="workspace-number"]'],
  ['sales', () => '/staff/orders', '[data-test="orders-table"]'],
  ['admin', () => '/admin/price-book', '[data-test="pb-tubes-row"]'],
  ['admin', () => '/admin/mail', 'main'],
];

test('no field, select, date picker or empty table shows the component library’s stock text', async (ctx) => {
  for (const [role, path, ready] of PAGES) {
    const page = await openPage(browser(), ctx);
    await signInAs(page, role);
    await visit(page, path());
    await page.locator(ready).first().waitFor({ timeout: 60_000 });
    await page.waitForLoadState('networkidle');
    const stock = await page.evaluate((source) => {
      const re = new RegExp(source, 'i');
      const texts = [
        ...[...document.querySelectorAll<HTMLInputElement | HTMLTextAreaElement>('input[placeholder], textarea[placeholder]')].map((i) => i.placeholder.trim()),
        ...[...document.querySelectorAll<HTMLElement>('.n-base-selection-placeholder, .n-empty__description')].map((e) => (e.textContent ?? '').trim()),
      ];
      return texts.filter((t) => re.test(t));
    }, STOCK.source);
    expect(stock, `${role} ${path()}`).toEqual([]);
    await page.context().close();
  }
}, 600_000);
