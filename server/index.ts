/** Starts the app: configuration, database, job queue and mail worker, then listens. */
import { createDatabase } from '../db';
import { createApp } from './app';
import { loadConfig } from './lib/config';
import { startJobs } from './lib/jobs';
import { createTransport, queuedMailer, startMailWorker } from './lib/mail';
import { createStripe } from './lib/payments';
import { startRefundWorker } from './features/orders/refunds';
import { offerAttachmentRenderer } from './features/quotes/offer';

// A failed promise nobody awaited (a job-queue call while PostgreSQL is down) is logged, and the app
// keeps serving: requests answer 503 until the database is back. A thrown exception nobody caught
// leaves the process in an unknown state: it exits, and the supervisor (start scripts) restarts it.
process.on('unhandledRejection', (reason) => {
  console.error('[app] unhandled rejection, kept running:', reason instanceof Error ? reason.message : reason);
});
process.on('uncaughtException', (err) => {
  console.error('[app] uncaught exception, exiting for a restart:', err);
  process.exit(1);
});

let config;
try {
  config = loadConfig();
} catch (err) {
  console.error((err as Error).message);
  process.exit(1);
}

const database = createDatabase(config.DATABASE_URL);
const jobs = await startJobs(config.DATABASE_URL);
await startMailWorker(jobs, database.db, createTransport(config.SMTP_URL), config.MAIL_FROM, offerAttachmentRenderer(database.db));
const stripe = createStripe(config);
await startRefundWorker(jobs, database.db, stripe);

const app = createApp({ config, database, mailer: queuedMailer(jobs, database.db), stripe, jobs });
const server = app.listen(config.PORT, config.HOST, () => {
  console.log(`[app] Bundlesmith listening on http://${config.HOST}:${config.PORT} (${config.APP_URL})`);
});

async function shutdown(signal: string) {
  console.log(`[app] ${signal}: shutting down`);
  server.close();
  await jobs.stop({ graceful: true, timeout: 5000 }).catch(() => undefined);
  await database.pool.end().catch(() => undefined);
  process.exit(0);
}
process.on('SIGTERM', () => void shutdown('SIGTERM'));
process.on('SIGINT', () => void shutdown('SIGINT'));
