/**
 * The app listening on an ephemeral port (the Stripe fake must reach its webhook) with the local
 * Stripe fake in the same process, the app's SDK pointed at it.
 */
import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import Stripe from 'stripe';
import { createStripeFake, type StripeFake } from '../../../server/fakes/stripe/app';
import { startTestApp, type TestApp } from './app';

export const SECRET_KEY = 'sk_test_bundlesmith_local';
export const WEBHOOK_SECRET = 'whsec_bundlesmith_local';

export interface PaymentsHarness {
  t: TestApp;
  fake: StripeFake;
  /** an SDK client of the fake, as the buyer's card processor would confirm payments */
  stripe: Stripe;
  appUrl: string;
  close(): Promise<void>;
}

const listen = (server: Server) =>
  new Promise<number>((resolve) => server.listen(0, '127.0.0.1', () => resolve((server.address() as AddressInfo).port)));

export async function startPayments(): Promise<PaymentsHarness> {
  const fakeServer = createServer();
  const fakePort = await listen(fakeServer);
  const t = await startTestApp({ STRIPE_API_URL: `http://127.0.0.1:${fakePort}`, STRIPE_PAY_URL: `http://127.0.0.1:${fakePort}` });
  const appServer = createServer(t.app);
  const appPort = await listen(appServer);
  const appUrl = `http://127.0.0.1:${appPort}`;
  const fake = createStripeFake({ webhookUrl: `${appUrl}/api/payments/webhook`, webhookSecret: WEBHOOK_SECRET, retryDelaysMs: [50, 100], log: () => undefined });
  fakeServer.on('request', fake.app);
  const stripe = new Stripe(SECRET_KEY, { host: '127.0.0.1', port: fakePort, protocol: 'http' });
  return {
    t,
    fake,
    stripe,
    appUrl,
    async close() {
      fake.close();
      await new Promise((r) => fakeServer.close(r));
      await new Promise((r) => appServer.close(r));
      await t.close();
    },
  };
}

/** Polls until `check` returns a value (webhooks arrive asynchronously). */
export async function eventually<T>(check: () => Promise<T | undefined>, timeoutMs = 10_000): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const value = await check();
    if (value !== undefined) return value;
    if (Date.now() > deadline) throw new Error('condition not met in time');
    await new Promise((r) => setTimeout(r, 100));
  }
}

export const acceptance = () => ({
  poNumber: 'PO-77812',
  billingContact: { name: 'Accounts Payable', email: 'ap@pellmar.example' },
  deliveryAddress: { line1: '12 Foundry Lane', city: 'Rivermouth', postalCode: '40123', country: 'United States' },
});
