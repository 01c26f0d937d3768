import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { client, signedIn, startTestApp, waitForMail, type TestApp } from './support/app';
import { createQuote, oilCoolerDuty, TINY_PNG } from './support/quotes';

let t: TestApp;
let pellmar: Awaited<ReturnType<typeof signedIn>>;
let quarry: Awaited<ReturnType<typeof signedIn>>;
let sales: Awaited<ReturnType<typeof signedIn>>;
let shop: Awaited<ReturnType<typeof signedIn>>;
let admin: Awaited<ReturnType<typeof signedIn>>;

beforeAll(async () => {
  t = await startTestApp();
  [pellmar, quarry, sales, shop, admin] = await Promise.all([
    signedIn(t.app, 'customer@pellmar.example'),
    signedIn(t.app, 'buyer@quarryhill.example'),
    signedIn(t.app, 'sales@aldercreek.example'),
    signedIn(t.app, 'shop@aldercreek.example'),
    signedIn(t.app, 'admin@aldercreek.example'),
  ]);
});
afterAll(() => t.close());

const countQuotes = async () => Number((await t.database.pool.query('select count(*) from quotes')).rows[0].count);

describe('a customer asks for a cooler', () => {
  it('sizes and prices at once: a budget offer awaiting engineering review', async () => {
    const res = await pellmar.post('/api/quotes').send({ duty: oilCoolerDuty(), quantity: 2, needBy: '2027-06-30', notes: 'Outdoor skid, salt air.' });
    expect(res.status).toBe(201);
    const q = res.body;
    expect(q).toMatchObject({ status: 'in-review', version: 1, quantity: 2, currency: 'USD', organizationName: 'Pellmar Compression' });
    expect(q.number).toMatch(/^Q-\d{4}-\d{4,}$/);
    expect(q.revision.kind).toBe('budget');
    expect(q.revision.design.tubeCount).toBeGreaterThan(0);
    expect(q.revision.design.rating.outletTemp_C).toBeLessThanOrEqual(47 + 1e-6);
    expect(q.priceTotal_minor).toBeGreaterThan(0);
    expect(q.budgetRange.low_minor).toBeLessThan(q.priceTotal_minor);
    expect(q.budgetRange.high_minor).toBeGreaterThan(q.priceTotal_minor);
    // customers see the price as the fabricator shows it: no cost build-up, overhead or margin
    const groups = q.revision.price.lines.map((l: { group: string }) => l.group);
    expect(groups).not.toContain('margin');
    expect(groups).not.toContain('overhead');
    expect(q.events.map((e: { kind: string }) => e.kind)).toEqual(['submitted']);
    // sales hear of it
    await waitForMail(t.config, 'sales@aldercreek.example', new RegExp(`New request ${q.number}`));
  });

  it('refuses a malformed duty with 400 naming the field, and stores nothing', async () => {
    const before = await countQuotes();
    const duty = oilCoolerDuty();
    (duty.process as Record<string, unknown>).massFlow_kg_s = 'a lot';
    const res = await pellmar.post('/api/quotes').send({ duty, quantity: 0 });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty(['duty.process.massFlow_kg_s']);
    expect(res.body.error.fields).toHaveProperty(['quantity']);
    expect(await countQuotes()).toBe(before);
  });

  it('explains an impossible duty with 422, and stores nothing', async () => {
    const before = await countQuotes();
    const duty = oilCoolerDuty();
    duty.process.outletTemp_C = 25; // colder than the 27 °C coolant
    const res = await pellmar.post('/api/quotes').send({ duty, quantity: 1 });
    expect(res.status).toBe(422);
    expect(res.body.error.message).toMatch(/27/);
    expect(await countQuotes()).toBe(before);
  });
});

describe('who may do what', () => {
  it('follows the role matrix', async () => {
    const q = await createQuote(pellmar);
    const anon = request(t.app);
    expect((await anon.get('/api/quotes')).status).toBe(401);
    expect((await anon.get(`/api/quotes/${q.id}`)).status).toBe(401);
    expect((await client(t.app).post('/api/quotes').send({ duty: oilCoolerDuty(), quantity: 1 })).status).toBe(401);
    for (const staff of [sales, shop, admin]) {
      expect((await staff.post('/api/quotes').send({ duty: oilCoolerDuty(), quantity: 1 })).status).toBe(403);
      expect((await staff.get(`/api/quotes/${q.id}`)).status).toBe(200);
    }
    expect((await shop.patch(`/api/quotes/${q.id}`).send({ version: q.version, quantity: 3 })).status).toBe(403);
    expect((await pellmar.patch(`/api/quotes/${q.id}`).send({ version: q.version, quantity: 3 })).status).toBe(403);
    expect((await pellmar.post(`/api/quotes/${q.id}/approve`).send({ version: q.version })).status).toBe(403);
    expect((await sales.post(`/api/quotes/${q.id}/request-change`).send({ message: 'please' })).status).toBe(403);
    // another organisation's quote does not exist for Quarry Hill
    for (const path of ['', '/offer.pdf']) expect((await quarry.get(`/api/quotes/${q.id}${path}`)).status).toBe(404);
    expect((await quarry.post(`/api/quotes/${q.id}/request-change`).send({ message: 'not mine' })).status).toBe(404);
    expect((await quarry.post(`/api/quotes/${q.id}/attachments`).attach('file', TINY_PNG, 'x.png')).status).toBe(404);
  });

  it('scopes the list: a customer sees its organisation only, staff see all', async () => {
    const mine = await createQuote(pellmar, { reference: 'scope-check' });
    const theirs = await pellmar.get('/api/quotes').query({ pageSize: 100 }).expect(200);
    expect(theirs.body.items.every((i: { organizationName: string }) => i.organizationName === 'Pellmar Compression')).toBe(true);
    const quarryList = await quarry.get('/api/quotes').query({ pageSize: 100 }).expect(200);
    expect(quarryList.body.items.map((i: { id: string }) => i.id)).not.toContain(mine.id);
    const all = await sales.get('/api/quotes').query({ q: mine.number }).expect(200);
    expect(all.body.items.map((i: { id: string }) => i.id)).toEqual([mine.id]);
  });

  it('pages, filters and sorts the queue', async () => {
    const res = await sales.get('/api/quotes').query({ status: 'in-review', sort: '-value', page: 1, pageSize: 2 }).expect(200);
    expect(res.body).toMatchObject({ page: 1, pageSize: 2 });
    expect(res.body.items.length).toBeLessThanOrEqual(2);
    expect(res.body.total).toBeGreaterThanOrEqual(res.body.items.length);
    const values = res.body.items.map((i: { priceTotal_minor: number }) => i.priceTotal_minor);
    expect(values).toEqual([...values].sort((a, b) => b - a));
    expect(res.body.items.every((i: { status: string }) => i.status === 'in-review')).toBe(true);
    expect((await sales.get('/api/quotes').query({ status: 'lost' })).status).toBe(400);
    expect((await sales.get('/api/quotes').query({ pageSize: 1000 })).status).toBe(400);
  });
});

describe('a sales engineer reviews', () => {
  it('changes the tube material: a new draft revision, another price; a stale version gets 409', async () => {
    const q = await createQuote(pellmar);
    const d = q.revision.design as Record<string, number | string>;
    const material = d.tubeMaterial === 'stainless-316' ? 'carbon-steel' : 'stainless-316';
    const edit = {
      tubeCount: d.tubeCount, tubeLength_m: d.tubeLength_m, tubeOuterDiameter_m: d.tubeOuterDiameter_m, tubeWall_m: d.tubeWall_m,
      tubeMaterial: material, tubePasses: d.tubePasses, layout: d.layout, shellInnerDiameter_m: d.shellInnerDiameter_m,
    };
    const res = await sales.patch(`/api/quotes/${q.id}`).send({ version: q.version, design: edit, internalNote: 'Customer site is coastal.' });
    expect(res.status).toBe(200);
    expect(res.body.version).toBe(q.version + 1);
    expect(res.body.revision).toMatchObject({ number: 2, kind: 'draft' });
    expect(res.body.revision.design.tubeMaterial).toBe(material);
    expect(res.body.priceTotal_minor).not.toBe(q.priceTotal_minor);
    expect(res.body.events.map((e: { kind: string }) => e.kind)).toEqual(expect.arrayContaining(['edited', 'note']));
    // the customer still sees the budget, not the draft, and no internal notes
    const seen = await pellmar.get(`/api/quotes/${q.id}`).expect(200);
    expect(seen.body.revision.kind).toBe('budget');
    expect(seen.body.events.some((e: { internal: boolean }) => e.internal)).toBe(false);

    const stale = await sales.patch(`/api/quotes/${q.id}`).send({ version: q.version, quantity: 5 });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe('stale-version');
  });

  it('overrides a price line with a reason, keeping the computed value beside it', async () => {
    const q = await createQuote(pellmar);
    const full = await sales.get(`/api/quotes/${q.id}`).expect(200);
    const heads = full.body.revision.price.lines.find((l: { key: string }) => l.key.includes('head'));
    expect(heads).toBeDefined();
    const noReason = await sales.patch(`/api/quotes/${q.id}`).send({ version: full.body.version, priceOverrides: [{ key: heads.key, amount_minor: 1000 }] });
    expect(noReason.status).toBe(400);
    expect(noReason.body.error.fields).toHaveProperty(['priceOverrides.0.reason']);
    const res = await sales
      .patch(`/api/quotes/${q.id}`)
      .send({ version: full.body.version, priceOverrides: [{ key: heads.key, amount_minor: heads.amount_minor - 5000, reason: 'Heads from stock' }] });
    expect(res.status).toBe(200);
    const line = res.body.revision.price.lines.find((l: { key: string }) => l.key === heads.key);
    expect(line.amount_minor).toBe(heads.amount_minor - 5000);
    expect(line.override).toMatchObject({ computed_minor: heads.amount_minor, reason: 'Heads from stock' });
    expect(res.body.priceTotal_minor).toBeLessThan(full.body.priceTotal_minor);
  });

  it('approves: an offer revision with a validity date, an e-mail to the customer, and the PDF', async () => {
    const q = await createQuote(pellmar);
    const res = await sales.post(`/api/quotes/${q.id}/approve`).send({ version: q.version, message: 'Thank you for asking us.' });
    expect(res.status).toBe(200);
    expect(res.body.status).toBe('approved');
    expect(res.body.revision.kind).toBe('offer');
    expect(new Date(res.body.validUntil).getTime()).toBeGreaterThan(Date.now());
    const mail = await waitForMail(t.config, 'customer@pellmar.example', new RegExp(`offer ${q.number} is ready`));
    expect(mail.links.some((l) => l.endsWith(`/quotes/${q.id}`))).toBe(true);

    const seen = await pellmar.get(`/api/quotes/${q.id}`).expect(200);
    expect(seen.body).toMatchObject({ status: 'approved', can: { accept: true, requestChange: true, edit: false } });
    const pdf = await pellmar.get(`/api/quotes/${q.id}/offer.pdf`).buffer(true).parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => cb(null, Buffer.concat(chunks)));
    });
    expect(pdf.status).toBe(200);
    expect(pdf.headers['content-type']).toBe('application/pdf');
    expect((pdf.body as Buffer).subarray(0, 5).toString()).toBe('%PDF-');
    // approving twice is a conflict, not a second offer
    expect((await sales.post(`/api/quotes/${q.id}/approve`).send({ version: res.body.version })).status).toBe(409);
  });

  it('sends back with questions, the customer answers (review reopens), then declines with a reason', async () => {
    const q = await createQuote(pellmar);
    const asked = await sales.post(`/api/quotes/${q.id}/questions`).send({ message: 'Is the oil flow at full load?' });
    expect(asked.body.status).toBe('questions');
    await waitForMail(t.config, 'customer@pellmar.example', new RegExp(`Questions about your request ${q.number}`));
    const empty = await pellmar.post(`/api/quotes/${q.id}/request-change`).send({ message: '' });
    expect(empty.status).toBe(400);
    const answered = await pellmar.post(`/api/quotes/${q.id}/request-change`).send({ message: 'Yes, 72 l/min at full load.' });
    expect(answered.body.status).toBe('in-review');
    const declined = await sales.post(`/api/quotes/${q.id}/decline`).send({ message: 'Outside our pressure range.' });
    expect(declined.body.status).toBe('declined');
    expect((await sales.patch(`/api/quotes/${q.id}`).send({ version: declined.body.version, quantity: 1 })).status).toBe(409);
  });
});

describe('attachments', () => {
  it('keeps a datasheet by content type and checksum; serves it to its organisation and staff only', async () => {
    const q = await createQuote(pellmar);
    const up = await pellmar.post(`/api/quotes/${q.id}/attachments`).attach('file', TINY_PNG, 'nameplate.png');
    expect(up.status).toBe(201);
    expect(up.body).toMatchObject({ filename: 'nameplate.png', contentType: 'image/png', size: TINY_PNG.length });
    const { createHash } = await import('node:crypto');
    expect(up.body.sha256).toBe(createHash('sha256').update(TINY_PNG).digest('hex'));
    for (const who of [pellmar, sales]) {
      const got = await who.get(`/api/quotes/${q.id}/attachments/${up.body.id}`).buffer(true);
      expect(got.status).toBe(200);
      expect(Buffer.from(got.body as Buffer).equals(TINY_PNG)).toBe(true);
    }
    expect((await quarry.get(`/api/quotes/${q.id}/attachments/${up.body.id}`)).status).toBe(404);
  });

  it('refuses a disguised file, a missing file and an oversized one', async () => {
    const q = await createQuote(pellmar);
    const exe = Buffer.concat([Buffer.from('MZ'), Buffer.alloc(200, 1)]);
    const disguised = await pellmar.post(`/api/quotes/${q.id}/attachments`).attach('file', exe, 'datasheet.pdf');
    expect(disguised.status).toBe(415);
    expect(disguised.body.error.fields).toHaveProperty('file');
    const pngAsPdf = await pellmar.post(`/api/quotes/${q.id}/attachments`).attach('file', TINY_PNG, 'drawing.pdf');
    expect(pngAsPdf.status).toBe(415);
    const none = await pellmar.post(`/api/quotes/${q.id}/attachments`).field('note', 'no file');
    expect(none.status).toBe(400);
    const big = await pellmar.post(`/api/quotes/${q.id}/attachments`).attach('file', Buffer.alloc(20 * 1024 * 1024 + 1, 0x41), 'big.csv');
    expect(big.status).toBe(413);
    const csv = await pellmar.post(`/api/quotes/${q.id}/attachments`).attach('file', Buffer.from('tag,flow_kg_s\nHPU-7,1.2\n'), 'duty.csv');
    expect(csv.status).toBe(201);
    expect(csv.body.contentType).toBe('text/csv');
  });
});
