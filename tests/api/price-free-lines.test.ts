/**
 * Lines a sales engineer adds to an order (freight, crating, third-party inspection, other): stored
 * with the revision, added once to the total, carried over by later changes, shown to the customer by
 * their label (the reason stays internal), printed on the offer PDF; bad ones are a 400 naming the field.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedIn, startTestApp, type TestApp } from './support/app';
import { getBytes, pdfText } from './support/pdf';
import { createQuote } from './support/quotes';

let t: TestApp;
type Agent = Awaited<ReturnType<typeof signedIn>>;
let pellmar: Agent, sales: Agent;

beforeAll(async () => {
  t = await startTestApp();
  [pellmar, sales] = await Promise.all(['customer@pellmar.example', 'sales@aldercreek.example'].map((e) => signedIn(t.app, e)));
});
afterAll(() => t.close());

const freight = { kind: 'freight', description: 'DAP Rotterdam, two pallets', amount_minor: 185_000, reason: 'Carrier quote 4471 (invented)' };

async function freshQuote() {
  const q = await createQuote(pellmar);
  const full = (await sales.get(`/api/quotes/${q.id}`).expect(200)).body;
  return { id: q.id, version: full.version as number, total: full.priceTotal_minor as number };
}

describe('added price lines', () => {
  it('a freight line is stored with the revision, moves the total once per order and carries over to the next change', async () => {
    const q = await freshQuote();
    const res = await sales.patch(`/api/quotes/${q.id}`).send({ version: q.version, freeLines: [freight] }).expect(200);
    expect(res.body.priceTotal_minor).toBe(q.total + 185_000);
    const line = res.body.revision.price.lines.find((l: { group: string }) => l.group === 'extra');
    expect(line).toMatchObject({ description: 'Freight: DAP Rotterdam, two pallets', amount_minor: 185_000, unit: 'order', added: { kind: 'freight', reason: freight.reason } });
    // a quantity change keeps the line (per order: not multiplied)
    const again = await sales.patch(`/api/quotes/${q.id}`).send({ version: res.body.version, quantity: 4 }).expect(200);
    const extras = again.body.revision.price.lines.filter((l: { group: string }) => l.group === 'extra');
    expect(extras).toHaveLength(1);
    expect(extras[0].amount_minor).toBe(185_000);
    // an empty list removes it
    const none = await sales.patch(`/api/quotes/${q.id}`).send({ version: again.body.version, freeLines: [] }).expect(200);
    expect(none.body.revision.price.lines.some((l: { group: string }) => l.group === 'extra')).toBe(false);
    expect(none.body.priceTotal_minor).toBe(again.body.priceTotal_minor - 185_000);
  });

  it.each([
    ['no reason', { ...freight, reason: '' }, 'freeLines.0.reason'],
    ['a zero amount', { ...freight, amount_minor: 0 }, 'freeLines.0.amount_minor'],
    ['an amount past the cap', { ...freight, amount_minor: 100_000_001 }, 'freeLines.0.amount_minor'],
    ['an unknown kind', { ...freight, kind: 'bribe' }, 'freeLines.0.kind'],
    ['an "other" line without a description', { kind: 'other', amount_minor: 5000, reason: 'Special paint' }, 'freeLines.0.description'],
  ])('refuses %s with 400 naming the field and stores nothing', async (_label, line, field) => {
    const q = await freshQuote();
    const res = await sales.patch(`/api/quotes/${q.id}`).send({ version: q.version, freeLines: [line] });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty([field]);
    expect((await sales.get(`/api/quotes/${q.id}`).expect(200)).body).toMatchObject({ version: q.version, priceTotal_minor: q.total });
  });

  it('the customer sees the line by its label without the reason, and the offer PDF prints it in the total', async () => {
    const q = await freshQuote();
    const saved = await sales.patch(`/api/quotes/${q.id}`).send({ version: q.version, freeLines: [freight, { kind: 'inspection', amount_minor: 90_000, reason: 'Buyer asked for a third party' }] }).expect(200);
    await sales.post(`/api/quotes/${q.id}/approve`).send({ version: saved.body.version }).expect(200);
    const seen = (await pellmar.get(`/api/quotes/${q.id}`).expect(200)).body;
    const lines = seen.revision.price.lines as { description: string; added?: unknown; amount_minor: number }[];
    expect(lines.map((l) => l.description)).toEqual(expect.arrayContaining(['Freight: DAP Rotterdam, two pallets', 'Third-party inspection']));
    expect(JSON.stringify(seen)).not.toContain('Carrier quote 4471');
    expect(seen.priceTotal_minor).toBe(saved.body.priceTotal_minor);
    const text = pdfText(await getBytes(pellmar, `/api/quotes/${q.id}/offer.pdf`));
    expect(text).toContain('Freight: DAP Rotterdam, two pallets');
    expect(text).toContain('Third-party inspection');
    expect(text).toMatch(/US\$1,850\.00/);
    const total = new Intl.NumberFormat('en-US', { style: 'currency', currency: 'USD' }).format(saved.body.priceTotal_minor / 100);
    expect(text).toContain(total);
    expect(text).not.toContain('Carrier quote 4471');
  });
});
