/**
 * Browser-test support: one headless Chromium per test file (Debian's /usr/bin/chromium driven by
 * playwright-core), a fresh context per test (own cookies and storage), screenshots of failures
 * under test-results/, and sign-in through the real form.
 *
 * The server under test (built client + API) is started by docker-free-scripts/test.sh, which exports
 * BASE_URL. playwright's launch() gives Chromium a fresh temporary profile and deletes it on close.
 */
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { chromium, type Browser, type Page } from 'playwright-core';
import { afterAll, beforeAll, type TestContext } from 'vitest';
import type { Role } from '../../../shared/schemas/auth';

// Vitest copies Vite's own BASE_URL ('/') into process.env, hiding the exported one; test.sh also
// exports APP_URL, so take whichever of the two is an absolute address.
export const BASE_URL = [process.env.BASE_URL, process.env.APP_URL, 'http://127.0.0.1:3100']
  .find((url): url is string => typeof url === 'string' && /^https?:\/\//.test(url))!
  .replace(/\/$/, '');
export const DEMO_PASSWORD = 'Bundlesmith-demo-1';

/** The seeded demo sign-ins (see README). */
export const demoUsers: Record<Role, { email: string; organization: string }> = {
  customer: { email: 'customer@pellmar.example', organization: 'Pellmar Compression' },
  sales: { email: 'sales@aldercreek.example', organization: 'Alder Creek Thermal Works' },
  shop: { email: 'shop@aldercreek.example', organization: 'Alder Creek Thermal Works' },
  admin: { email: 'admin@aldercreek.example', organization: 'Alder Creek Thermal Works' },
};
export const otherCustomer = { email: 'buyer@quarryhill.example', organization: 'Quarry Hill Hydraulics' };

export const desktop = { width: 1280, height: 900 };
export const phone = { width: 390, height: 844 };

const RESULTS_DIR = join(process.cwd(), 'test-results');

/** Registers beforeAll/afterAll for one Chromium per file; call at the top of a test file. */
export function useBrowser(): () => Browser {
  let browser: Browser | undefined;
  beforeAll(async () => {
    browser = await chromium.launch({
      executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
      headless: true,
      args: [
        '--headless',
        '--no-sandbox',
        '--disable-gpu',
        '--disable-background-networking',
        '--disable-quic',
        '--no-first-run',
        '--disable-component-update',
        '--disable-sync',
      ],
    });
  });
  afterAll(async () => {
    await browser?.close();
  });
  return () => {
    if (!browser) throw new Error('Chromium did not start');
    return browser;
  };
}

/**
 * A new page in its own context for this test; on failure a full-page screenshot goes to
 * test-results/<test name>.png; the context is closed when the test ends.
 */
export async function openPage(
  browser: Browser,
  ctx: TestContext,
  viewport: { width: number; height: number } = desktop,
): Promise<Page> {
  const context = await browser.newContext({ baseURL: BASE_URL, viewport });
  const page = await context.newPage();
  page.setDefaultTimeout(15_000);
  ctx.onTestFinished(async ({ task }) => {
    if (task.result?.state === 'fail') {
      mkdirSync(RESULTS_DIR, { recursive: true });
      const name = task.name.replace(/[^a-z0-9]+/gi, '-').toLowerCase();
      await page.screenshot({ path: join(RESULTS_DIR, `${name}.png`), fullPage: true }).catch(() => undefined);
    }
    await context.close();
  });
  return page;
}

/** Opens a path of the app under test (absolute URLs, so nothing depends on context options). */
export async function visit(page: Page, path: string): Promise<void> {
  await page.goto(new URL(path, BASE_URL).toString());
}

export const sel = (name: string) => `[data-test="${name}"]`;

/** Fills and submits the sign-in form; does not wait for where it leads. */
export async function submitSignIn(page: Page, email: string, password: string): Promise<void> {
  if (!page.url().includes('/sign-in')) await visit(page, '/sign-in');
  await page.locator(sel('sign-in-email')).fill(email);
  await page.locator(sel('sign-in-password')).fill(password);
  await page.locator(sel('sign-in-submit')).click();
}

/** Signs in a demo role through the real form and waits for that role's home page. */
export async function signInAs(page: Page, role: Role): Promise<void> {
  await visit(page, '/sign-in');
  await submitSignIn(page, demoUsers[role].email, DEMO_PASSWORD);
  await page.locator(sel(`home-${role}`)).waitFor();
}

export function pathOf(page: Page): string {
  return new URL(page.url()).pathname;
}
