/**
 * Documents and e-mail (issue 12): the offer e-mail carries the offer PDF (as the SMTP sink caught
 * it: the approval message and the datasheet with both sides' design pressures inside), and mail
 * about money reaches the billing contact given at acceptance as well as the submitter.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { designConditions } from '../../shared/thermal/checks/walls';
import { sizeRequestSchema } from '../../shared/schemas/thermal';
import { signedIn, unique, waitForMail } from './support/app';
import { acceptance, eventually, startPayments, type PaymentsHarness } from './support/payments';
import { getBytes, pdfText } from './support/pdf';
import { createQuote, oilCoolerDuty } from './support/quotes';

let h: PaymentsHarness;
type Agent = Awaited<ReturnType<typeof signedIn>>;
let pellmar: Agent, sales: Agent;

beforeAll(async () => {
  h = await startPayments();
  [pellmar, sales] = await Promise.all(['customer@pellmar.example', 'sales@aldercreek.example'].map((e) => signedIn(h.t.app, e)));
});
afterAll(() => h.close());

const MESSAGE = 'We checked the oil side at your winter flow; the bundle is removable for cleaning.';

async function approved(message?: string) {
  const q = await createQuote(pellmar);
  const res = await sales.post(`/api/quotes/${q.id}/approve`).send({ version: q.version, ...(message ? { message } : {}) }).expect(200);
  return res.body as { id: string; number: string; priceTotal_minor: number; revision: { number: number } };
}

describe('the offer e-mail', () => {
  it('carries the offer PDF with the approval message and the datasheet’s design pressures', async () => {
    const q = await approved(MESSAGE);
    const mail = await waitForMail(h.t.config, 'customer@pellmar.example', new RegExp(`Your offer ${q.number} is ready`), 30_000);
    expect(mail.text).toContain(MESSAGE);
    expect(mail.attachments).toHaveLength(1);
    const [file] = mail.attachments!;
    expect(file).toMatchObject({ filename: `${q.number}-rev${q.revision.number}.pdf`, contentType: 'application/pdf' });
    const bytes = Buffer.from(await (await fetch(`${h.t.config.OUTBOX_URL}/messages/${mail.id}/attachments/0`)).arrayBuffer());
    expect(bytes.subarray(0, 5).toString()).toBe('%PDF-');
    expect(bytes.length).toBe(file!.size);
    const text = pdfText(bytes);
    expect(text).toContain(`Offer ${q.number}`);
    expect(text).toContain(MESSAGE);
    expect(text).toContain('Datasheet');
    // the duty states no design point: each side's default (operating gauge + 10 %, at least 1 bar more)
    const dc = designConditions(sizeRequestSchema.parse(oilCoolerDuty()));
    for (const side of [dc.process, dc.boundary]) {
      expect(text).toContain(`${Number((side.gauge_Pa / 1e5).toPrecision(3))} bar(g) (operating + 10 %, at least 1 bar more)`);
    }
    // the same document the customer downloads
    expect(pdfText(await getBytes(pellmar, `/api/quotes/${q.id}/offer.pdf`))).toBe(text);
    // the mail log names the document (a resend copies the row, so it carries it again)
    const logged = await h.t.database.pool.query(`select attachments from mail_log where subject = $1`, [`Your offer ${q.number} is ready`]);
    expect(logged.rows[0].attachments).toEqual([{ kind: 'offer-pdf', quoteId: q.id, revision: q.revision.number }]);
  }, 120_000); // sizing, a worker's delivery and two renderings on a loaded machine
});

describe('mail about money', () => {
  it('reaches the billing contact given at acceptance as well as the submitter', async () => {
    const q = await approved();
    const billing = `${unique('ap')}@pellmar.example`;
    const acc = await pellmar.post(`/api/quotes/${q.id}/accept`).send({ ...acceptance(), billingContact: { name: 'Accounts Payable', email: billing } }).expect(201);
    await h.stripe.paymentIntents.confirm(acc.body.paymentIntentId, { payment_method: 'pm_card_visa' });
    const orderId = await eventually(async () => (await pellmar.get(`/api/quotes/${q.id}`)).body.orderId ?? undefined);
    const order = (await pellmar.get(`/api/orders/${orderId}`).expect(200)).body as { number: string };
    const subject = new RegExp(`Receipt: deposit for order ${order.number}`);
    const toBilling = await waitForMail(h.t.config, billing, subject, 30_000);
    const toSubmitter = await waitForMail(h.t.config, 'customer@pellmar.example', subject, 30_000);
    expect(toBilling.text).toContain(order.number);
    expect(toSubmitter.text).toBe(toBilling.text);
  }, 120_000);
});
