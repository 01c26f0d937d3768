/**
 * While sales work on an unsent draft, the customer sees the figures of the last revision meant for
 * them (budget or offer): in the quote, its list row, its budget range and the list's value order.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedIn, startTestApp, type TestApp } from './support/app';
import { createQuote } from './support/quotes';

let t: TestApp;
let pellmar: Awaited<ReturnType<typeof signedIn>>;
let sales: Awaited<ReturnType<typeof signedIn>>;

beforeAll(async () => {
  t = await startTestApp();
  [pellmar, sales] = await Promise.all([signedIn(t.app, 'customer@pellmar.example'), signedIn(t.app, 'sales@aldercreek.example')]);
});
afterAll(() => t.close());

describe('a draft stays with sales until it is sent', () => {
  it('the customer sees the budget total and quantity, staff the draft; the offer then shows the new figures', async () => {
    const q = await createQuote(pellmar); // quantity 2
    const full = (await sales.get(`/api/quotes/${q.id}`).expect(200)).body;
    const heads = full.revision.price.lines.find((l: { key: string }) => l.key.includes('head'));
    const draft = await sales.patch(`/api/quotes/${q.id}`).send({
      version: full.version,
      quantity: 3,
      priceOverrides: [{ key: heads.key, amount_minor: heads.amount_minor + 10_000, reason: 'What if the heads are forged' }],
    });
    expect(draft.status).toBe(200);
    expect(draft.body).toMatchObject({ quantity: 3, revision: { kind: 'draft' } });
    expect(draft.body.priceTotal_minor).not.toBe(q.priceTotal_minor);

    const seen = (await pellmar.get(`/api/quotes/${q.id}`).expect(200)).body;
    expect(seen).toMatchObject({ quantity: 2, priceTotal_minor: q.priceTotal_minor, designSummary: full.designSummary });
    expect(seen.revision).toMatchObject({ number: 1, kind: 'budget' });
    expect(seen.budgetRange.low_minor).toBeLessThan(q.priceTotal_minor);
    expect(seen.budgetRange.high_minor).toBeGreaterThan(q.priceTotal_minor);
    expect(seen.budgetRange.high_minor).toBe(Math.round(q.priceTotal_minor * 1.1));

    const list = (await pellmar.get('/api/quotes').query({ q: q.number }).expect(200)).body;
    expect(list.items).toHaveLength(1);
    expect(list.items[0]).toMatchObject({ id: q.id, quantity: 2, priceTotal_minor: q.priceTotal_minor });
    const staffList = (await sales.get('/api/quotes').query({ q: q.number }).expect(200)).body;
    expect(staffList.items[0]).toMatchObject({ quantity: 3, priceTotal_minor: draft.body.priceTotal_minor });

    const offer = await sales.post(`/api/quotes/${q.id}/approve`).send({ version: draft.body.version });
    expect(offer.status).toBe(200);
    const after = (await pellmar.get('/api/quotes').query({ q: q.number }).expect(200)).body.items[0];
    expect(after).toMatchObject({ quantity: 3, priceTotal_minor: draft.body.priceTotal_minor });
  });

  it('sorts a customer\'s list by the totals they were shown', async () => {
    const reference = `sort-${Date.now().toString(36)}`;
    const small = await createQuote(pellmar, { quantity: 1, reference });
    const large = await createQuote(pellmar, { quantity: 3, reference });
    // a draft that would make the small one the dearest
    await sales.patch(`/api/quotes/${small.id}`).send({ version: small.version, quantity: 50 }).expect(200);
    const byValue = async (agent: typeof pellmar) =>
      (await agent.get('/api/quotes').query({ q: reference, sort: '-value' }).expect(200)).body.items.map((i: { id: string }) => i.id);
    expect(await byValue(pellmar)).toEqual([large.id, small.id]);
    expect(await byValue(sales)).toEqual([small.id, large.id]);
  });
});
