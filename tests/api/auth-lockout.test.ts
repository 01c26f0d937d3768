/**
 * Sign-in limits that a guesser cannot turn against the owner: failures count per account AND
 * address (with a stepped backoff), and a looser per-account cap across addresses does not hold an
 * address the account signed in from lately. Addresses come from X-Forwarded-For, trusted behind
 * one proxy when the app runs over https (APP_URL).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { client, DEMO_PASSWORD, startTestApp, unique, type TestApp } from './support/app';

const PER_ACCOUNT = 12;
let t: TestApp;
beforeAll(async () => {
  t = await startTestApp({ APP_URL: 'https://bundlesmith.test', LOGIN_MAX_PER_ACCOUNT: String(PER_ACCOUNT) });
});
afterAll(() => t.close());

const from = (ip: string) => client(t.app).set('X-Forwarded-For', ip).set('X-Forwarded-Proto', 'https');
const login = (ip: string, email: string, password: string) => from(ip).post('/api/auth/login').send({ email, password });

/** A customer of our own with a known password (registration needs the e-mailed link, so straight into the table). */
async function newAccount(): Promise<string> {
  const email = `${unique('owner')}@pellmar.example`;
  await t.database.pool.query(
    `insert into users (organization_id, email, name, role, password_hash)
     select organization_id, $1, 'Lockout Owner', 'customer', password_hash from users where email = 'customer@pellmar.example'`,
    [email],
  );
  return email;
}

describe('sign-in limits', () => {
  it('throttles the guessing address for that account while the owner signs in from another address (was: locked for 15 minutes)', async () => {
    const email = await newAccount();
    const statuses: number[] = [];
    for (let i = 0; i < 10; i++) statuses.push((await login('203.0.113.66', email, `guess-${i}`)).status);
    const pair = t.config.LOGIN_MAX_PER_ACCOUNT_ADDRESS;
    expect(statuses.slice(0, pair)).toEqual(Array(pair).fill(401));
    expect(statuses.slice(pair)).toEqual(Array(10 - pair).fill(429));
    // even the right password is refused from the guessing address for now
    expect((await login('203.0.113.66', email, DEMO_PASSWORD)).status).toBe(429);
    // the owner, from their own address, is not locked out
    const owner = await login('198.51.100.7', email, DEMO_PASSWORD);
    expect(owner.status).toBe(200);
    expect(owner.body.user.email).toBe(email);
    // and the guessing address can still sign in to another account
    expect((await login('203.0.113.66', 'shop@aldercreek.example', DEMO_PASSWORD)).status).toBe(200);
  });

  it('backs off in steps: past 4× the pair limit in a day the address waits a day, even after the short window', async () => {
    const email = await newAccount();
    const pair = t.config.LOGIN_MAX_PER_ACCOUNT_ADDRESS;
    for (let i = 0; i < pair; i++) await login('203.0.113.70', email, `guess-${i}`).expect(401);
    expect((await login('203.0.113.70', email, 'guess-x')).status).toBe(429);
    // the short window ends (moved into the past), then more guesses until the daily step
    // (the account's cap across addresses is lifted each round, to watch the pair's steps alone)
    const endShortWindow = () =>
      t.database.pool.query(`update rate_limit_hits set reset_at = now() - interval '1 second' where key = any($1)`, [
        [`login-pair:${email}|203.0.113.70`, `login-acct:${email}`],
      ]);
    for (let round = 1; round < 4; round++) {
      await endShortWindow();
      for (let i = 0; i < pair; i++) await login('203.0.113.70', email, `guess-${round}-${i}`).expect(401);
    }
    await endShortWindow();
    const blocked = await login('203.0.113.70', email, 'guess-day');
    expect(blocked.status).toBe(429);
    expect(blocked.body.error.message).toMatch(/tomorrow/);
  });

  it('still caps one account across many addresses, except from an address it signed in from lately', async () => {
    const email = await newAccount();
    await login('198.51.100.20', email, DEMO_PASSWORD).expect(200); // the owner's usual address
    for (let i = 0; i < PER_ACCOUNT; i++) await login(`192.0.2.${i + 1}`, email, `spray-${i}`).expect(401);
    const fresh = await login('192.0.2.200', email, DEMO_PASSWORD);
    expect(fresh.status).toBe(429); // a new address is held by the account's cap, right password or not
    expect(fresh.body.error.code).toBe('too-many-requests');
    expect((await login('198.51.100.20', email, DEMO_PASSWORD)).status).toBe(200);
  });
});
