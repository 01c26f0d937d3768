/**
 * The list exports (issue 12): GET /api/quotes/export.csv and /api/orders/export.csv answer a CSV
 * download of every record the viewer may see (a customer only its own organisation's, with the
 * customer's figures), escaped per RFC 4180 with formula-looking text defused, under the list's filters.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parseCsv } from '../../shared/csv';
import { formatDate } from '../../shared/format';
import { client, signedIn, waitForMail } from './support/app';
import { acceptance, eventually, startPayments, type PaymentsHarness } from './support/payments';
import { createQuote } from './support/quotes';

let h: PaymentsHarness;
type Agent = Awaited<ReturnType<typeof signedIn>>;
let pellmar: Agent, quarry: Agent, sales: Agent;
const TRICKY = '=1+2, the "big" one';
let pellmarQuote: { id: string; number: string };
let quarryQuote: { id: string; number: string };
let orderNumber: string;

beforeAll(async () => {
  h = await startPayments();
  [pellmar, quarry, sales] = await Promise.all(
    ['customer@pellmar.example', 'buyer@quarryhill.example', 'sales@aldercreek.example'].map((e) => signedIn(h.t.app, e)),
  );
  pellmarQuote = await createQuote(pellmar, { reference: TRICKY });
  quarryQuote = await createQuote(quarry, { reference: 'Quarry press line' });
  // a paid order of Pellmar's whose PO holds a quote and a comma
  const approved = await sales.post(`/api/quotes/${pellmarQuote.id}/approve`).send({ version: (await sales.get(`/api/quotes/${pellmarQuote.id}`)).body.version }).expect(200);
  const acc = await pellmar.post(`/api/quotes/${approved.body.id}/accept`).send({ ...acceptance(), poNumber: 'PO-"77", rush' }).expect(201);
  await h.stripe.paymentIntents.confirm(acc.body.paymentIntentId, { payment_method: 'pm_card_visa' });
  const orderId = await eventually(async () => (await pellmar.get(`/api/quotes/${pellmarQuote.id}`)).body.orderId ?? undefined);
  orderNumber = (await pellmar.get(`/api/orders/${orderId}`).expect(200)).body.number;
}, 120_000);
afterAll(() => h.close());

/** The download's records as objects keyed by the header. */
function table(text: string): Record<string, string>[] {
  const [head, ...rows] = parseCsv(text);
  return rows.map((r) => Object.fromEntries(head!.cells.map((k, i) => [k, r.cells[i] ?? ''])));
}

describe('GET /api/quotes/export.csv', () => {
  it('is a CSV attachment with a dated file name', async () => {
    const res = await pellmar.get('/api/quotes/export.csv').expect(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv; charset=utf-8/);
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename="quotes-\d{4}-\d{2}-\d{2}\.csv"$/);
    expect(res.text.startsWith('\uFEFFNumber,Status,Customer,Reference')).toBe(true);
  });

  it('gives a customer only its own organisation’s quotes, in its own words, escaped', async () => {
    const rows = table((await pellmar.get('/api/quotes/export.csv').expect(200)).text);
    expect(rows.length).toBeGreaterThan(0);
    expect(new Set(rows.map((r) => r.Customer))).toEqual(new Set(['Pellmar Compression']));
    expect(rows.map((r) => r.Number)).not.toContain(quarryQuote.number);
    const mine = rows.find((r) => r.Number === pellmarQuote.number)!;
    // the comma and quotes survive the round trip; the leading "=" is defused with an apostrophe
    expect(mine.Reference).toBe(`'${TRICKY}`);
    expect(mine.Status).toBe('Ordered');
    expect(mine).not.toHaveProperty('Assignee');
    expect(mine.Total).toMatch(/^\d+\.\d{2}$/);
    const raw = (await pellmar.get('/api/quotes/export.csv').expect(200)).text;
    expect(raw).toContain(`"'=1+2, the ""big"" one"`);
  });

  it('gives sales every organisation’s quotes with the assignee, under the list’s filters', async () => {
    const rows = table((await sales.get('/api/quotes/export.csv').expect(200)).text);
    const numbers = rows.map((r) => r.Number);
    expect(numbers).toEqual(expect.arrayContaining([pellmarQuote.number, quarryQuote.number]));
    expect(rows[0]).toHaveProperty('Assignee');
    const inReview = table((await sales.get('/api/quotes/export.csv?status=in-review').expect(200)).text);
    expect(inReview.map((r) => r.Number)).toContain(quarryQuote.number);
    expect(inReview.map((r) => r.Number)).not.toContain(pellmarQuote.number);
    expect(new Set(inReview.map((r) => r.Status))).toEqual(new Set(['In review']));
  });

  it('answers 401 when signed out and a JSON 400 naming a bad filter', async () => {
    expect((await client(h.t.app).get('/api/quotes/export.csv')).status).toBe(401);
    const bad = await sales.get('/api/quotes/export.csv?status=lost').expect(400);
    expect(bad.body.error.fields).toHaveProperty('status');
  });
});

describe('the offer e-mail', () => {
  it('writes the validity date and the units as the pages do', async () => {
    const quote = (await pellmar.get(`/api/quotes/${pellmarQuote.id}`).expect(200)).body;
    const mail = await waitForMail(h.t.config, 'customer@pellmar.example', new RegExp(`Your offer ${pellmarQuote.number} is ready`));
    expect(mail.text).toContain(`valid until ${formatDate(quote.validUntil, { timeZone: 'UTC' })}.`);
    expect(mail.text).toMatch(/ for 2 units, /);
    expect(mail.text).not.toMatch(/unit\(s\)|GMT/);
  });
});

describe('GET /api/orders/export.csv', () => {
  it('gives the buyer its order with the PO escaped, and another customer none of it', async () => {
    const res = await pellmar.get('/api/orders/export.csv').expect(200);
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename="orders-\d{4}-\d{2}-\d{2}\.csv"$/);
    expect(res.text).toContain('"PO-""77"", rush"');
    const rows = table(res.text);
    expect(new Set(rows.map((r) => r.Customer))).toEqual(new Set(['Pellmar Compression']));
    const mine = rows.find((r) => r.Number === orderNumber)!;
    expect(mine).toMatchObject({ PO: 'PO-"77", rush', Quote: pellmarQuote.number, Status: 'Deposit paid' });
    const theirs = table((await quarry.get('/api/orders/export.csv').expect(200)).text);
    expect(theirs.map((r) => r.Number)).not.toContain(orderNumber);
    expect(theirs.every((r) => r.Customer === 'Quarry Hill Hydraulics')).toBe(true);
  });

  it('gives staff every organisation’s orders', async () => {
    const rows = table((await sales.get('/api/orders/export.csv').expect(200)).text);
    expect(rows.map((r) => r.Number)).toContain(orderNumber);
  });
});
