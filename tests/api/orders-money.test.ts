/**
 * Money moves exactly once: a cancel racing a release, a webhook whose work fails half-way, an
 * outage of the payment service. Faults are injected as the probe did: a PostgreSQL trigger that
 * raises, a payment service that does not answer.
 */
import { createServer } from 'node:net';
import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedIn, startTestApp } from './support/app';
import { acceptance, eventually, startPayments, WEBHOOK_SECRET, type PaymentsHarness } from './support/payments';
import { createQuote } from './support/quotes';

let h: PaymentsHarness;
type Agent = Awaited<ReturnType<typeof signedIn>>;
let pellmar: Agent, sales: Agent;

beforeAll(async () => {
  h = await startPayments();
  [pellmar, sales] = await Promise.all(['customer@pellmar.example', 'sales@aldercreek.example'].map((e) => signedIn(h.t.app, e)));
});
afterAll(() => h.close());

async function approvedQuote(customer = pellmar, staff = sales) {
  const q = await createQuote(customer);
  return (await staff.post(`/api/quotes/${q.id}/approve`).send({ version: q.version }).expect(200)).body as { id: string; number: string };
}

async function paidOrder() {
  const q = await approvedQuote();
  const acc = await pellmar.post(`/api/quotes/${q.id}/accept`).send(acceptance()).expect(201);
  await h.stripe.paymentIntents.confirm(acc.body.paymentIntentId, { payment_method: 'pm_card_visa' });
  const orderId = await eventually(async () => (await pellmar.get(`/api/quotes/${q.id}`)).body.orderId ?? undefined);
  return { quoteId: q.id, orderId: orderId as string, intentId: acc.body.paymentIntentId as string };
}

const refundsAtFake = (intentId: string) => [...h.fake.state.refunds.values()].filter((r) => r.payment_intent === intentId);
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));
const query = async (text: string, values: unknown[] = []) => (await h.t.database.pool.query(text, values)).rows;

describe('cancel racing release', () => {
  it('exactly one wins every round; a lost cancel never reaches the payment service, a won one refunds once', async () => {
    const wins = { release: 0, cancel: 0 };
    for (let round = 0; round < 8; round++) {
      const { orderId, intentId } = await paidOrder();
      const [release, cancel] = await Promise.all([
        sales.post(`/api/orders/${orderId}/release`).send({}),
        pellmar.post(`/api/orders/${orderId}/cancel`).send({ reason: 'Project postponed.', from: 'deposit-paid' }),
      ]);
      expect([release.status, cancel.status].sort()).toEqual([200, 409]);
      const [order] = await query('select status, refund_status, refund_due_minor, deposit_minor, refunded_minor from orders where id = $1', [orderId]);
      if (release.status === 200) {
        wins.release++;
        expect(order).toMatchObject({ status: 'released', refund_status: 'none' });
        await sleep(700); // a refund job, had one been queued, is polled every 0.5 s
        expect(refundsAtFake(intentId)).toHaveLength(0);
      } else {
        wins.cancel++;
        expect(order.status).toBe('cancelled');
        expect(Number(order.refund_due_minor)).toBe(Number(order.deposit_minor));
        const done = await eventually(async () => {
          const [o] = await query('select refund_status, refunded_minor from orders where id = $1', [orderId]);
          return o.refund_status === 'refunded' ? o : undefined;
        });
        expect(Number(done.refunded_minor)).toBe(Number(order.deposit_minor));
        await sleep(300);
        expect(refundsAtFake(intentId)).toHaveLength(1);
      }
    }
    console.log(`[race] 8 rounds: release won ${wins.release}, cancel won ${wins.cancel}`);
  }, 120_000); // eight paid orders, each through the payment fake and its webhook

  it('queues the refund and the customer e-mail with the cancellation; the job asks once with the order\'s idempotency key', async () => {
    const { orderId, intentId } = await paidOrder();
    const res = await pellmar.post(`/api/orders/${orderId}/cancel`).send({ reason: 'Budget cut.' }).expect(200);
    expect(res.body.status).toBe('cancelled');
    const [mail] = await query(`select count(*)::int as n from mail_log where subject like $1`, [`Order % Cancelled`]);
    expect(mail.n).toBeGreaterThan(0);
    await eventually(async () => ((await query('select refund_status from orders where id = $1', [orderId]))[0].refund_status === 'refunded' ? true : undefined));
    const keys = [...h.fake.state.idempotency.keys()].filter((k) => k.endsWith(` refund-${orderId}`));
    expect(keys).toHaveLength(1);
    expect(refundsAtFake(intentId)).toHaveLength(1);
    // a second cancel is refused and asks nothing more
    expect((await pellmar.post(`/api/orders/${orderId}/cancel`).send({ reason: 'again' })).status).toBe(409);
    await sleep(700);
    expect(refundsAtFake(intentId)).toHaveLength(1);
  });
});

describe('the webhook when applying an event fails', () => {
  it('records nothing and answers 5xx; the retried event creates the order exactly once, with one receipt to each billing recipient', async () => {
    const q = await approvedQuote();
    const acc = await pellmar.post(`/api/quotes/${q.id}/accept`).send(acceptance()).expect(201);
    const fn = `test_fail_order_${q.id.replace(/-/g, '')}`;
    // a database blip, for this quote's order only (other test files share the database)
    await query(`create function ${fn}() returns trigger language plpgsql as $$ begin raise exception 'injected failure'; end $$`);
    await query(`create trigger ${fn} before insert on orders for each row when (new.quote_id = '${q.id}') execute function ${fn}()`);
    try {
      await h.stripe.paymentIntents.confirm(acc.body.paymentIntentId, { payment_method: 'pm_card_visa' });
      const event = await eventually(async () => h.fake.state.events.find((e) => e.type === 'payment_intent.succeeded' && (e.data.object as { id: string }).id === acc.body.paymentIntentId));
      // the fake delivers and retries twice (50 ms, 100 ms): every attempt fails
      const attempts = await eventually(async () => {
        const list = h.fake.state.deliveries.filter((d) => d.eventId === event.id);
        return list.length >= 3 ? list : undefined;
      });
      for (const a of attempts) expect(a.status).toBeGreaterThanOrEqual(500);
      expect(await query('select id from payment_events where id = $1', [event.id])).toHaveLength(0);
      expect(await query('select id from orders where quote_id = $1', [q.id])).toHaveLength(0);
    } finally {
      await query(`drop trigger if exists ${fn} on orders`);
      await query(`drop function if exists ${fn}()`);
    }
    // the service's next retry (the same event, re-sent) completes the work
    const event = h.fake.state.events.find((e) => e.type === 'payment_intent.succeeded' && (e.data.object as { id: string }).id === acc.body.paymentIntentId)!;
    const payload = JSON.stringify(event);
    const deliver = () =>
      fetch(`${h.appUrl}/api/payments/webhook`, {
        method: 'POST',
        headers: { 'content-type': 'application/json', 'stripe-signature': h.stripe.webhooks.generateTestHeaderString({ payload, secret: WEBHOOK_SECRET }) },
        body: payload,
      });
    const first = await deliver();
    expect(first.status).toBe(200);
    expect((await first.json()).outcome).toBe('order-created');
    expect((await (await deliver()).json()).outcome).toBe('replay');
    const orders = await query('select number from orders where quote_id = $1', [q.id]);
    expect(orders).toHaveLength(1);
    expect((await pellmar.get(`/api/quotes/${q.id}`)).body).toMatchObject({ status: 'ordered' });
    // one receipt to each who hears about money (the buyer and the billing contact), none twice
    const receipts = await query('select "to" from mail_log where subject = $1 order by "to"', [`Receipt: deposit for order ${orders[0].number}`]);
    expect(receipts.map((r: { to: string }) => r.to)).toEqual(['ap@pellmar.example', 'customer@pellmar.example']);
  });
});

/** A local port nobody listens on: the payment service is down. */
async function closedPort(): Promise<number> {
  const server = createServer();
  await new Promise<void>((r) => server.listen(0, '127.0.0.1', r));
  const { port } = server.address() as AddressInfo;
  await new Promise((r) => server.close(r));
  return port;
}

describe('an outage of the payment service', () => {
  it('accepting answers 503 payments-unavailable, nothing charged, and stores nothing', async () => {
    const down = await startTestApp({ STRIPE_API_URL: `http://127.0.0.1:${await closedPort()}` });
    try {
      const [buyer, staff] = await Promise.all(['customer@pellmar.example', 'sales@aldercreek.example'].map((e) => signedIn(down.app, e)));
      const q = await approvedQuote(buyer, staff);
      const started = Date.now();
      const res = await buyer.post(`/api/quotes/${q.id}/accept`).send(acceptance());
      console.log(`[outage] accept answered ${res.status} in ${Date.now() - started} ms`);
      expect(res.status).toBe(503);
      expect(res.body.error).toEqual({
        code: 'payments-unavailable',
        message: 'Payments are unavailable right now; nothing was charged. Try again in a few minutes.',
      });
      expect((await buyer.get(`/api/quotes/${q.id}`)).body.status).toBe('approved');
      expect(await query('select id from acceptances where quote_id = $1', [q.id])).toHaveLength(0);
      expect(await query(`select id from quote_events where quote_id = $1 and kind = 'accepted'`, [q.id])).toHaveLength(0);
    } finally {
      await down.close();
    }
  });
});
