/**
 * A PostgreSQL outage, staged with a relay that refuses connections: the app keeps running, every
 * route answers 503 with words (sign-in included), the public thermal API keeps computing (its rate
 * limiter counts in memory meanwhile), and everything works again without a restart — the same
 * session included, and queued mail is delivered.
 */
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestApp, signedIn, waitForMail, type TestApp } from './support/app';
import { startDbProxy, type DbProxy } from './support/db-proxy';

let proxy: DbProxy;
let t: TestApp;
beforeAll(async () => {
  const direct = new URL(process.env.DATABASE_URL!);
  proxy = await startDbProxy(direct.hostname, Number(direct.port));
  t = await startTestApp({ DATABASE_URL: proxy.url(process.env.DATABASE_URL!) });
});
afterAll(async () => {
  await proxy.restore().catch(() => undefined);
  await t.close();
  await proxy.close();
});

const rateBody = {
  process: { fluid: 'water', pressure_Pa: 300000, massFlow_kg_s: 1.5, inletTemp_C: 85 },
  boundary: { kind: 'wall', wallTemp_C: 20 },
  geometry: { tubeOuterDiameter_m: 0.01905, tubeWall_m: 0.001245, tubeCount: 40, tubeLength_m: 3.0, tubePasses: 1, roughness_m: 1.5e-6, tubeMaterial: 'copper' },
  correlation: 'auto',
};

describe('a database outage', () => {
  it('answers 503 in words while PostgreSQL is unreachable, keeps the process up, and recovers without a restart', async () => {
    const customer = await signedIn(t.app, 'buyer@quarryhill.example');
    await customer.get('/api/quotes').expect(200);

    await proxy.cut();
    try {
      const list = await customer.get('/api/quotes');
      expect(list.status).toBe(503);
      expect(list.body.error.code).toBe('unavailable');
      expect(list.body.error.message).toMatch(/database cannot be reached.*try again/i);
      expect(list.headers['retry-after']).toBe('30');

      const login = await request(t.app).post('/api/auth/login').set('X-Requested-With', 'bundlesmith').send({ email: 'sales@aldercreek.example', password: 'whatever-1' });
      expect(login.status).toBe(503);
      expect(login.body.error.code).toBe('unavailable');

      const health = await request(t.app).get('/api/health');
      expect(health.status).toBe(503);

      // the public API needs no database: its limiter counts in memory meanwhile (fail open)
      const rated = await request(t.app).post('/api/thermal/rate').send(rateBody);
      expect(rated.status).toBe(200);
      expect(rated.body.outletTemp_C).toBeLessThan(85);

      // let the job queue's pollers and the mail worker run into the outage (an unhandled rejection
      // here fails the test run)
      await new Promise((r) => setTimeout(r, 2500));
    } finally {
      await proxy.restore();
    }

    // back without a restart: the same session, and mail queued after the outage is delivered
    await customer.get('/api/quotes').expect(200);
    expect((await request(t.app).get('/api/health')).status).toBe(200);
    const reset = await request(t.app).post('/api/auth/password-reset/request').set('X-Requested-With', 'bundlesmith').send({ email: 'buyer@quarryhill.example' });
    expect(reset.status).toBe(202);
    await waitForMail(t.config, 'buyer@quarryhill.example', /reset/i, 30_000);
  }, 60_000);
});
