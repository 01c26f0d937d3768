/**
 * The local Stripe fake against the real `stripe` SDK: every call the app makes goes through the SDK
 * exactly as in production, so these tests check both the fake's wire shapes and that the SDK reads
 * them as it reads Stripe's (error classes, idempotency, webhook signatures). No database needed.
 */
import { createServer, type IncomingMessage, type RequestListener, type Server, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';
import Stripe from 'stripe';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createStripeFake } from '../../server/fakes/stripe/app';
import { constructEvent, createStripe, isSignatureError, localPaymentPageUrl } from '../../server/lib/payments';

const SECRET = 'whsec_test_fake_secret';

async function listen(handler: RequestListener): Promise<{ server: Server; url: string; port: number }> {
  const server = createServer(handler);
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const { port } = server.address() as AddressInfo;
  return { server, url: `http://127.0.0.1:${port}`, port };
}

const stop = (server: Server) => new Promise<void>((resolve) => server.close(() => resolve()));

async function waitFor(check: () => boolean, what: string, timeoutMs = 10_000) {
  const until = Date.now() + timeoutMs;
  while (!check()) {
    if (Date.now() > until) throw new Error(`timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 10));
  }
}

const readBody = (req: IncomingMessage) =>
  new Promise<Buffer>((resolve) => {
    const chunks: Buffer[] = [];
    req.on('data', (c: Buffer) => chunks.push(c));
    req.on('end', () => resolve(Buffer.concat(chunks)));
  });

/** A webhook endpoint that verifies every delivery as the app will, answering as `answer` says. */
function receiver(answer: (attempt: number) => number = () => 200) {
  const received: Stripe.Event[] = [];
  const rejected: string[] = [];
  let attempts = 0;
  const handler = async (req: IncomingMessage, res: ServerResponse) => {
    const raw = await readBody(req);
    attempts += 1;
    try {
      const event = constructEvent(raw, req.headers['stripe-signature'], SECRET);
      const status = answer(attempts);
      if (status < 300) received.push(event);
      res.writeHead(status).end();
    } catch (err) {
      rejected.push(String(err));
      res.writeHead(400).end();
    }
  };
  return { handler, received, rejected, attempts: () => attempts };
}

/** A fake listening on port 0 and an SDK client pointed at it, the way the app's config does it. */
async function startFake(options: Parameters<typeof createStripeFake>[0] = {}) {
  const fake = createStripeFake({ webhookSecret: SECRET, retryDelaysMs: [10, 20, 40], log: () => undefined, ...options });
  const { server, url, port } = await listen(fake.app);
  const stripe = new Stripe('sk_test_bundlesmith_unit', { host: '127.0.0.1', port, protocol: 'http', maxNetworkRetries: 0 });
  return { fake, server, url, port, stripe, stop: async () => { fake.close(); await stop(server); } };
}

async function expectStripeError(call: Promise<unknown>): Promise<Stripe.errors.StripeError> {
  const err = await call.then(() => undefined, (e: unknown) => e);
  expect(err).toBeInstanceOf(Stripe.errors.StripeError);
  return err as Stripe.errors.StripeError;
}

const pay = (stripe: Stripe, amount = 10000, metadata: Record<string, string> = {}) =>
  stripe.paymentIntents.create({ amount, currency: 'usd', metadata, automatic_payment_methods: { enabled: true } });

describe('local Stripe fake: the API through the SDK', () => {
  let ctx: Awaited<ReturnType<typeof startFake>>;
  let stripe: Stripe;
  beforeAll(async () => {
    ctx = await startFake();
    stripe = ctx.stripe;
  });
  afterAll(() => ctx.stop());

  it('creates and retrieves a PaymentIntent in Stripe\'s shape', async () => {
    const pi = await stripe.paymentIntents.create({
      amount: 123456,
      currency: 'USD',
      description: 'Deposit Q-1042',
      metadata: { quoteId: 'q_1', revision: '3' },
      automatic_payment_methods: { enabled: true },
    });
    expect(pi.id).toMatch(/^pi_\w{24}$/);
    expect(pi.client_secret).toMatch(new RegExp(`^${pi.id}_secret_\\w+$`));
    expect(pi).toMatchObject({
      object: 'payment_intent', amount: 123456, currency: 'usd', status: 'requires_payment_method', livemode: false,
      amount_received: 0, latest_charge: null, last_payment_error: null, description: 'Deposit Q-1042',
      metadata: { quoteId: 'q_1', revision: '3' }, automatic_payment_methods: { enabled: true },
    });
    expect(pi.created).toBeCloseTo(Date.now() / 1000, -1);
    expect(await stripe.paymentIntents.retrieve(pi.id)).toEqual(pi);
  });

  it('answers 404 resource_missing for an unknown intent and 400 for a missing or unknown parameter', async () => {
    const missing = await expectStripeError(stripe.paymentIntents.retrieve('pi_nope'));
    expect(missing).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect(missing).toMatchObject({ statusCode: 404, code: 'resource_missing' });
    const noCurrency = await expectStripeError(stripe.paymentIntents.create({ amount: 100 } as Stripe.PaymentIntentCreateParams));
    expect(noCurrency).toMatchObject({ statusCode: 400, code: 'parameter_missing', param: 'currency' });
    const unknown = await expectStripeError(
      stripe.paymentIntents.create({ amount: 100, currency: 'usd', colour: 'red' } as Stripe.PaymentIntentCreateParams),
    );
    expect(unknown).toMatchObject({ statusCode: 400, code: 'parameter_unknown', param: 'colour' });
  });

  it('confirms with pm_card_visa: succeeded, a charge, amount_received; a second confirm is refused', async () => {
    const pi = await pay(stripe, 5000);
    const done = await stripe.paymentIntents.confirm(pi.id, { payment_method: 'pm_card_visa' });
    expect(done).toMatchObject({ status: 'succeeded', amount_received: 5000, last_payment_error: null });
    expect(done.latest_charge).toMatch(/^ch_/);
    const expanded = await stripe.paymentIntents.retrieve(pi.id, { expand: ['latest_charge'] });
    expect(expanded.latest_charge).toMatchObject({ object: 'charge', status: 'succeeded', amount_captured: 5000, paid: true });
    const again = await expectStripeError(stripe.paymentIntents.confirm(pi.id, { payment_method: 'pm_card_visa' }));
    expect(again).toMatchObject({ statusCode: 400, code: 'payment_intent_unexpected_state' });
  });

  it('declines pm_card_chargeDeclined with a 402 StripeCardError and records last_payment_error; a later good card pays', async () => {
    const pi = await pay(stripe, 7000);
    const err = await expectStripeError(stripe.paymentIntents.confirm(pi.id, { payment_method: 'pm_card_chargeDeclined' }));
    expect(err).toBeInstanceOf(Stripe.errors.StripeCardError);
    expect(err).toMatchObject({ statusCode: 402, type: 'StripeCardError', code: 'card_declined', decline_code: 'generic_decline' });
    expect(err.payment_intent).toMatchObject({ id: pi.id, status: 'requires_payment_method' });
    const after = await stripe.paymentIntents.retrieve(pi.id);
    expect(after.status).toBe('requires_payment_method');
    expect(after.last_payment_error).toMatchObject({ type: 'card_error', code: 'card_declined', decline_code: 'generic_decline' });
    expect(after.amount_received).toBe(0);
    const retried = await stripe.paymentIntents.confirm(pi.id, { payment_method: 'pm_card_visa' });
    expect(retried).toMatchObject({ status: 'succeeded', last_payment_error: null });
  });

  it('refuses an unknown payment method with 400 invalid_request_error', async () => {
    const pi = await pay(stripe);
    const err = await expectStripeError(stripe.paymentIntents.confirm(pi.id, { payment_method: 'pm_card_imaginary' }));
    expect(err).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect(err).toMatchObject({ statusCode: 400, rawType: 'invalid_request_error', param: 'payment_method' });
  });

  it('cancels an unpaid intent; cancelling it again or cancelling a paid one is a 400', async () => {
    const pi = await pay(stripe);
    const canceled = await stripe.paymentIntents.cancel(pi.id, { cancellation_reason: 'abandoned' });
    expect(canceled).toMatchObject({ status: 'canceled', cancellation_reason: 'abandoned' });
    expect(canceled.canceled_at).toBeTypeOf('number');
    const twice = await expectStripeError(stripe.paymentIntents.cancel(pi.id));
    expect(twice).toMatchObject({ statusCode: 400, code: 'payment_intent_unexpected_state' });
    const paid = await pay(stripe);
    await stripe.paymentIntents.confirm(paid.id, { payment_method: 'pm_card_visa' });
    const late = await expectStripeError(stripe.paymentIntents.cancel(paid.id));
    expect(late).toMatchObject({ statusCode: 400, code: 'payment_intent_unexpected_state' });
    const confirmCanceled = await expectStripeError(stripe.paymentIntents.confirm(pi.id, { payment_method: 'pm_card_visa' }));
    expect(confirmCanceled).toMatchObject({ statusCode: 400, code: 'payment_intent_unexpected_state' });
  });

  it('refunds in part, refuses an over-refund and a refund of an unpaid intent', async () => {
    const pi = await pay(stripe, 10000);
    await stripe.paymentIntents.confirm(pi.id, { payment_method: 'pm_card_visa' });
    const first = await stripe.refunds.create({ payment_intent: pi.id, amount: 6000, reason: 'requested_by_customer' });
    expect(first.id).toMatch(/^re_/);
    expect(first).toMatchObject({ object: 'refund', amount: 6000, status: 'succeeded', payment_intent: pi.id, currency: 'usd' });
    const over = await expectStripeError(stripe.refunds.create({ payment_intent: pi.id, amount: 5000 }));
    expect(over).toMatchObject({ statusCode: 400, code: 'amount_too_large', param: 'amount' });
    const rest = await stripe.refunds.create({ payment_intent: pi.id }); // no amount: what is left
    expect(rest.amount).toBe(4000);
    const charge = await stripe.charges.retrieve(first.charge as string);
    expect(charge).toMatchObject({ amount_refunded: 10000, refunded: true });
    const more = await expectStripeError(stripe.refunds.create({ payment_intent: pi.id, amount: 1 }));
    expect(more).toMatchObject({ statusCode: 400, code: 'charge_already_refunded' });
    const unpaid = await pay(stripe);
    const notPaid = await expectStripeError(stripe.refunds.create({ payment_intent: unpaid.id }));
    expect(notPaid).toMatchObject({ statusCode: 400, rawType: 'invalid_request_error' });
    expect(await stripe.refunds.retrieve(first.id)).toEqual(first);
  });

  it('lists events newest first, filtered by type and limited', async () => {
    const pi = await pay(stripe, 4200, { marker: 'events' });
    await stripe.paymentIntents.confirm(pi.id, { payment_method: 'pm_card_visa' });
    const all = await stripe.events.list();
    expect(all.object).toBe('list');
    expect(all.data[0]).toMatchObject({ object: 'event', type: 'payment_intent.succeeded', livemode: false });
    expect(all.data[0]!.id).toMatch(/^evt_/);
    expect((all.data[0]!.data.object as Stripe.PaymentIntent).id).toBe(pi.id);
    const created = all.data.map((e) => e.created);
    expect([...created].sort((a, b) => b - a)).toEqual(created);
    const refunds = await stripe.events.list({ type: 'charge.refunded', limit: 1 });
    expect(refunds.data).toHaveLength(1);
    expect(refunds.data[0]!.type).toBe('charge.refunded');
    expect(refunds.has_more).toBe(true); // the refund test above made two
    const wildcard = await stripe.events.list({ type: 'payment_intent.*', limit: 100 });
    expect(new Set(wildcard.data.map((e) => e.type))).toEqual(
      new Set(['payment_intent.succeeded', 'payment_intent.payment_failed', 'payment_intent.canceled']),
    );
    expect(await stripe.events.retrieve(all.data[0]!.id)).toEqual(all.data[0]);
  });

  it('accepts only sk_test_ keys: 401 StripeAuthenticationError otherwise', async () => {
    for (const key of ['sk_live_0123456789abcdef', 'pk_test_0123456789abcdef', 'rk_test_0123']) {
      const other = new Stripe(key, { host: '127.0.0.1', port: ctx.port, protocol: 'http', maxNetworkRetries: 0 });
      const err = await expectStripeError(other.paymentIntents.create({ amount: 100, currency: 'usd' }));
      expect(err).toBeInstanceOf(Stripe.errors.StripeAuthenticationError);
      expect(err).toMatchObject({ statusCode: 401, rawType: 'invalid_request_error' });
      expect(err.message).toMatch(/^Invalid API Key provided/);
    }
  });

  it('replays the same response for the same idempotency key and refuses the key with other params', async () => {
    const before = ctx.fake.state.paymentIntents.size;
    const params = { amount: 2500, currency: 'eur', metadata: { acceptance: 'a-1' } };
    const a = await stripe.paymentIntents.create(params, { idempotencyKey: 'accept-a-1' });
    const b = await stripe.paymentIntents.create({ metadata: { acceptance: 'a-1' }, currency: 'eur', amount: 2500 }, { idempotencyKey: 'accept-a-1' });
    expect(b).toEqual(a);
    expect(b.lastResponse.headers['idempotent-replayed']).toBe('true');
    expect(ctx.fake.state.paymentIntents.size).toBe(before + 1);
    const other = await expectStripeError(stripe.paymentIntents.create({ ...params, amount: 2600 }, { idempotencyKey: 'accept-a-1' }));
    expect(other).toBeInstanceOf(Stripe.errors.StripeIdempotencyError);
    expect(other).toMatchObject({ statusCode: 400, rawType: 'idempotency_error' });
    // a decline is a result too: replayed as the same 402, not charged twice
    const first = await expectStripeError(stripe.paymentIntents.confirm(a.id, { payment_method: 'pm_card_chargeDeclined' }, { idempotencyKey: 'pay-a-1' }));
    const replay = await expectStripeError(stripe.paymentIntents.confirm(a.id, { payment_method: 'pm_card_chargeDeclined' }, { idempotencyKey: 'pay-a-1' }));
    const { headers: _h1, requestId: firstRequest, ...firstBody } = first.raw as Record<string, unknown>;
    const { headers: replayHeaders, requestId: _r2, ...replayBody } = replay.raw as Record<string, unknown>;
    expect(replayBody).toEqual(firstBody);
    expect(replayHeaders).toMatchObject({ 'idempotent-replayed': 'true', 'original-request': firstRequest });
    expect([...ctx.fake.state.charges.values()].filter((c) => c.payment_intent === a.id)).toHaveLength(1);
  });

  it('is reached through createStripe(STRIPE_API_URL) the way the app configures the SDK', async () => {
    const appStripe = createStripe({ STRIPE_SECRET_KEY: 'sk_test_bundlesmith_local', STRIPE_API_URL: ctx.url });
    const pi = await appStripe.paymentIntents.create({ amount: 999, currency: 'gbp' });
    expect(ctx.fake.state.paymentIntents.get(pi.id)?.currency).toBe('gbp');
  });
});

describe('local Stripe fake: webhooks', () => {
  it('delivers each state change signed; the SDK verifies every delivery', async () => {
    const hook = receiver();
    const endpoint = await listen(hook.handler);
    const { stripe, stop: stopFake } = await startFake({ webhookUrl: `${endpoint.url}/api/payments/webhook` });
    try {
      const paid = await pay(stripe, 3000);
      await stripe.paymentIntents.confirm(paid.id, { payment_method: 'pm_card_visa' });
      const declined = await pay(stripe, 3000);
      await stripe.paymentIntents.confirm(declined.id, { payment_method: 'pm_card_chargeDeclined' }).catch(() => undefined);
      await stripe.paymentIntents.cancel(declined.id);
      await stripe.refunds.create({ payment_intent: paid.id, amount: 1000 });
      await waitFor(() => hook.received.length === 4, 'four deliveries');
      expect(hook.rejected).toEqual([]);
      const byType = Object.fromEntries(hook.received.map((e) => [e.type, e.data.object as { id: string; status?: string }]));
      expect(byType['payment_intent.succeeded']).toMatchObject({ id: paid.id, status: 'succeeded' });
      expect(byType['payment_intent.payment_failed']).toMatchObject({ id: declined.id, status: 'requires_payment_method' });
      expect(byType['payment_intent.canceled']).toMatchObject({ id: declined.id, status: 'canceled' });
      expect(byType['charge.refunded']).toMatchObject({ object: 'charge', amount_refunded: 1000, refunded: false });
    } finally {
      await stopFake();
      await stop(endpoint.server);
    }
  });

  it('retries a failed delivery (500, 500, then 200) and records each attempt', async () => {
    const hook = receiver((n) => (n <= 2 ? 500 : 200));
    const endpoint = await listen(hook.handler);
    const { stripe, fake, stop: stopFake } = await startFake({ webhookUrl: endpoint.url });
    try {
      const pi = await pay(stripe);
      await stripe.paymentIntents.confirm(pi.id, { payment_method: 'pm_card_visa' });
      // the receiver has the event a moment before the fake has read the 200
      await waitFor(() => hook.received.length === 1 && fake.state.deliveries.length === 3, 'the retried delivery');
      expect(hook.attempts()).toBe(3);
      expect(hook.received[0]!.type).toBe('payment_intent.succeeded');
      expect(fake.state.deliveries.map((d) => d.status)).toEqual([500, 500, 200]);
      expect(fake.state.events.at(-1)!.pending_webhooks).toBe(0);
    } finally {
      await stopFake();
      await stop(endpoint.server);
    }
  });

  it('retries after a network error, gives up after the last retry, and never holds up the API answer', async () => {
    const gone = await listen(() => undefined);
    await stop(gone.server); // a port nobody listens on
    const { stripe, fake, stop: stopFake } = await startFake({ webhookUrl: gone.url });
    try {
      const pi = await pay(stripe);
      const answer = await stripe.paymentIntents.confirm(pi.id, { payment_method: 'pm_card_visa' });
      expect(answer.status).toBe('succeeded');
      await waitFor(() => fake.state.deliveries.length === 4, 'four attempts');
      await new Promise((r) => setTimeout(r, 100));
      expect(fake.state.deliveries).toHaveLength(4); // 1 + three retries, then no more
      expect(fake.state.deliveries.every((d) => d.error && d.status === undefined)).toBe(true);
    } finally {
      await stopFake();
    }
  });

  it('answers the API call while the webhook receiver is still thinking', async () => {
    let release: () => void = () => undefined;
    const held = new Promise<void>((resolve) => (release = resolve));
    let arrived = false;
    const endpoint = await listen((_req, res) => {
      arrived = true;
      void held.then(() => res.writeHead(200).end());
    });
    const { stripe, fake, stop: stopFake } = await startFake({ webhookUrl: endpoint.url });
    try {
      const pi = await pay(stripe);
      const answer = await stripe.paymentIntents.confirm(pi.id, { payment_method: 'pm_card_visa' });
      expect(answer.status).toBe('succeeded');
      await waitFor(() => arrived, 'the delivery to start');
      expect(fake.state.deliveries).toHaveLength(0); // still in flight after the API answered
      release();
      await waitFor(() => fake.state.deliveries.length === 1, 'the delivery to finish');
    } finally {
      release();
      await stopFake();
      await stop(endpoint.server);
    }
  });

  it('payments.constructEvent refuses a tampered body, a wrong secret, a missing and a stale signature', () => {
    const payload = JSON.stringify({ id: 'evt_1', object: 'event', type: 'payment_intent.succeeded' });
    const header = Stripe.webhooks.generateTestHeaderString({ payload, secret: SECRET });
    expect(constructEvent(payload, header, SECRET).id).toBe('evt_1');
    const stale = Stripe.webhooks.generateTestHeaderString({ payload, secret: SECRET, timestamp: Math.floor(Date.now() / 1000) - 600 });
    for (const [body, sig, secret] of [
      [payload.replace('evt_1', 'evt_2'), header, SECRET],
      [payload, header, 'whsec_other'],
      [payload, undefined, SECRET],
      [payload, stale, SECRET],
    ] as const) {
      let caught: unknown;
      try {
        constructEvent(body, sig, secret);
      } catch (err) {
        caught = err;
      }
      expect(isSignatureError(caught)).toBe(true);
    }
  });
});

describe('local Stripe fake: the hosted test payment page', () => {
  let ctx: Awaited<ReturnType<typeof startFake>>;
  beforeAll(async () => {
    ctx = await startFake();
  });
  afterAll(() => ctx.stop());
  const back = 'http://127.0.0.1:3000/quotes/q1/paid?from=stripe';

  it('shows the amount and the two test cards, labelled as a local stand-in, with everything escaped', async () => {
    const pi = await ctx.stripe.paymentIntents.create({ amount: 123456, currency: 'usd', description: 'Deposit <b>"Q-7"</b>' });
    const res = await fetch(localPaymentPageUrl(ctx.url, pi.id, back));
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toMatch(/text\/html/);
    const html = await res.text();
    expect(html).toContain('Test payment (local stand-in)');
    expect(html).toContain('$1,234.56');
    expect(html).toContain('Pay with a test card that succeeds');
    expect(html).toContain('Pay with a test card that is declined');
    expect(html).toContain('Deposit &lt;b&gt;&quot;Q-7&quot;&lt;/b&gt;');
    expect(html).not.toContain('<b>');
    expect(html).toContain(`value="${back.replace('&', '&amp;')}"`);
    expect(html).not.toMatch(/card.?number|cvc|name="card/i);
  });

  it('refuses a page without a return_url or for an unknown intent', async () => {
    const pi = await ctx.stripe.paymentIntents.create({ amount: 100, currency: 'usd' });
    expect((await fetch(`${ctx.url}/pay/${pi.id}`)).status).toBe(400);
    expect((await fetch(`${ctx.url}/pay/${pi.id}?return_url=javascript:alert(1)`)).status).toBe(400);
    expect((await fetch(localPaymentPageUrl(ctx.url, 'pi_missing', back))).status).toBe(404);
  });

  it('its buttons confirm the intent and redirect to return_url with redirect_status', async () => {
    const post = (id: string, outcome: string) =>
      fetch(`${ctx.url}/pay/${id}`, {
        method: 'POST',
        body: new URLSearchParams({ outcome, return_url: back }),
        redirect: 'manual',
      });
    const good = await ctx.stripe.paymentIntents.create({ amount: 5000, currency: 'usd' });
    const ok = await post(good.id, 'succeed');
    expect(ok.status).toBe(303);
    const okTo = new URL(ok.headers.get('location')!);
    expect(okTo.origin + okTo.pathname).toBe('http://127.0.0.1:3000/quotes/q1/paid');
    expect(Object.fromEntries(okTo.searchParams)).toMatchObject({ from: 'stripe', payment_intent: good.id, redirect_status: 'succeeded' });
    expect((await ctx.stripe.paymentIntents.retrieve(good.id)).status).toBe('succeeded');

    const bad = await ctx.stripe.paymentIntents.create({ amount: 5000, currency: 'usd' });
    const no = await post(bad.id, 'decline');
    expect(no.status).toBe(303);
    expect(new URL(no.headers.get('location')!).searchParams.get('redirect_status')).toBe('failed');
    const declined = await ctx.stripe.paymentIntents.retrieve(bad.id);
    expect(declined).toMatchObject({ status: 'requires_payment_method', last_payment_error: { code: 'card_declined' } });
    // the page shows the decline and still offers both cards; a paid intent offers none
    expect(await (await fetch(localPaymentPageUrl(ctx.url, bad.id, back))).text()).toContain('Your card was declined.');
    const paidPage = await (await fetch(localPaymentPageUrl(ctx.url, good.id, back))).text();
    expect(paidPage).not.toContain('Pay with a test card');
    expect((await post(good.id, 'succeed')).status).toBe(400);
  });
});
