/**
 * Each quote state change is one transaction: the status at its version, its event and its e-mail
 * (queued through the mail log, a transactional outbox). Faults are injected with a trigger on the
 * event or mail-log table scoped to the quote under test.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { client, signedIn, startTestApp, type TestApp } from './support/app';
import { mailCount, withFailingInsert } from './support/faults';
import { createQuote, oilCoolerDuty } from './support/quotes';

let t: TestApp;
let pellmar: Awaited<ReturnType<typeof signedIn>>;
let sales: Awaited<ReturnType<typeof signedIn>>;

beforeAll(async () => {
  t = await startTestApp();
  [pellmar, sales] = await Promise.all([signedIn(t.app, 'customer@pellmar.example'), signedIn(t.app, 'sales@aldercreek.example')]);
});
afterAll(() => t.close());

type Quote = Awaited<ReturnType<typeof createQuote>>;
const state = async (id: string) =>
  (await t.database.pool.query('select status, version, assignee_id from quotes where id = $1', [id])).rows[0] as { status: string; version: number; assignee_id: string | null };
const eventKinds = async (id: string) =>
  (await t.database.pool.query('select kind from quote_events where quote_id = $1 order by created_at', [id])).rows.map((r) => r.kind as string);

/** One review action: who does it, what it sends, what status and event it leaves, the e-mail subject it queues. */
interface Action {
  name: string;
  send: (q: Quote) => ReturnType<typeof sales.post>;
  status: string;
  event: string;
  subject?: (q: Quote) => string;
}
const actions: Action[] = [
  { name: 'assign', send: (q) => sales.post(`/api/quotes/${q.id}/assign`).send({ version: q.version }), status: 'in-review', event: 'assigned' },
  {
    name: 'questions',
    send: (q) => sales.post(`/api/quotes/${q.id}/questions`).send({ version: q.version, message: 'Is the oil flow at full load?' }),
    status: 'questions',
    event: 'questions',
    subject: (q) => `Questions about your request ${q.number}`,
  },
  {
    name: 'decline',
    send: (q) => sales.post(`/api/quotes/${q.id}/decline`).send({ version: q.version, message: 'Outside our pressure range.' }),
    status: 'declined',
    event: 'declined',
    subject: (q) => `We cannot offer ${q.number}`,
  },
  {
    name: 'request-change',
    send: (q) => pellmar.post(`/api/quotes/${q.id}/request-change`).send({ version: q.version, message: 'Make it four units.' }),
    status: 'in-review',
    event: 'change-requested',
    subject: (q) => `Pellmar Compression asks for a change to ${q.number}`,
  },
  {
    name: 'approve',
    send: (q) => sales.post(`/api/quotes/${q.id}/approve`).send({ version: q.version }),
    status: 'approved',
    event: 'approved',
    subject: (q) => `Your offer ${q.number} is ready`,
  },
];

describe('a review action that fails half-way changes nothing, and a retry works', () => {
  it.each(actions)('$name: the event insert fails', async (action) => {
    const q = await createQuote(pellmar);
    const before = await state(q.id);
    const failed = await withFailingInsert(t.database.pool, 'quote_events', `new.quote_id = '${q.id}'`, () => action.send(q));
    expect(failed.status).toBeGreaterThanOrEqual(500);
    expect(await state(q.id)).toEqual(before);
    expect(await eventKinds(q.id)).toEqual(['submitted']);
    if (action.subject) expect(await mailCount(t.database.pool, action.subject(q))).toBe(0);

    const retry = await action.send(q); // same version: nothing was stored, so no 409
    expect(retry.status).toBe(200);
    expect(retry.body.status).toBe(action.status);
    expect(await eventKinds(q.id)).toContain(action.event);
    if (action.subject) expect(await mailCount(t.database.pool, action.subject(q))).toBeGreaterThanOrEqual(1);
  });

  it.each(actions.filter((a) => a.subject))('$name: queuing the e-mail fails', async (action) => {
    const q = await createQuote(pellmar);
    const before = await state(q.id);
    const failed = await withFailingInsert(t.database.pool, 'mail_log', `position('${q.number}' in new.subject) > 0`, () => action.send(q));
    expect(failed.status).toBeGreaterThanOrEqual(500);
    expect(await state(q.id)).toEqual(before);
    expect(await eventKinds(q.id)).toEqual(['submitted']);

    const retry = await action.send(q);
    expect(retry.status).toBe(200);
    expect(retry.body.status).toBe(action.status);
    expect(await mailCount(t.database.pool, action.subject!(q))).toBeGreaterThanOrEqual(1);
  });

  it('a submission whose sales e-mail cannot be queued stores no quote', async () => {
    const reference = `outbox-${Date.now().toString(36)}`;
    const count = async () => (await t.database.pool.query('select count(*)::int as n from quotes where reference = $1', [reference])).rows[0].n;
    const failed = await withFailingInsert(t.database.pool, 'mail_log', `position('${reference}' in new.text) > 0`, () =>
      pellmar.post('/api/quotes').send({ duty: oilCoolerDuty(), quantity: 1, reference }),
    );
    expect(failed.status).toBeGreaterThanOrEqual(500);
    expect(await count()).toBe(0);
    const q = await createQuote(pellmar, { reference });
    expect(await count()).toBe(1);
    expect(await mailCount(t.database.pool, `New request ${q.number} from Pellmar Compression`)).toBeGreaterThanOrEqual(1);
  });
});

describe('control characters in text', () => {
  it('a NUL in a decline message is a 400 naming the field; quote, events and mail unchanged', async () => {
    const q = await createQuote(pellmar);
    const before = await state(q.id);
    const res = await sales.post(`/api/quotes/${q.id}/decline`).send({ version: q.version, message: 'Outside our range.\u0000' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual({ message: 'contains a control character' });
    expect(await state(q.id)).toEqual(before);
    expect(await eventKinds(q.id)).toEqual(['submitted']);
    expect(await mailCount(t.database.pool, `We cannot offer ${q.number}`)).toBe(0);
    // the same decline without the NUL goes through at the same version
    const ok = await sales.post(`/api/quotes/${q.id}/decline`).send({ version: q.version, message: 'Outside our range.' });
    expect(ok.status).toBe(200);
  });

  it('refuses control characters in notes, references, internal notes and messages; keeps tabs and new lines', async () => {
    const duty = oilCoolerDuty();
    for (const [field, value] of [['notes', 'bell\u0007'], ['reference', 'del\u007f'], ['notes', '\u001b[31mred']] as const) {
      const res = await pellmar.post('/api/quotes').send({ duty, quantity: 1, [field]: value });
      expect(res.status, field).toBe(400);
      expect(res.body.error.fields[field]).toBe('contains a control character');
    }
    const q = await createQuote(pellmar, { notes: 'Line one\nLine two\r\n\tindented', reference: 'HPU-7\tB' });
    const note = await sales.patch(`/api/quotes/${q.id}`).send({ version: q.version, internalNote: 'vertical\u000btab' });
    expect(note.status).toBe(400);
    expect(note.body.error.fields).toHaveProperty(['internalNote']);
    const change = await pellmar.post(`/api/quotes/${q.id}/request-change`).send({ message: 'form\u000cfeed please' });
    expect(change.status).toBe(400);
    expect(change.body.error.fields).toHaveProperty(['message']);
  });

  it('refuses a control character in a new account name', async () => {
    const res = await client(t.app).post('/api/auth/register').send({ name: 'Eve\u0000', email: `eve-${Date.now()}@example.com`, password: 'long-enough-pass', organizationName: 'Eve Co' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.name).toBe('contains a control character');
  });
});
