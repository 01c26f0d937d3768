import express from 'express';
import { requireTestKey } from './auth';
import { errorHandler, invalidRequest } from './errors';
import { hostedPageRoutes } from './hosted-page';
import { idempotency, requestId } from './idempotency';
import type { Ledger } from './payment-intents';
import { eventRoutes } from './routes/events';
import { paymentIntentRoutes } from './routes/payment-intents';
import { refundRoutes } from './routes/refunds';
import { StripeFakeState } from './state';
import { WebhookSender } from './webhooks';

export const DEFAULT_WEBHOOK_SECRET = 'whsec_bundlesmith_local';

export interface StripeFakeOptions {
  /** where events are POSTed (the app's /api/payments/webhook); none: events are only listed */
  webhookUrl?: string;
  webhookSecret?: string;
  /** the fake's own base URL as the browser sees it, for the hosted page's form */
  publicUrl?: string;
  /** pauses before each webhook retry (default 1 s, 5 s, 25 s); tests pass a few milliseconds */
  retryDelaysMs?: readonly number[];
  webhookTimeoutMs?: number;
  log?: (line: string) => void;
}

export interface StripeFake {
  app: express.Express;
  state: StripeFakeState;
  /** stops pending webhook retries; the caller closes its own http server */
  close: () => void;
}

/**
 * The local Stripe fake as an Express app, not yet listening: index.ts listens on STRIPE_FAKE_PORT,
 * tests call `app.listen(0)` in-process. Order: request id → /v1 (auth → form body → idempotency →
 * resources) → hosted page → 404 → errors.
 */
export function createStripeFake(options: StripeFakeOptions = {}): StripeFake {
  const state = new StripeFakeState();
  const webhooks = new WebhookSender(state, {
    url: options.webhookUrl,
    secret: options.webhookSecret ?? DEFAULT_WEBHOOK_SECRET,
    retryDelaysMs: options.retryDelaysMs ?? [1000, 5000, 25000],
    timeoutMs: options.webhookTimeoutMs ?? 10000,
    log: options.log ?? ((line) => console.log(line)),
  });
  const ledger: Ledger = { state, webhooks };

  const app = express();
  app.disable('x-powered-by');
  // the SDK sends nested GET parameters (`expand[0]=…`) the way qs writes them
  app.set('query parser', 'extended');
  app.use(requestId);

  const api = express.Router();
  api.use(requireTestKey);
  api.use(express.urlencoded({ extended: true, limit: '1mb' }));
  api.use(idempotency(state));
  api.use(paymentIntentRoutes(ledger));
  api.use(refundRoutes(ledger));
  api.use(eventRoutes(state));
  api.use((req) => {
    throw invalidRequest(`Unrecognized request URL (${req.method}: ${req.originalUrl}). The local Stripe fake implements only what Bundlesmith uses.`, { status: 404 });
  });
  app.use('/v1', api); // the resource routers name their paths below /v1

  app.use(hostedPageRoutes(ledger, options.publicUrl?.replace(/\/$/, '')));
  app.get('/', (_req, res) => {
    res.json({ name: 'Bundlesmith local Stripe fake', api: '/v1', hosted_page: '/pay/{payment_intent}?return_url=…' });
  });
  app.use((req) => {
    throw invalidRequest(`Unrecognized request URL (${req.method}: ${req.originalUrl}).`, { status: 404 });
  });
  app.use(errorHandler);

  return { app, state, close: () => webhooks.close() };
}
