/**
 * Guard rails (issue 12): an unbuildable design is never saved, approved or released to the shop,
 * the shop's documents answer a JSON error instead of a file, and duties outside the shop's stated
 * limits (price book: shortest bundle, largest shell) are refused with the limit named.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoPriceBook } from '../../server/features/pricing/demo-price-book';
import { DEFAULT_MIN_TUBE_LENGTH_M, shopLimitsOf } from '../../shared/schemas/price-book';
import { tubesheetHolds } from '../../shared/thermal/checks/hard-findings';
import { signedIn } from './support/app';
import { acceptance, eventually, startPayments, type PaymentsHarness } from './support/payments';
import { createQuote, oilCoolerDuty } from './support/quotes';

let h: PaymentsHarness;
type Agent = Awaited<ReturnType<typeof signedIn>>;
let pellmar: Agent, sales: Agent, shop: Agent, admin: Agent;

beforeAll(async () => {
  process.env.THERMAL_TIME_BUDGET_MS ??= '60000'; // sizing speed is not what this file tests: a loaded machine must not fail it
  h = await startPayments();
  [pellmar, sales, shop, admin] = await Promise.all(
    ['customer@pellmar.example', 'sales@aldercreek.example', 'shop@aldercreek.example', 'admin@aldercreek.example'].map((e) => signedIn(h.t.app, e)),
  );
});
afterAll(() => h.close());

type Design = {
  tubeCount: number; tubeLength_m: number; tubeOuterDiameter_m: number; tubeWall_m: number; tubeMaterial: string; tubePasses: number;
  layout: 30 | 45 | 60 | 90; shellInnerDiameter_m: number; tubePitch_m?: number; baffleSpacing_m?: number; processSide?: 'tubes' | 'shell'; shellsInSeries?: number; baffleCut?: number;
};
const editOf = (d: Design) => ({
  tubeCount: d.tubeCount, tubeLength_m: d.tubeLength_m, tubeOuterDiameter_m: d.tubeOuterDiameter_m, tubeWall_m: d.tubeWall_m, tubeMaterial: d.tubeMaterial,
  tubePasses: d.tubePasses, layout: d.layout, shellInnerDiameter_m: d.shellInnerDiameter_m, baffleSpacing_m: d.baffleSpacing_m,
  processSide: d.processSide, shellsInSeries: d.shellsInSeries, baffleCut: d.baffleCut,
});
/** a tube count above what the design's laid-out tubesheet holds, shared evenly among its passes */
const tooMany = (d: Design) => {
  const holds = tubesheetHolds({ ...d, rating: { warnings: [] } })!;
  return { holds, count: (Math.floor(holds / d.tubePasses) + 1) * d.tubePasses };
};
const revisionCount = async (quoteId: string) => Number((await h.t.database.pool.query('select count(*) from quote_revisions where quote_id = $1', [quoteId])).rows[0].count);
const quoteCount = async () => Number((await h.t.database.pool.query('select count(*) from quotes')).rows[0].count);
/** a revision stored before the guard existed: its design given more tubes than its tubesheet holds */
async function overfill(quoteId: string, number: number, count: number) {
  await h.t.database.pool.query(`update quote_revisions set data = jsonb_set(data, '{design,tubeCount}', $3::jsonb) where quote_id = $1 and number = $2`, [quoteId, number, JSON.stringify(count)]);
}

describe('a sales engineer cannot save an unbuildable design', () => {
  it('more tubes than the tubesheet holds: 422 naming the count it holds, nothing stored; the preview shows the hard finding', async () => {
    const q = await createQuote(pellmar);
    const d = q.revision.design as unknown as Design;
    const { holds, count } = tooMany(d);
    const edit = { ...editOf(d), tubeCount: count };
    const preview = await sales.post(`/api/quotes/${q.id}/preview`).send({ design: edit }).expect(200);
    expect(preview.body.hardFindings.map((f: { code: string }) => f.code)).toEqual(['tubes-do-not-fit']);
    const before = await revisionCount(q.id);
    const res = await sales.patch(`/api/quotes/${q.id}`).send({ version: q.version, design: edit });
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe('not-buildable');
    expect(res.body.error.message).toContain(`Cannot be built as it stands: ${count} tubes do not fit`);
    expect(res.body.error.message).toContain(`holds ${holds}`);
    expect(res.body.error.fields).toHaveProperty(['design.tubeCount']);
    expect(await revisionCount(q.id)).toBe(before);
    expect((await sales.get(`/api/quotes/${q.id}`)).body.version).toBe(q.version);
  });

  it('a bundle shorter than the shortest the shop builds is refused; a soft finding (short of the target) still saves', async () => {
    const q = await createQuote(pellmar);
    const d = q.revision.design as unknown as Design;
    const short = await sales.patch(`/api/quotes/${q.id}`).send({ version: q.version, design: { ...editOf(d), tubeLength_m: 0.8 } });
    expect(short.status).toBe(422);
    expect(short.body.error.message).toContain('The tube length 0.8 m is below the shortest bundle this shop builds, 1.0 m.');
    expect(short.body.error.fields).toHaveProperty(['design.tubeLength_m']);
    const soft = await sales.patch(`/api/quotes/${q.id}`).send({ version: q.version, design: { ...editOf(d), tubeLength_m: 1.0 } });
    expect(soft.status).toBe(200);
    expect(soft.body.revision.design.rating.warnings.map((w: { code: string }) => w.code)).toContain('short-of-target');
  });
});

describe('an unbuildable design is not approved', () => {
  it('a revision stored with more tubes than its tubesheet holds: approval is 422 with the reason, the quote stays in review', async () => {
    const q = await createQuote(pellmar);
    const { count } = tooMany(q.revision.design as unknown as Design);
    await overfill(q.id, 1, count);
    const res = await sales.post(`/api/quotes/${q.id}/approve`).send({ version: q.version });
    expect(res.status).toBe(422);
    expect(res.body.error.message).toMatch(/^This design cannot be approved\. Cannot be built as it stands: \d+ tubes do not fit/);
    const after = (await sales.get(`/api/quotes/${q.id}`)).body;
    expect(after).toMatchObject({ status: 'in-review', version: q.version });
    expect(await revisionCount(q.id)).toBe(1);
  });
});

describe('an order whose build sheet cannot be produced', () => {
  it('is not released to the shop, and its drilling CSV and build-sheet PDF answer a JSON 422, not a file', async () => {
    const q = await createQuote(pellmar);
    const approved = (await sales.post(`/api/quotes/${q.id}/approve`).send({ version: q.version }).expect(200)).body;
    const acc = await pellmar.post(`/api/quotes/${q.id}/accept`).send(acceptance()).expect(201);
    await h.stripe.paymentIntents.confirm(acc.body.paymentIntentId, { payment_method: 'pm_card_visa' });
    const orderId = (await eventually(async () => (await pellmar.get(`/api/quotes/${q.id}`)).body.orderId ?? undefined)) as string;
    const { count } = tooMany(q.revision.design as unknown as Design);
    await overfill(q.id, approved.revision.number, count);

    const release = await sales.post(`/api/orders/${orderId}/release`).send({});
    expect(release.status).toBe(422);
    expect(release.body.error.code).toBe('not-buildable');
    expect(release.body.error.message).toMatch(/^This order cannot be released to the shop: Cannot be built as it stands: \d+ tubes do not fit/);
    expect((await sales.get(`/api/orders/${orderId}`)).body.status).toBe('deposit-paid');

    for (const path of ['drilling.csv', 'build-sheet.pdf']) {
      const doc = await shop.get(`/api/orders/${orderId}/${path}`);
      expect(doc.status).toBe(422);
      expect(doc.headers['content-type']).toMatch(/^application\/json/);
      expect(doc.headers['content-disposition']).toBeUndefined();
      expect(doc.body.error.message).toMatch(/holds \d+ tubes/);
    }
  });
});

describe("duties outside the shop's limits", () => {
  it('a maximum length below the shortest bundle: 422 naming the limit, nothing stored (a bath-cooled duty priced 0.2 m bundles before)', async () => {
    const before = await quoteCount();
    const coolant = oilCoolerDuty();
    coolant.constraints.maxTubeLength_m = 0.2;
    const bath = { ...oilCoolerDuty(), boundary: { kind: 'wall', wallTemp_C: 27 } };
    bath.constraints.maxTubeLength_m = 0.2;
    for (const duty of [coolant, bath]) {
      const res = await pellmar.post('/api/quotes').send({ duty, quantity: 1 });
      expect(res.status).toBe(422);
      expect(res.body.error.message).toBe('The maximum tube length 0.2 m is below the shortest bundle this shop builds, 1.0 m: allow at least 1.0 m.');
      expect(res.body.error.fields).toHaveProperty(['constraints.maxTubeLength_m']);
    }
    expect(await quoteCount()).toBe(before);
  });

  it('no quoted design is shorter than the shortest bundle the shop builds', async () => {
    const duty = oilCoolerDuty();
    duty.constraints.maxTubeLength_m = 1.0;
    const res = await pellmar.post('/api/quotes').send({ duty, quantity: 1 }).expect(201);
    const designs = [res.body.revision.design, ...res.body.revision.alternatives] as { tubeLength_m: number }[];
    for (const d of designs) expect(d.tubeLength_m).toBeGreaterThanOrEqual(DEFAULT_MIN_TUBE_LENGTH_M - 1e-9);
  });
});

describe("the shop's limits in the price book", () => {
  it('a book saved before them reads 1.0 m and the largest shell of its heads table; sales read the active limits', async () => {
    const { minTubeLength_m: _a, maxShellInnerDiameter_m: _b, ...old } = demoPriceBook;
    void _a, void _b;
    expect(shopLimitsOf(JSON.parse(JSON.stringify(old)))).toEqual({ minTubeLength_m: 1.0, maxShellInnerDiameter_m: 1.5 });
    expect((await sales.get('/api/quotes/shop-limits').expect(200)).body).toEqual({ minTubeLength_m: 1.0, maxShellInnerDiameter_m: 1.5 });
    expect((await pellmar.get('/api/quotes/shop-limits')).status).toBe(403);
  });

  it('limits outside their range are a 400 naming priceBook.<field>, saving nothing', async () => {
    const before = (await admin.get('/api/admin/price-book').expect(200)).body.version as number;
    const res = await admin.put('/api/admin/price-book').send({ priceBook: { ...demoPriceBook, minTubeLength_m: 0.1, maxShellInnerDiameter_m: 9 }, baseVersion: before, note: 'limits' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty(['priceBook.minTubeLength_m']);
    expect(res.body.error.fields).toHaveProperty(['priceBook.maxShellInnerDiameter_m']);
    expect((await admin.get('/api/admin/price-book')).body.version).toBe(before);
  });
});
