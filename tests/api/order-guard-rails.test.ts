/**
 * The shop's records are checked: the hydrotest per side against the build sheet's pressures, a hold
 * with a reason and a customer wording, and internal notes that never reach the customer (their order,
 * their quote, their e-mail). The visibility test walks every event kind of shared/schemas/events.ts.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ORDER_EVENT_AUDIENCE, orderEventKinds, QUOTE_EVENT_AUDIENCE, quoteEventKinds } from '../../shared/schemas/events';
import { HOLD_WORDINGS } from '../../shared/schemas/orders';
import { signedIn, waitForMail } from './support/app';
import { acceptance, eventually, startPayments, type PaymentsHarness } from './support/payments';
import { createQuote, TINY_PNG } from './support/quotes';

let h: PaymentsHarness;
type Agent = Awaited<ReturnType<typeof signedIn>>;
let pellmar: Agent, sales: Agent, shop: Agent;
const BUYER = 'customer@pellmar.example';

beforeAll(async () => {
  process.env.THERMAL_TIME_BUDGET_MS ??= '60000'; // sizing is not what this file tests: a loaded machine must not fail it
  h = await startPayments();
  [pellmar, sales, shop] = await Promise.all(['customer@pellmar.example', 'sales@aldercreek.example', 'shop@aldercreek.example'].map((e) => signedIn(h.t.app, e)));
});
afterAll(() => h.close());

// each test walks a quote to a paid order and through the shop: more than the default 20 s on a loaded machine
const LONG = { timeout: 90_000 };

type Event = { kind: string; status: string; note: string | null; detail?: string };

async function paidOrder() {
  const q = await createQuote(pellmar);
  await sales.post(`/api/quotes/${q.id}/approve`).send({ version: q.version }).expect(200);
  const acc = await pellmar.post(`/api/quotes/${q.id}/accept`).send(acceptance()).expect(201);
  await h.stripe.paymentIntents.confirm(acc.body.paymentIntentId, { payment_method: 'pm_card_visa' });
  const orderId = (await eventually(async () => (await pellmar.get(`/api/quotes/${q.id}`)).body.orderId ?? undefined)) as string;
  return { quoteId: q.id, orderId };
}

/** A paid order released and moved by the shop to the hydrotest. */
async function orderAtHydrotest(releaseNote?: string) {
  const o = await paidOrder();
  await sales.post(`/api/orders/${o.orderId}/release`).send(releaseNote ? { note: releaseNote } : {}).expect(200);
  for (const to of ['cutting', 'tubing', 'shell-and-heads', 'hydrotest']) await shop.post(`/api/orders/${o.orderId}/advance`).send({ to }).expect(200);
  return o;
}

const sideTest = (pressure_Pa: number, passed: boolean) => ({ pressure_Pa, holdTime_min: 30, passed });

async function pdfBytes(url: string): Promise<Buffer> {
  const res = await pellmar.get(url).buffer(true).parse((r, cb) => {
    const chunks: Buffer[] = [];
    r.on('data', (c: Buffer) => chunks.push(c));
    r.on('end', () => cb(null, Buffer.concat(chunks)));
  });
  expect(res.status).toBe(200);
  return res.body as Buffer;
}

/** The PDF's text, by poppler's pdftotext (Debian poppler-utils). */
function pdfText(pdf: Buffer): string {
  const file = join(mkdtempSync(join(tmpdir(), 'guard-rails-pdf-')), 'offer.pdf');
  writeFileSync(file, pdf);
  return execFileSync('pdftotext', ['-enc', 'UTF-8', file, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
}

async function customerMails() {
  const res = await fetch(`${h.t.config.OUTBOX_URL}/messages?to=${encodeURIComponent(BUYER)}`);
  return ((await res.json()) as { items: { subject: string; text: string }[] }).items;
}

describe('the hydrotest, side by side', LONG, () => {
  it('asks for the build sheet\'s pressures, refuses a pass below them naming the side, keeps the order on a fail, moves on when both pass', async () => {
    const { orderId } = await orderAtHydrotest();
    const sheet = (await shop.get(`/api/orders/${orderId}/build-sheet`).expect(200)).body;
    const state = (await shop.get(`/api/orders/${orderId}/hydrotest`).expect(200)).body;
    const need = Object.fromEntries(state.sides.map((s: { side: string; required_Pa: number }) => [s.side, s.required_Pa]));
    expect(need).toEqual({ tube: sheet.hydrotest.tubeSide_Pa, shell: sheet.hydrotest.shellSide_Pa });
    expect(state.passed).toBe(false);

    // leaving without a record, and the customer or sales recording: refused
    const untested = await shop.post(`/api/orders/${orderId}/advance`).send({ to: 'ready-to-ship' });
    expect(untested.status).toBe(409);
    expect(untested.body.error.fields).toMatchObject({ tube: expect.any(String), shell: expect.any(String) });
    expect((await pellmar.post(`/api/orders/${orderId}/hydrotest`).send({ tube: sideTest(need.tube, true) })).status).toBe(403);
    expect((await sales.post(`/api/orders/${orderId}/hydrotest`).send({ tube: sideTest(need.tube, true) })).status).toBe(403);

    // 2.0 bar "passed" against the required pressure: 400 naming the side's field, nothing stored
    const low = await shop.post(`/api/orders/${orderId}/hydrotest`).send({ tube: sideTest(2e5, true), shell: sideTest(need.shell, true) });
    expect(low.status).toBe(400);
    expect(Object.keys(low.body.error.fields)).toEqual(['tube.pressure_Pa']);
    expect(low.body.error.message).toMatch(/2\.0 bar\(g\) is below the tube side's test pressure/);
    expect((await shop.get(`/api/orders/${orderId}/hydrotest`)).body.sides.every((s: { latest: unknown }) => s.latest === null)).toBe(true);

    // incomplete records: 400 naming the fields
    const bad = await shop.post(`/api/orders/${orderId}/hydrotest`).send({ shell: { pressure_Pa: need.shell } });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toHaveProperty(['shell.holdTime_min']);
    expect(bad.body.error.fields).toHaveProperty(['shell.passed']);
    expect((await shop.post(`/api/orders/${orderId}/hydrotest`).send({})).status).toBe(400);

    // the tube side fails (recorded), the shell side passes: the order stays at the hydrotest
    const failed = await shop.post(`/api/orders/${orderId}/hydrotest`).send({ tube: sideTest(need.tube, false), shell: sideTest(need.shell + 1e4, true) });
    expect(failed.status).toBe(201);
    expect(failed.body.passed).toBe(false);
    expect(failed.body.sides.find((s: { side: string }) => s.side === 'tube').latest).toMatchObject({ passed: false, holdTime_min: 30, by: expect.any(String) });
    const stays = await shop.post(`/api/orders/${orderId}/advance`).send({ to: 'ready-to-ship' });
    expect(stays.status).toBe(409);
    expect(Object.keys(stays.body.error.fields)).toEqual(['tube']);
    expect((await shop.get(`/api/orders/${orderId}`)).body.status).toBe('hydrotest');

    // after the repair the tube side passes; the order leaves the hydrotest
    await shop.post(`/api/orders/${orderId}/hydrotest`).send({ tube: sideTest(need.tube, true) }).expect(201);
    await shop.post(`/api/orders/${orderId}/advance`).send({ to: 'ready-to-ship' }).expect(200);
    expect((await shop.post(`/api/orders/${orderId}/hydrotest`).send({ tube: sideTest(need.tube, true) })).status).toBe(409);

    // the customer reads one short line per passed side: pressure and pass, no failure, no hold time, no required pressure
    const seen = (await pellmar.get(`/api/orders/${orderId}`).expect(200)).body.timeline as Event[];
    const lines = seen.filter((e) => e.status === 'hydrotest' && e.kind !== 'step').map((e) => e.note);
    const bar = (pa: number) => (pa / 1e5).toFixed(1);
    expect(lines).toEqual([`Shell side tested at ${bar(need.shell + 1e4)} bar(g): passed.`, `Tube side tested at ${bar(need.tube)} bar(g): passed.`]);
    expect(seen.some((e) => e.detail !== undefined || /failed|Held|required/.test(e.note ?? ''))).toBe(false);
    // staff see every test with its hold time and required pressure
    const staffSees = (await shop.get(`/api/orders/${orderId}`)).body.timeline as Event[];
    expect(staffSees.filter((e) => e.kind === 'hydrotest-failed').map((e) => e.note)).toEqual([`Tube side tested at ${bar(need.tube)} bar(g): failed.`]);
    expect(staffSees.find((e) => e.kind === 'hydrotest-passed')!.detail).toMatch(/^Held 30 min; required \d+\.\d bar\(g\)\.$/);
  });
});

describe('on hold', LONG, () => {
  it('needs a reason for staff and a wording for the customer; the customer reads the wording only', async () => {
    const { orderId } = await paidOrder();
    await sales.post(`/api/orders/${orderId}/release`).send({}).expect(200);
    await shop.post(`/api/orders/${orderId}/advance`).send({ to: 'cutting' }).expect(200);
    const none = await shop.post(`/api/orders/${orderId}/advance`).send({ to: 'on-hold' });
    expect(none.status).toBe(400);
    expect(Object.keys(none.body.error.fields).sort()).toEqual(['customerWording', 'reason']);
    const noWording = await shop.post(`/api/orders/${orderId}/advance`).send({ to: 'on-hold', reason: 'Tube bundle dropped from the crane; inspecting.' });
    expect(Object.keys(noWording.body.error.fields)).toEqual(['customerWording']);
    const badWording = await shop.post(`/api/orders/${orderId}/advance`).send({ to: 'on-hold', reason: 'x', customerWording: 'we-broke-it' });
    expect(badWording.status).toBe(400);
    expect(badWording.body.error.fields).toHaveProperty('customerWording');
    const blank = await shop.post(`/api/orders/${orderId}/advance`).send({ to: 'on-hold', reason: '   ', customerWording: 'quality-check' });
    expect(Object.keys(blank.body.error.fields)).toEqual(['reason']);
    expect((await shop.get(`/api/orders/${orderId}`)).body.status).toBe('cutting');

    const held = await shop.post(`/api/orders/${orderId}/advance`).send({ to: 'on-hold', reason: 'Tube bundle dropped from the crane; inspecting.', customerWording: 'quality-check' });
    expect(held.status).toBe(200);
    expect(held.body).toMatchObject({ status: 'on-hold', heldFrom: 'cutting' });
    expect((held.body.timeline as Event[]).find((e) => e.kind === 'hold-reason')!.note).toBe('Tube bundle dropped from the crane; inspecting.');
    const seen = (await pellmar.get(`/api/orders/${orderId}`)).body;
    const hold = (seen.timeline as Event[]).filter((e) => e.status === 'on-hold');
    expect(hold).toEqual([expect.objectContaining({ kind: 'step', note: HOLD_WORDINGS['quality-check'] })]);
    expect(JSON.stringify(seen)).not.toMatch(/crane/);
    const mail = await waitForMail(h.t.config, BUYER, new RegExp(`Order ${seen.number}: On hold`));
    expect(mail.text).toContain(HOLD_WORDINGS['quality-check']);
    expect(mail.text).not.toMatch(/crane/);
    await shop.post(`/api/orders/${orderId}/advance`).send({ to: 'cutting' }).expect(200);
  });
});

describe('who sees which event', LONG, () => {
  it('every quote and order event kind has an audience; the customer\'s pages and e-mails carry only the customer\'s kinds', async () => {
    const PAINT = 'Paint RAL 5015 sky blue, for the shop';
    // a quote with every kind of quote event: questions answered, an internal note, an attachment, approval, acceptance, order
    const q = await createQuote(pellmar, { notes: 'Please quote with flanged nozzles.' });
    const assigned = await sales.post(`/api/quotes/${q.id}/assign`).send({ version: q.version }).expect(200);
    const asked = await sales.post(`/api/quotes/${q.id}/questions`).send({ version: assigned.body.version, message: 'Is the oil flow at full load?' }).expect(200);
    const answered = await pellmar.post(`/api/quotes/${q.id}/request-change`).send({ version: asked.body.version, message: 'Yes, at full load.' }).expect(200);
    await pellmar.post(`/api/quotes/${q.id}/attachments`).attach('file', TINY_PNG, 'nameplate.png').expect(201);
    const edited = await sales.patch(`/api/quotes/${q.id}`).send({ version: answered.body.version, quantity: 1, internalNote: PAINT }).expect(200);
    await sales.post(`/api/quotes/${q.id}/approve`).send({ version: edited.body.version, message: 'Ready to order.' }).expect(200);
    const acc = await pellmar.post(`/api/quotes/${q.id}/accept`).send(acceptance()).expect(201);
    await h.stripe.paymentIntents.confirm(acc.body.paymentIntentId, { payment_method: 'pm_card_visa' });
    const orderId = (await eventually(async () => (await pellmar.get(`/api/quotes/${q.id}`)).body.orderId ?? undefined)) as string;
    const declinedQuote = await createQuote(pellmar);
    await sales.post(`/api/quotes/${declinedQuote.id}/decline`).send({ message: 'Outside our pressure range.' }).expect(200);

    // an order with every kind of order event: a release note for the shop, a hold, a failed and passed hydrotest
    await sales.post(`/api/orders/${orderId}/release`).send({ note: PAINT }).expect(200);
    await shop.post(`/api/orders/${orderId}/advance`).send({ to: 'cutting', note: 'Saw 2 blade changed' }).expect(200);
    await shop.post(`/api/orders/${orderId}/advance`).send({ to: 'on-hold', reason: 'Waiting on tube certificate', customerWording: 'awaiting-material' }).expect(200);
    for (const to of ['cutting', 'tubing', 'shell-and-heads', 'hydrotest']) await shop.post(`/api/orders/${orderId}/advance`).send({ to }).expect(200);
    const need = Object.fromEntries((await shop.get(`/api/orders/${orderId}/hydrotest`)).body.sides.map((s: { side: string; required_Pa: number }) => [s.side, s.required_Pa]));
    await shop.post(`/api/orders/${orderId}/hydrotest`).send({ tube: sideTest(need.tube, false), shell: sideTest(need.shell, true) }).expect(201);
    await shop.post(`/api/orders/${orderId}/hydrotest`).send({ tube: sideTest(need.tube, true) }).expect(201);
    await shop.post(`/api/orders/${orderId}/advance`).send({ to: 'ready-to-ship', customerNote: 'Crated; collection from our yard.' }).expect(200);

    const kindsOf = (events: { kind: string }[]) => new Set(events.map((e) => e.kind));
    const quoteStaff = kindsOf([...(await sales.get(`/api/quotes/${q.id}`)).body.events, ...(await sales.get(`/api/quotes/${declinedQuote.id}`)).body.events]);
    const quoteCustomer = kindsOf([...(await pellmar.get(`/api/quotes/${q.id}`)).body.events, ...(await pellmar.get(`/api/quotes/${declinedQuote.id}`)).body.events]);
    for (const kind of quoteEventKinds) {
      expect(['customer', 'staff'], `quote event ${kind} has an audience`).toContain(QUOTE_EVENT_AUDIENCE[kind]);
      expect(quoteStaff.has(kind), `this test produces a quote event ${kind}`).toBe(true);
      expect(quoteCustomer.has(kind), `the customer ${QUOTE_EVENT_AUDIENCE[kind] === 'customer' ? 'sees' : 'does not see'} quote event ${kind}`).toBe(QUOTE_EVENT_AUDIENCE[kind] === 'customer');
    }
    const orderStaff = (await shop.get(`/api/orders/${orderId}`)).body;
    const orderCustomer = (await pellmar.get(`/api/orders/${orderId}`)).body;
    for (const kind of orderEventKinds) {
      expect(['customer', 'staff'], `order event ${kind} has an audience`).toContain(ORDER_EVENT_AUDIENCE[kind]);
      expect(kindsOf(orderStaff.timeline).has(kind), `this test produces an order event ${kind}`).toBe(true);
      expect(kindsOf(orderCustomer.timeline).has(kind), `the customer ${ORDER_EVENT_AUDIENCE[kind] === 'customer' ? 'sees' : 'does not see'} order event ${kind}`).toBe(ORDER_EVENT_AUDIENCE[kind] === 'customer');
    }
    // nothing internal in the customer's JSON, and the shop's note is where the shop reads it
    for (const body of [orderCustomer, (await pellmar.get(`/api/quotes/${q.id}`)).body]) {
      expect(JSON.stringify(body)).not.toMatch(/RAL 5015|Saw 2|tube certificate|failed/);
    }
    expect((orderStaff.timeline as Event[]).filter((e) => e.kind === 'note').map((e) => e.note)).toEqual([PAINT, 'Saw 2 blade changed']);
    expect((orderCustomer.timeline as Event[]).find((e) => e.status === 'ready-to-ship')!.note).toBe('Crated; collection from our yard.');
    // nor in the customer's e-mails (the release, hold and ready-to-ship e-mails are out by now)
    await waitForMail(h.t.config, BUYER, new RegExp(`Order ${orderCustomer.number}: Ready to ship`));
    const mails = (await customerMails()).filter((m) => m.subject.includes(orderCustomer.number));
    expect(mails.some((m) => /Released/.test(m.subject))).toBe(true);
    for (const m of mails) expect(m.text).not.toMatch(/RAL 5015|Saw 2|tube certificate|failed/);
    // the offer PDF the customer downloads is made from the revision, not the events
    const offer = pdfText(await pdfBytes(`/api/quotes/${q.id}/offer.pdf`));
    expect(offer).toContain(q.number);
    expect(offer).not.toMatch(/RAL 5015/);
  });
});
