/**
 * The real app on the test database (started by `npm test`), with the real job queue and mail
 * worker sending to the test SMTP sink. One per test file.
 */
import request from 'supertest';
import type { Express } from 'express';
import { createDatabase, type Database } from '../../../db';
import { createApp } from '../../../server/app';
import { loadConfig, type Config } from '../../../server/lib/config';
import { startJobs, type Jobs } from '../../../server/lib/jobs';
import { createTransport, queuedMailer, startMailWorker } from '../../../server/lib/mail';
import { createStripe } from '../../../server/lib/payments';
import { startRefundWorker } from '../../../server/features/orders/refunds';
import { offerAttachmentRenderer } from '../../../server/features/quotes/offer';

export const DEMO_PASSWORD = 'Bundlesmith-demo-1';

export interface TestApp {
  app: Express;
  config: Config;
  database: Database;
  close(): Promise<void>;
}

export async function startTestApp(overrides: Record<string, string> = {}): Promise<TestApp> {
  const config = loadConfig({ ...process.env, ...overrides });
  if (!config.DATABASE_URL.includes('_test')) {
    throw new Error(`API tests run only against a test database, not ${config.DATABASE_URL} (use npm test)`);
  }
  const database = createDatabase(config.DATABASE_URL, 5);
  let jobs: Jobs | undefined;
  jobs = await startJobs(config.DATABASE_URL);
  await startMailWorker(jobs, database.db, createTransport(config.SMTP_URL), config.MAIL_FROM, offerAttachmentRenderer(database.db));
  const stripe = createStripe(config);
  await startRefundWorker(jobs, database.db, stripe);
  const app = createApp({ config, database, mailer: queuedMailer(jobs, database.db), clientDir: '/nonexistent', stripe, jobs });
  await database.pool.query('delete from rate_limit_hits');
  return {
    app,
    config,
    database,
    async close() {
      await jobs?.stop({ graceful: false, wait: true, timeout: 2000 }).catch(() => undefined);
      await database.pool.end();
    },
  };
}

/** A cookie-keeping client that sends the header every state-changing request needs. */
export function client(app: Express) {
  const agent = request.agent(app);
  agent.set('X-Requested-With', 'bundlesmith');
  return agent;
}

export async function signedIn(app: Express, email: string, password = DEMO_PASSWORD) {
  const agent = client(app);
  const res = await agent.post('/api/auth/login').send({ email, password });
  if (res.status !== 200) throw new Error(`sign-in of ${email} failed: ${res.status} ${JSON.stringify(res.body)}`);
  return agent;
}

export const unique = (prefix: string) => `${prefix}-${Date.now().toString(36)}-${Math.random().toString(36).slice(2, 7)}`;

/** A message as the SMTP sink lists it; an attachment's bytes at `${OUTBOX_URL}/messages/:id/attachments/:index`. */
export interface CaughtMail {
  id: string;
  to: string[];
  subject: string;
  text: string;
  links: string[];
  attachments?: { filename: string; contentType: string; size: number; sha256: string }[];
}

/** Waits for the SMTP sink to have caught a message to `to` whose subject matches. */
export async function waitForMail(config: Config, to: string, subject: RegExp, timeoutMs = 15_000) {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const res = await fetch(`${config.OUTBOX_URL}/messages?to=${encodeURIComponent(to)}`);
    const { items } = (await res.json()) as { items: CaughtMail[] };
    const found = items.find((m) => subject.test(m.subject));
    if (found) return found;
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`no mail to ${to} matching ${subject} within ${timeoutMs} ms`);
}
