/**
 * The admin's mail log: every queued e-mail is a row that the worker marks sent or failed, with its
 * attempts and last error; an admin lists failures and resends a copy that the real worker delivers.
 *
 * A failure is injected the way it happens: the worker's delivery step (deliverLogged) against an
 * SMTP address where nothing listens (127.0.0.1:1). Its own worker is not started on the shared
 * queue (it would take other tests' jobs); the retry schedule (about an hour) is not waited out
 * either: the queue's "last retry" flag is passed as the worker passes it.
 */
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mailLog } from '../../db/schema';
import { createTransport, deliverLogged } from '../../server/lib/mail';
import { signedIn, startTestApp, unique, waitForMail, type TestApp } from './support/app';
import { createQuote } from './support/quotes';

let t: TestApp;
let admin: Awaited<ReturnType<typeof signedIn>>;
let sales: Awaited<ReturnType<typeof signedIn>>;
let customer: Awaited<ReturnType<typeof signedIn>>;

beforeAll(async () => {
  t = await startTestApp();
  [admin, sales, customer] = await Promise.all([
    signedIn(t.app, 'admin@aldercreek.example'),
    signedIn(t.app, 'sales@aldercreek.example'),
    signedIn(t.app, 'customer@pellmar.example'),
  ]);
});
afterAll(() => t.close());

const closedSmtp = () => createTransport('smtp://127.0.0.1:1');

/** A logged message that no queue job carries: only this test's failing deliveries touch it. */
async function loggedMessage(to: string, subject: string) {
  const [row] = await t.database.db.insert(mailLog).values({ to, subject, text: `Hello,\n\n${subject}.` }).returning({ id: mailLog.id });
  return row!.id;
}

/** Polls one message until its status is `status`. */
async function waitForStatus(id: string, status: string, timeoutMs = 15_000) {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const res = await admin.get(`/api/admin/mail/${id}`);
    expect(res.status).toBe(200);
    if (res.body.status === status) return res.body;
    if (Date.now() > deadline) throw new Error(`message ${id} still ${res.body.status}, not ${status}`);
    await new Promise((r) => setTimeout(r, 200));
  }
}

describe('a failing send is recorded', () => {
  it('counts each attempt with its error, stays queued while retries remain, and is failed after the last', async () => {
    const to = `${unique('bounce')}@fenwick-air.example`;
    const id = await loggedMessage(to, 'Your quote is ready');

    const first = await deliverLogged(t.database.db, closedSmtp(), t.config.MAIL_FROM, id, false);
    expect(first.status).toBe('queued');
    let row = (await admin.get(`/api/admin/mail/${id}`)).body;
    expect(row).toMatchObject({ status: 'queued', attempts: 1, sentAt: null });
    expect(row.lastError).toMatch(/ECONNREFUSED/);

    // still queued: the queue will try it again, a copy now would send it twice
    const early = await admin.post(`/api/admin/mail/${id}/resend`);
    expect(early.status).toBe(409);
    expect(early.body.error.message).toMatch(/waiting/);

    const last = await deliverLogged(t.database.db, closedSmtp(), t.config.MAIL_FROM, id, true);
    expect(last.status).toBe('failed');
    row = (await admin.get(`/api/admin/mail/${id}`)).body;
    expect(row).toMatchObject({ status: 'failed', attempts: 2, sentAt: null, to, subject: 'Your quote is ready', text: 'Hello,\n\nYour quote is ready.' });
    expect(row.lastError).toMatch(/ECONNREFUSED/);
  });

  it('lists failures for the admin with attempts and last error; a resend queues a copy the worker delivers', async () => {
    const to = `${unique('bounce')}@fenwick-air.example`;
    const id = await loggedMessage(to, 'Password reset');
    await deliverLogged(t.database.db, closedSmtp(), t.config.MAIL_FROM, id, true);

    const failed = await admin.get('/api/admin/mail').query({ status: 'failed', q: to });
    expect(failed.status).toBe(200);
    expect(failed.body).toMatchObject({ total: 1, page: 1, pageSize: 20 });
    expect(failed.body.items[0]).toMatchObject({ id, to, subject: 'Password reset', status: 'failed', attempts: 1, resendOf: null });
    expect(failed.body.items[0].lastError).toMatch(/ECONNREFUSED/);
    expect(failed.body.items[0]).not.toHaveProperty('text');

    const resent = await admin.post(`/api/admin/mail/${id}/resend`);
    expect(resent.status).toBe(201);
    expect(resent.body).toMatchObject({ to, subject: 'Password reset', text: 'Hello,\n\nPassword reset.', status: 'queued', attempts: 0, resendOf: id });
    expect(resent.body.id).not.toBe(id);

    const caught = await waitForMail(t.config, to, /^Password reset$/);
    expect(caught.text).toContain('Password reset.');
    const copy = await waitForStatus(resent.body.id, 'sent');
    expect(copy).toMatchObject({ attempts: 1, lastError: null });
    expect(copy.sentAt).toBeTruthy();

    // the original stays failed; both are listed, newest first
    const all = await admin.get('/api/admin/mail').query({ q: to });
    expect(all.body.total).toBe(2);
    expect(all.body.items.map((m: { id: string }) => m.id)).toEqual([resent.body.id, id]);
    expect(all.body.items[1].status).toBe('failed');

    // a sent message may be resent too
    expect((await admin.post(`/api/admin/mail/${resent.body.id}/resend`)).status).toBe(201);
  });
});

describe('listing', () => {
  it('pages newest first and searches recipient and subject literally', async () => {
    const tag = unique('page');
    const ids = [];
    for (const n of [1, 2, 3]) ids.push(await loggedMessage(`${tag}-${n}@fenwick-air.example`, `Note ${n} for ${tag}`));

    const second = await admin.get('/api/admin/mail').query({ q: tag, page: 2, pageSize: 1 });
    expect(second.status).toBe(200);
    expect(second.body).toMatchObject({ total: 3, page: 2, pageSize: 1 });
    expect(second.body.items.map((m: { id: string }) => m.id)).toEqual([ids[1]]);

    // subject only
    const bySubject = await admin.get('/api/admin/mail').query({ q: `note 3 for ${tag}` });
    expect(bySubject.body.items.map((m: { id: string }) => m.id)).toEqual([ids[2]]);

    // % and _ are characters, not wildcards: "tag%" and "tag_1" match nothing
    for (const q of [`${tag}%`, `${tag}_1`]) expect((await admin.get('/api/admin/mail').query({ q })).body.total).toBe(0);
    expect((await admin.get('/api/admin/mail').query({ q: `${tag}-1` })).body.total).toBe(1);
  });

  it('refuses bad filters with 400 naming the field, and answers 404 for an unknown message', async () => {
    const bad = await admin.get('/api/admin/mail').query({ status: 'bounced', pageSize: 1000 });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(expect.arrayContaining(['status', 'pageSize']));
    expect((await admin.get('/api/admin/mail').query({ q: 'a\u0000b' })).status).toBe(400);
    expect((await admin.get('/api/admin/mail/not-a-uuid')).status).toBe(400);
    const unknown = '00000000-0000-4000-8000-000000000000';
    expect((await admin.get(`/api/admin/mail/${unknown}`)).status).toBe(404);
    expect((await admin.post(`/api/admin/mail/${unknown}/resend`)).status).toBe(404);
  });

  it('is for admins only', async () => {
    const id = await loggedMessage(`${unique('private')}@fenwick-air.example`, 'Invitation');
    for (const agent of [sales, customer]) {
      expect((await agent.get('/api/admin/mail')).status).toBe(403);
      expect((await agent.get(`/api/admin/mail/${id}`)).status).toBe(403);
      expect((await agent.post(`/api/admin/mail/${id}/resend`)).status).toBe(403);
    }
    expect((await request(t.app).get('/api/admin/mail')).status).toBe(401);
    const count = await t.database.pool.query('select count(*)::int as n from mail_log where resend_of = $1', [id]);
    expect(count.rows[0].n).toBe(0);
  });
});

describe('what the app sends is in the log', () => {
  it("a quote submission's e-mail to sales is logged and marked sent once delivered", async () => {
    const quote = await createQuote(customer);
    const logged = await admin.get('/api/admin/mail').query({ q: `New request ${quote.number}` });
    expect(logged.status).toBe(200);
    expect(logged.body.total).toBeGreaterThanOrEqual(1);
    const toSales = logged.body.items.find((m: { to: string }) => m.to === 'sales@aldercreek.example');
    expect(toSales).toMatchObject({ subject: `New request ${quote.number} from Pellmar Compression` });

    await waitForMail(t.config, 'sales@aldercreek.example', new RegExp(`New request ${quote.number}`));
    const sent = await waitForStatus(toSales.id, 'sent');
    expect(sent.attempts).toBe(1);
    expect(sent.text).toContain(`/quotes/${quote.id}`);
  });
});
