import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { client, DEMO_PASSWORD, signedIn, startTestApp, unique, waitForMail, type TestApp } from './support/app';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.close());

/** A new customer through the whole registration: request, e-mailed link, confirmation. */
async function registerCustomer(email: string, password: string): Promise<void> {
  await client(t.app).post('/api/auth/register').send({ name: 'Test Customer', email, password, organizationName: unique('Test Org') }).expect(202);
  const mail = await waitForMail(t.config, email, /Finish creating/);
  const token = new URL(mail.links.find((l) => l.includes('/register/confirm'))!).searchParams.get('token')!;
  await client(t.app).post('/api/auth/register/confirm').send({ token }).expect(201);
}

describe('sign-in', () => {
  it('signs in a demo user, normalising the e-mail, and rotates the session id', async () => {
    const agent = client(t.app);
    await agent.get('/api/auth/me').expect(401);
    const res = await agent.post('/api/auth/login').send({ email: '  Sales@AlderCreek.example ', password: DEMO_PASSWORD });
    expect(res.status).toBe(200);
    expect(res.body.user).toMatchObject({ email: 'sales@aldercreek.example', role: 'sales', organizationName: 'Alder Creek Thermal Works' });
    expect(Object.keys(res.body.user).sort()).toEqual(['email', 'id', 'name', 'organizationId', 'organizationName', 'role']);
    const cookie = res.headers['set-cookie']?.[0] ?? '';
    expect(cookie).toMatch(/^bundlesmith\.sid=/);
    expect(cookie).toMatch(/HttpOnly/);
    expect(cookie).toMatch(/SameSite=Lax/);

    const again = await agent.post('/api/auth/login').send({ email: 'sales@aldercreek.example', password: DEMO_PASSWORD });
    const sid = (c: string) => c.split(';')[0];
    expect(sid(again.headers['set-cookie']?.[0] ?? '')).not.toBe(sid(cookie));
  });

  it('refuses a wrong password and an unknown account with the same 401', async () => {
    const wrong = await client(t.app).post('/api/auth/login').send({ email: 'shop@aldercreek.example', password: 'not-the-password' });
    const unknown = await client(t.app).post('/api/auth/login').send({ email: 'nobody@aldercreek.example', password: 'whatever-it-is' });
    for (const res of [wrong, unknown]) {
      expect(res.status).toBe(401);
      expect(res.body.error).toMatchObject({ code: 'invalid-credentials' });
    }
    expect(wrong.body.error.message).toBe(unknown.body.error.message);
  });

  it('me returns the user; logout ends the session', async () => {
    const agent = await signedIn(t.app, 'customer@pellmar.example');
    const me = await agent.get('/api/auth/me').expect(200);
    expect(me.body.user).toMatchObject({ email: 'customer@pellmar.example', role: 'customer', organizationName: 'Pellmar Compression' });
    await agent.post('/api/auth/logout').expect(204);
    const after = await agent.get('/api/auth/me').expect(401);
    expect(after.body.error.code).toBe('unauthorized');
  });

  it('rejects malformed bodies with 400 and a message per field', async () => {
    const res = await client(t.app).post('/api/auth/login').send({ email: 'not-an-address', password: '' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid-input');
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['email', 'password']);
    const broken = await client(t.app).post('/api/auth/login').set('content-type', 'application/json').send('{"email":');
    expect(broken.status).toBe(400);
    expect(broken.body.error.code).toBe('malformed-body');
  });

  it('limits failed attempts per account from one address: the attempt after the limit gets 429 even with the right password', async () => {
    const email = `${unique('locked')}@pellmar.example`;
    const agent = client(t.app);
    const limit = t.config.LOGIN_MAX_PER_ACCOUNT_ADDRESS; // other addresses: auth-lockout.test.ts
    for (let i = 0; i < limit; i++) {
      await agent.post('/api/auth/login').send({ email, password: 'guess-number-' + i }).expect(401);
    }
    const blocked = await agent.post('/api/auth/login').send({ email, password: 'guess-again' });
    expect(blocked.status).toBe(429);
    expect(blocked.body.error.code).toBe('too-many-requests');
    // another account from the same address is still let through
    await agent.post('/api/auth/login').send({ email: 'shop@aldercreek.example', password: DEMO_PASSWORD }).expect(200);
  });
});

describe('cross-site protection', () => {
  it('refuses a state-changing request without our header or from another origin', async () => {
    const { default: request } = await import('supertest');
    const bare = await request(t.app).post('/api/auth/login').send({ email: 'shop@aldercreek.example', password: DEMO_PASSWORD });
    expect(bare.status).toBe(403);
    expect(bare.body.error.code).toBe('cross-site');
    const foreign = await client(t.app)
      .post('/api/auth/login')
      .set('Origin', 'https://elsewhere.example')
      .send({ email: 'shop@aldercreek.example', password: DEMO_PASSWORD });
    expect(foreign.status).toBe(403);
  });
});

describe('registration', () => {
  it('creates a customer with a new organisation through the e-mailed link, and signs them in', async () => {
    const email = `${unique('eng')}@newco.example`;
    const organizationName = unique('Newco Compressors');
    const res = await client(t.app).post('/api/auth/register').send({ name: 'Alex Test', email, password: 'long-enough-pass', organizationName });
    expect(res.status).toBe(202);
    expect(res.body).toEqual({ message: expect.stringMatching(/check your e-mail/i) });
    // nothing exists until the owner of the mailbox follows the link
    expect((await t.database.pool.query('select 1 from users where email = $1', [email])).rowCount).toBe(0);
    const mail = await waitForMail(t.config, email, /Finish creating your Bundlesmith account/);
    const token = new URL(mail.links.find((l) => l.includes('/register/confirm?token='))!).searchParams.get('token')!;

    const agent = client(t.app);
    const done = await agent.post('/api/auth/register/confirm').send({ token });
    expect(done.status).toBe(201);
    expect(done.body.user).toMatchObject({ email, role: 'customer', organizationName });
    await agent.get('/api/auth/me').expect(200);
    const again = await client(t.app).post('/api/auth/register/confirm').send({ token });
    expect(again.status).toBe(409); // used: the account exists
    const altered = await client(t.app).post('/api/auth/register/confirm').send({ token: token.slice(0, -4) + 'AAAA' });
    expect(altered.status).toBe(400);
    expect(altered.body.error.code).toBe('invalid-token');
    const { rows } = await t.database.pool.query('select password_hash from users where email = $1', [email]);
    expect(rows[0].password_hash).toMatch(/^scrypt\$/);
    expect(rows[0].password_hash).not.toContain('long-enough-pass');
  });

  it('answers an e-mail or organisation already registered exactly as a new one, and tells only the mailbox (was: 409 email-taken)', async () => {
    const fresh = await client(t.app)
      .post('/api/auth/register')
      .send({ name: 'New Person', email: `${unique('new')}@newco.example`, password: 'long-enough-pass', organizationName: unique('Fresh Co') });
    const takenEmail = await client(t.app)
      .post('/api/auth/register')
      .send({ name: 'Prober', email: 'customer@pellmar.example', password: 'long-enough-pass', organizationName: unique('Probe Co') });
    const probeEmail = `${unique('probe')}@newco.example`;
    const takenOrg = await client(t.app)
      .post('/api/auth/register')
      .send({ name: 'Prober', email: probeEmail, password: 'long-enough-pass', organizationName: 'Pellmar Compression' });
    for (const res of [takenEmail, takenOrg]) {
      expect(res.status).toBe(fresh.status);
      expect(res.body).toEqual(fresh.body);
      expect(Object.keys(res.headers).sort()).toEqual(Object.keys(fresh.headers).sort());
    }
    expect(fresh.status).toBe(202);
    const notice = await waitForMail(t.config, 'customer@pellmar.example', /Someone tried to register with your address/);
    expect(notice.text).toMatch(/reset-password/);
    await waitForMail(t.config, probeEmail, /Your Bundlesmith registration/);
    // the owner's password is untouched
    await signedIn(t.app, 'customer@pellmar.example');
  });

  it('asks for exactly one of organisation name or invitation, and a long enough password', async () => {
    const res = await client(t.app).post('/api/auth/register').send({ name: 'X', email: 'x@y.example', password: 'short' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty('password');
    expect(res.body.error.fields).toHaveProperty('organizationName');
  });

  it('joins an organisation through an admin invitation, once', async () => {
    const admin = await signedIn(t.app, 'admin@aldercreek.example');
    const orgs = await admin.get('/api/admin/organizations').expect(200);
    const quarry = orgs.body.items.find((o: { name: string }) => o.name === 'Quarry Hill Hydraulics');
    const email = `${unique('maint')}@quarryhill.example`;
    const inv = await admin.post('/api/admin/invitations').send({ email, role: 'customer', organizationId: quarry.id });
    expect(inv.status).toBe(201);
    const mail = await waitForMail(t.config, email, /invites you/);
    const link = new URL(mail.links.find((l) => l.includes('/register?invite='))!);
    const inviteToken = link.searchParams.get('invite')!;

    const wrongEmail = await client(t.app).post('/api/auth/register').send({ name: 'Imposter', email: 'other@quarryhill.example', password: 'long-enough-pass', inviteToken });
    expect(wrongEmail.status).toBe(400);
    const res = await client(t.app).post('/api/auth/register').send({ name: 'Maintenance Lead', email, password: 'long-enough-pass', inviteToken });
    expect(res.status).toBe(201);
    expect(res.body.user).toMatchObject({ role: 'customer', organizationId: quarry.id });
    const reuse = await client(t.app).post('/api/auth/register').send({ name: 'Twice', email: `x${email}`, password: 'long-enough-pass', inviteToken });
    expect(reuse.status).toBe(400);
    expect(reuse.body.error.code).toBe('invalid-invitation');
  });
});

describe('password reset', () => {
  it('resets through the e-mailed link, once, and ends old sessions', async () => {
    const email = `${unique('reset')}@pellmar.example`;
    await registerCustomer(email, 'first-password-1');
    const oldSession = await signedIn(t.app, email, 'first-password-1');

    const req = await client(t.app).post('/api/auth/password-reset/request').send({ email });
    expect(req.status).toBe(202);
    const unknown = await client(t.app).post('/api/auth/password-reset/request').send({ email: 'ghost@nowhere.example' });
    expect(unknown.status).toBe(202);
    expect(unknown.body).toEqual(req.body);

    const mail = await waitForMail(t.config, email, /Reset your Bundlesmith password/);
    const token = new URL(mail.links.find((l) => l.includes('/reset-password/confirm'))!).searchParams.get('token')!;
    expect(token.length).toBeGreaterThanOrEqual(40);

    await client(t.app).post('/api/auth/password-reset/confirm').send({ token, password: 'second-password-2' }).expect(204);
    await oldSession.get('/api/auth/me').expect(401);
    await client(t.app).post('/api/auth/login').send({ email, password: 'first-password-1' }).expect(401);
    await signedIn(t.app, email, 'second-password-2');
    const again = await client(t.app).post('/api/auth/password-reset/confirm').send({ token, password: 'third-password-3' });
    expect(again.status).toBe(400);
    expect(again.body.error.code).toBe('invalid-token');
  });

  it('refuses an expired link', async () => {
    const email = `${unique('late')}@pellmar.example`;
    await registerCustomer(email, 'first-password-1');
    await client(t.app).post('/api/auth/password-reset/request').send({ email }).expect(202);
    const mail = await waitForMail(t.config, email, /Reset/);
    const token = new URL(mail.links[0]!).searchParams.get('token')!;
    await t.database.pool.query(
      `update password_resets set expires_at = now() - interval '1 minute' where user_id = (select id from users where email = $1)`,
      [email],
    );
    const res = await client(t.app).post('/api/auth/password-reset/confirm').send({ token, password: 'second-password-2' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid-token');
  });
});
