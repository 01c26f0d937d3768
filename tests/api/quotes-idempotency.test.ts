/**
 * A submission carries an `Idempotency-Key`: a retry after a lost answer, or a duplicate racing the
 * first, gets the quote the first attempt stored. Every stored quote has its sales e-mail queued
 * (the mail log row is written in the quote's own transaction).
 */
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedIn, startTestApp, type TestApp } from './support/app';
import { mailCount } from './support/faults';
import { oilCoolerDuty } from './support/quotes';

let t: TestApp;
let pellmar: Awaited<ReturnType<typeof signedIn>>;
let quarry: Awaited<ReturnType<typeof signedIn>>;

beforeAll(async () => {
  t = await startTestApp();
  [pellmar, quarry] = await Promise.all([signedIn(t.app, 'customer@pellmar.example'), signedIn(t.app, 'buyer@quarryhill.example')]);
});
afterAll(() => t.close());

const submit = (agent: typeof pellmar, key?: string, reference = 'HPU-7 return line') => {
  const req = agent.post('/api/quotes');
  if (key) req.set('Idempotency-Key', key);
  return req.send({ duty: oilCoolerDuty(), quantity: 2, reference });
};
const quotesWithKey = async (key: string) =>
  (await t.database.pool.query('select id, submitted_by from quotes where client_key = $1', [key])).rows as { id: string; submitted_by: string }[];

describe('POST /api/quotes with an Idempotency-Key', () => {
  it('answers a retry with the quote the first attempt stored (200, same id)', async () => {
    const key = randomUUID();
    const first = await submit(pellmar, key);
    expect(first.status).toBe(201);
    const retry = await submit(pellmar, key);
    expect(retry.status).toBe(200);
    expect(retry.body.id).toBe(first.body.id);
    expect(retry.body.number).toBe(first.body.number);
    expect(await quotesWithKey(key)).toHaveLength(1);
  });

  it('5 parallel submissions with one key store one quote; all five answers name it', async () => {
    const key = randomUUID();
    const answers = await Promise.all(Array.from({ length: 5 }, () => submit(pellmar, key)));
    expect(answers.map((a) => a.status).sort()).toEqual([200, 200, 200, 200, 201]);
    expect(new Set(answers.map((a) => a.body.id)).size).toBe(1);
    expect(await quotesWithKey(key)).toHaveLength(1);
    expect(await mailCount(t.database.pool, `New request ${answers[0]!.body.number} from Pellmar Compression`)).toBeGreaterThanOrEqual(1);
  });

  it('keys belong to their sender: another customer with the same key gets its own quote', async () => {
    const key = randomUUID();
    const mine = await submit(pellmar, key);
    const theirs = await submit(quarry, key);
    expect([mine.status, theirs.status]).toEqual([201, 201]);
    expect(theirs.body.id).not.toBe(mine.body.id);
    expect(theirs.body.organizationName).toBe('Quarry Hill Hydraulics');
  });

  it('without a key every submission is a new quote; a malformed key is a 400 naming the header', async () => {
    const [a, b] = [await submit(pellmar), await submit(pellmar)];
    expect([a.status, b.status]).toEqual([201, 201]);
    expect(a.body.id).not.toBe(b.body.id);
    const bad = await submit(pellmar, 'short');
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toHaveProperty(['Idempotency-Key']);
  });
});

describe('the sales e-mail is queued with the quote', () => {
  it('every quote from 8 parallel submissions has its mail-log row', async () => {
    const reference = `outbox-${Date.now().toString(36)}`;
    const answers = await Promise.all(Array.from({ length: 8 }, () => submit(pellmar, randomUUID(), reference)));
    expect(answers.every((a) => a.status === 201)).toBe(true);
    const { rows } = await t.database.pool.query(
      `select q.number, (select count(*)::int from mail_log m where m.subject = 'New request ' || q.number || ' from Pellmar Compression') as mails
         from quotes q where q.reference = $1`,
      [reference],
    );
    expect(rows).toHaveLength(8);
    for (const row of rows) expect(row.mails, row.number).toBeGreaterThanOrEqual(1);
  });
});
