import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedIn, waitForMail } from './support/app';
import { acceptance, eventually, startPayments, WEBHOOK_SECRET, type PaymentsHarness } from './support/payments';
import { createQuote } from './support/quotes';

let h: PaymentsHarness;
type Agent = Awaited<ReturnType<typeof signedIn>>;
let pellmar: Agent, quarry: Agent, sales: Agent, shop: Agent, admin: Agent;

beforeAll(async () => {
  h = await startPayments();
  [pellmar, quarry, sales, shop, admin] = await Promise.all(
    ['customer@pellmar.example', 'buyer@quarryhill.example', 'sales@aldercreek.example', 'shop@aldercreek.example', 'admin@aldercreek.example'].map((e) => signedIn(h.t.app, e)),
  );
});
afterAll(() => h.close());

async function approvedQuote() {
  const q = await createQuote(pellmar);
  const approved = await sales.post(`/api/quotes/${q.id}/approve`).send({ version: q.version }).expect(200);
  return approved.body as { id: string; number: string; priceTotal_minor: number };
}

async function paidOrder() {
  const q = await approvedQuote();
  const acc = await pellmar.post(`/api/quotes/${q.id}/accept`).send(acceptance()).expect(201);
  await h.stripe.paymentIntents.confirm(acc.body.paymentIntentId, { payment_method: 'pm_card_visa' });
  const orderId = await eventually(async () => (await pellmar.get(`/api/quotes/${q.id}`)).body.orderId ?? undefined);
  return { quote: q, orderId: orderId as string, intentId: acc.body.paymentIntentId as string };
}

const orderCount = async () => Number((await h.t.database.pool.query('select count(*) from orders')).rows[0].count);

/** Signs and posts an event body to the webhook, as Stripe would. */
async function deliver(payload: string, signature?: string) {
  return fetch(`${h.appUrl}/api/payments/webhook`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', 'stripe-signature': signature ?? h.stripe.webhooks.generateTestHeaderString({ payload, secret: WEBHOOK_SECRET }) },
    body: payload,
  });
}

describe('accepting an offer and paying the deposit', () => {
  it('creates a deposit PaymentIntent for the book\'s share of the total, then the order once the verified webhook says paid', async () => {
    const q = await approvedQuote();
    const res = await pellmar.post(`/api/quotes/${q.id}/accept`).send(acceptance());
    expect(res.status).toBe(201);
    // the deposit is the active price book's share of the offer total
    const book = (await admin.get('/api/admin/price-book').expect(200)).body.priceBook;
    expect(res.body.amount_minor).toBe(Math.round((q.priceTotal_minor * book.deposit_pct) / 100));
    expect(res.body.paymentIntentId).toMatch(/^pi_/);
    expect(res.body.clientSecret).toContain('_secret_');
    expect(res.body.paymentUrl).toContain(`/pay/${res.body.paymentIntentId}`);
    const intent = await h.stripe.paymentIntents.retrieve(res.body.paymentIntentId);
    expect(intent.metadata).toMatchObject({ quoteId: q.id, quoteNumber: q.number });
    // the browser's word is not enough: no order before the card processor's webhook
    expect((await pellmar.get(`/api/quotes/${q.id}`)).body).toMatchObject({ status: 'accepted', orderId: null, can: { pay: true } });

    await h.stripe.paymentIntents.confirm(res.body.paymentIntentId, { payment_method: 'pm_card_visa' });
    const orderId = await eventually(async () => (await pellmar.get(`/api/quotes/${q.id}`)).body.orderId ?? undefined);
    const order = await pellmar.get(`/api/orders/${orderId}`).expect(200);
    expect(order.body).toMatchObject({ quoteId: q.id, status: 'deposit-paid', poNumber: 'PO-77812', deposit_minor: res.body.amount_minor });
    expect(order.body.number).toMatch(/^O-\d{4}-\d{4}$/);
    expect(order.body.design.tubeCount).toBeGreaterThan(0);
    expect(order.body.timeline.map((e: { status: string }) => e.status)).toEqual(['deposit-paid']);
  });

  it('refuses bad acceptance details with 400 naming the field, and a second acceptance of an ordered quote with 409', async () => {
    const q = await approvedQuote();
    const bad = await pellmar.post(`/api/quotes/${q.id}/accept`).send({ ...acceptance(), billingContact: { name: 'AP', email: 'not-mail' } });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toHaveProperty(['billingContact.email']);
    expect((await quarry.post(`/api/quotes/${q.id}/accept`).send(acceptance())).status).toBe(404);
    expect((await sales.post(`/api/quotes/${q.id}/accept`).send(acceptance())).status).toBe(403);
    const { quote } = await paidOrder();
    expect((await pellmar.post(`/api/quotes/${quote.id}/accept`).send(acceptance())).status).toBe(409);
  });

  it('a declined card leaves the quote accepted but unpaid with the reason; paying again creates the order', async () => {
    const q = await approvedQuote();
    const acc = await pellmar.post(`/api/quotes/${q.id}/accept`).send(acceptance()).expect(201);
    await expect(h.stripe.paymentIntents.confirm(acc.body.paymentIntentId, { payment_method: 'pm_card_chargeDeclined' })).rejects.toThrow();
    const failed = await eventually(async () => {
      const body = (await pellmar.get(`/api/quotes/${q.id}`)).body;
      return body.payment?.status === 'payment-failed' ? body : undefined;
    });
    expect(failed.status).toBe('accepted');
    expect(failed.payment.lastError).toMatch(/declined/i);
    expect(failed.orderId).toBeNull();
    // paying again needs no details: the acceptance stands
    const again = await pellmar.post(`/api/quotes/${q.id}/accept`).send({}).expect(201);
    expect(again.body.paymentIntentId).toBe(acc.body.paymentIntentId);
    await h.stripe.paymentIntents.confirm(again.body.paymentIntentId, { payment_method: 'pm_card_visa' });
    await eventually(async () => (await pellmar.get(`/api/quotes/${q.id}`)).body.orderId ?? undefined);
  });
});

describe('the webhook', () => {
  it('rejects a tampered body, a wrong secret and a stale signature with 400', async () => {
    const payload = JSON.stringify({ id: 'evt_test_tamper', object: 'event', type: 'payment_intent.succeeded', data: { object: { id: 'pi_x', object: 'payment_intent', amount: 1, currency: 'usd' } } });
    const signature = h.stripe.webhooks.generateTestHeaderString({ payload, secret: WEBHOOK_SECRET });
    expect((await deliver(payload.replace('"amount":1', '"amount":2'), signature)).status).toBe(400);
    expect((await deliver(payload, h.stripe.webhooks.generateTestHeaderString({ payload, secret: 'whsec_other' }))).status).toBe(400);
    const stale = h.stripe.webhooks.generateTestHeaderString({ payload, secret: WEBHOOK_SECRET, timestamp: Math.floor(Date.now() / 1000) - 3600 });
    expect((await deliver(payload, stale)).status).toBe(400);
    expect((await deliver(payload, '')).status).toBe(400);
  });

  it('a replay of the same event, ten times, creates one order', async () => {
    const { intentId } = await paidOrder();
    const { data } = await h.stripe.events.list({ type: 'payment_intent.succeeded' });
    const event = data.find((e) => (e.data.object as { id: string }).id === intentId)!;
    const before = await orderCount();
    for (let i = 0; i < 10; i++) {
      const res = await deliver(JSON.stringify(event));
      expect(res.status).toBe(200);
      expect((await res.json()).outcome).toBe('replay');
    }
    expect(await orderCount()).toBe(before);
  });

  it('does not create an order when the amount paid differs from the deposit asked', async () => {
    const q = await approvedQuote();
    const acc = await pellmar.post(`/api/quotes/${q.id}/accept`).send(acceptance()).expect(201);
    const forged = {
      id: `evt_forged_${Date.now()}`,
      object: 'event',
      type: 'payment_intent.succeeded',
      data: { object: { id: acc.body.paymentIntentId, object: 'payment_intent', amount: 100, amount_received: 100, currency: 'usd', status: 'succeeded' } },
    };
    const before = await orderCount();
    const res = await deliver(JSON.stringify(forged));
    expect((await res.json()).outcome).toBe('amount-mismatch');
    expect(await orderCount()).toBe(before);
    expect((await pellmar.get(`/api/quotes/${q.id}`)).body.orderId).toBeNull();
  });
});

describe('orders and the shop', () => {
  it('follows the role matrix', async () => {
    const { orderId } = await paidOrder();
    expect((await quarry.get(`/api/orders/${orderId}`)).status).toBe(404);
    expect((await quarry.get('/api/orders')).body.items.map((o: { id: string }) => o.id)).not.toContain(orderId);
    expect((await pellmar.post(`/api/orders/${orderId}/release`).send({})).status).toBe(403);
    expect((await shop.post(`/api/orders/${orderId}/release`).send({})).status).toBe(403);
    expect((await sales.post(`/api/orders/${orderId}/advance`).send({ to: 'cutting' })).status).toBe(403);
    expect((await shop.post(`/api/orders/${orderId}/advance`).send({ to: 'cutting' })).status).toBe(409); // not released yet
    expect((await pellmar.get(`/api/orders/${orderId}/drilling.csv`)).status).toBe(403);
    expect((await shop.post(`/api/orders/${orderId}/cancel`).send({ reason: 'shop cannot cancel' })).status).toBe(403);
    for (const staff of [sales, shop, admin]) expect((await staff.get(`/api/orders/${orderId}`)).status).toBe(200);
  });

  it('goes from release to shipped step by step; the hydrotest needs both sides passed; the customer sees the timeline and hears of it', async () => {
    const { orderId } = await paidOrder();
    await sales.post(`/api/orders/${orderId}/release`).send({ note: 'Drawings approved' }).expect(200);
    for (const to of ['cutting', 'tubing', 'shell-and-heads', 'hydrotest']) await shop.post(`/api/orders/${orderId}/advance`).send({ to }).expect(200);
    expect((await shop.post(`/api/orders/${orderId}/advance`).send({ to: 'shipped' })).status).toBe(409);
    const noRecord = await shop.post(`/api/orders/${orderId}/advance`).send({ to: 'ready-to-ship' });
    expect(noRecord.status).toBe(409);
    expect(noRecord.body.error.code).toBe('hydrotest-not-passed');
    const sheet = (await shop.get(`/api/orders/${orderId}/build-sheet`).expect(200)).body;
    const side = (pressure_Pa: number, passed: boolean) => ({ pressure_Pa, holdTime_min: 30, passed });
    await shop.post(`/api/orders/${orderId}/hydrotest`).send({ tube: side(sheet.hydrotest.tubeSide_Pa, false), shell: side(sheet.hydrotest.shellSide_Pa, true) }).expect(201);
    expect((await shop.post(`/api/orders/${orderId}/advance`).send({ to: 'ready-to-ship' })).status).toBe(409);
    await shop.post(`/api/orders/${orderId}/hydrotest`).send({ tube: side(9e5, true) }).expect(201);
    await shop.post(`/api/orders/${orderId}/advance`).send({ to: 'ready-to-ship' }).expect(200);
    const shipped = await shop.post(`/api/orders/${orderId}/advance`).send({ to: 'shipped', customerNote: 'Truck 4411' }).expect(200);
    expect(shipped.body.status).toBe('shipped');
    const seen = await pellmar.get(`/api/orders/${orderId}`).expect(200);
    const steps = seen.body.timeline.filter((e: { kind: string }) => e.kind === 'step');
    expect(steps.map((e: { status: string }) => e.status)).toEqual(['deposit-paid', 'released', 'cutting', 'tubing', 'shell-and-heads', 'hydrotest', 'ready-to-ship', 'shipped']);
    expect(seen.body.timeline.filter((e: { kind: string }) => e.kind === 'hydrotest-passed').map((e: { note: string }) => e.note)).toContain('Tube side tested at 9.0 bar(g): passed.');
    expect(steps.at(-1).note).toBe('Truck 4411');
    await waitForMail(h.t.config, 'customer@pellmar.example', new RegExp(`Order ${seen.body.number}: Shipped`));
    await waitForMail(h.t.config, 'customer@pellmar.example', new RegExp(`Receipt: deposit for order ${seen.body.number}`));
  });

  it('cancels before fabrication with the full deposit refunded through Stripe, recorded by the refund webhook', async () => {
    const { orderId, intentId } = await paidOrder();
    const res = await pellmar.post(`/api/orders/${orderId}/cancel`).send({ reason: 'Project postponed.' });
    expect(res.status).toBe(200);
    expect(res.body.status).toBe('cancelled');
    const refunded = await eventually(async () => {
      const o = (await pellmar.get(`/api/orders/${orderId}`)).body;
      return o.refunded_minor > 0 ? o : undefined;
    });
    expect(refunded.refunded_minor).toBe(refunded.deposit_minor);
    const intent = await h.stripe.paymentIntents.retrieve(intentId, { expand: ['latest_charge'] });
    expect((intent.latest_charge as { amount_refunded: number }).amount_refunded).toBe(refunded.deposit_minor);
  });

  it('after fabrication starts only an admin may cancel', async () => {
    const { orderId } = await paidOrder();
    await sales.post(`/api/orders/${orderId}/release`).send({}).expect(200);
    await shop.post(`/api/orders/${orderId}/advance`).send({ to: 'cutting' }).expect(200);
    expect((await pellmar.post(`/api/orders/${orderId}/cancel`).send({ reason: 'too late' })).status).toBe(403);
    expect((await sales.post(`/api/orders/${orderId}/cancel`).send({ reason: 'too late' })).status).toBe(403);
    await admin.post(`/api/orders/${orderId}/cancel`).send({ reason: 'Customer insolvent.' }).expect(200);
  });

  it('the drilling CSV has one tube hole per tube, all inside the outer tube limit and at least a pitch apart; tie rods on their own rows at their diameter, clear of the tubes', async () => {
    const { orderId } = await paidOrder();
    const order = (await shop.get(`/api/orders/${orderId}`)).body;
    const sheet = (await shop.get(`/api/orders/${orderId}/build-sheet`).expect(200)).body;
    const csv = (await shop.get(`/api/orders/${orderId}/drilling.csv`).expect(200)).text as string;
    const rows = csv.trim().split('\n').slice(1).map((l) => l.split(','));
    const tubes = rows.filter((r) => r[3] === 'tube').map((r) => ({ x: Number(r[1]), y: Number(r[2]) }));
    expect(tubes.length).toBe(order.design.tubeCount);
    // one pattern for every tubesheet of the cooler: two per shell, stated on each line and on the sheet
    const shells = order.design.shellsInSeries ?? 1;
    expect(sheet.shells.inSeries).toBe(shells);
    expect(sheet.tubesheet.quantity).toBe(2 * shells);
    for (const r of rows) expect(Number(r[6])).toBe(2 * shells);
    const od = order.design.tubeOuterDiameter_m * 1000;
    const pitch = sheet.tubesheet.pitch_mm;
    const all = tubes;
    // tie rods (TEMA RCB-4.71): their own rows with the rod's diameter, in free room at the rim or in a lane, inside the shell
    const rods = rows.filter((r) => r[3] === 'tie-rod').map((r) => ({ x: Number(r[1]), y: Number(r[2]), d: Number(r[5]) }));
    expect(rods.length).toBeGreaterThanOrEqual(4);
    for (const rod of rods) {
      expect(rod.d).toBeGreaterThan(6);
      expect(Math.hypot(rod.x, rod.y) + rod.d / 2).toBeLessThan(order.design.shellInnerDiameter_m * 500);
      for (const t of tubes) expect(Math.hypot(rod.x - t.x, rod.y - t.y)).toBeGreaterThanOrEqual((rod.d + od) / 2 - 0.02);
    }
    for (const p of all) expect(Math.hypot(p.x, p.y) + od / 2).toBeLessThanOrEqual(sheet.tubesheet.outerTubeLimit_mm / 2 + 0.01);
    let nearest = Infinity;
    for (let i = 0; i < all.length; i++) {
      for (let j = i + 1; j < all.length; j++) nearest = Math.min(nearest, Math.hypot(all[i]!.x - all[j]!.x, all[i]!.y - all[j]!.y));
    }
    expect(nearest).toBeGreaterThanOrEqual(pitch - 0.02); // coordinates are rounded to 0.01 mm
  });
});
