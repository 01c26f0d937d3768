import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createDatabase } from '../../db';
import { createApp } from '../../server/app';
import { discardMailer } from '../../server/lib/mail';
import { signedIn, startTestApp, type TestApp } from './support/app';

let t: TestApp;
let orgIds: Record<string, string>;
beforeAll(async () => {
  t = await startTestApp();
  const { rows } = await t.database.pool.query<{ id: string; name: string }>('select id, name from organizations');
  orgIds = Object.fromEntries(rows.map((r) => [r.name, r.id]));
});
afterAll(() => t.close());

describe('role guards', () => {
  it('a staff-only route answers 401 anonymous, 403 to a customer, 200 to an admin', async () => {
    const anon = await request(t.app).get('/api/admin/organizations');
    expect(anon.status).toBe(401);
    expect(anon.body.error.code).toBe('unauthorized');
    const customer = await signedIn(t.app, 'customer@pellmar.example');
    const forbidden = await customer.get('/api/admin/organizations');
    expect(forbidden.status).toBe(403);
    expect(forbidden.body.error.code).toBe('forbidden');
    const sales = await signedIn(t.app, 'sales@aldercreek.example');
    await sales.get('/api/admin/organizations').expect(403);
    await sales.get('/api/dev/outbox').expect(403);
    const admin = await signedIn(t.app, 'admin@aldercreek.example');
    const ok = await admin.get('/api/admin/organizations').expect(200);
    expect(ok.body.items.map((o: { name: string }) => o.name)).toContain('Pellmar Compression');
  });

  it('only admins invite, and a customer invitation needs a customer organisation', async () => {
    const customer = await signedIn(t.app, 'customer@pellmar.example');
    await customer.post('/api/admin/invitations').send({ email: 'a@b.example', role: 'sales' }).expect(403);
    const admin = await signedIn(t.app, 'admin@aldercreek.example');
    const res = await admin.post('/api/admin/invitations').send({ email: 'c@d.example', role: 'customer' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty('organizationId');
    const bad = await admin.post('/api/admin/invitations').send({ email: 'c@d.example', role: 'boss' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toHaveProperty('role');
    await admin.post('/api/admin/invitations').send({ email: 'sales@aldercreek.example', role: 'sales' }).expect(409);
  });
});

describe('organisation scoping', () => {
  it("a customer reads its own organisation; another organisation's is 404, as is an unknown id", async () => {
    const customer = await signedIn(t.app, 'customer@pellmar.example');
    const own = await customer.get(`/api/organizations/${orgIds['Pellmar Compression']}`).expect(200);
    expect(own.body.organization.name).toBe('Pellmar Compression');
    expect(own.body.members.map((m: { email: string }) => m.email)).toContain('customer@pellmar.example');

    const other = await customer.get(`/api/organizations/${orgIds['Quarry Hill Hydraulics']}`);
    expect(other.status).toBe(404);
    expect(JSON.stringify(other.body)).not.toContain('Quarry');
    await customer.get('/api/organizations/00000000-0000-4000-8000-000000000000').expect(404);
    const malformed = await customer.get('/api/organizations/not-a-uuid');
    expect(malformed.status).toBe(400);
    expect(malformed.body.error.fields).toHaveProperty('id');
  });

  it('staff read any organisation', async () => {
    const sales = await signedIn(t.app, 'sales@aldercreek.example');
    const res = await sales.get(`/api/organizations/${orgIds['Quarry Hill Hydraulics']}`).expect(200);
    expect(res.body.members.map((m: { email: string }) => m.email)).toContain('buyer@quarryhill.example');
  });
});

describe('errors and health', () => {
  it('an unknown API route is 404 in the error shape', async () => {
    const res = await request(t.app).get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(res.body).toEqual({ error: { code: 'not-found', message: 'No such endpoint: GET /api/no-such-thing' } });
  });

  it('health says ok with the database up, 503 with it down', async () => {
    expect((await request(t.app).get('/api/health')).body).toEqual({ status: 'ok', db: 'ok' });
    const dead = createDatabase(t.config.DATABASE_URL.replace(/:(\d+)\//, ':1/'), 1);
    const app = createApp({ config: t.config, database: dead, mailer: discardMailer, clientDir: '/nonexistent' });
    const res = await request(app).get('/api/health');
    expect(res.status).toBe(503);
    expect(res.body).toEqual({ status: 'degraded', db: 'down' });
    await dead.pool.end();
  });
});
