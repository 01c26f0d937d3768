import { existsSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import express from 'express';
import helmet from 'helmet';
import type { Database } from '../db';
import { createPassport } from './lib/auth/passport';
import type { Config } from './lib/config';
import { csrfGuard } from './lib/csrf';
import { errorHandler, notFoundHandler } from './lib/errors';
import type { Jobs } from './lib/jobs';
import type { Mailer } from './lib/mail';
import { createStripe } from './lib/payments';
import { localStorage, type FileStorage } from './lib/storage';
import type Stripe from 'stripe';
import { sessionMiddleware } from './lib/session';
import { authRouter } from './features/auth/routes';
import { verifyCredentials } from './features/auth/service';
import { fluidsRouter } from './features/fluids/routes';
import { healthRouter } from './features/health/routes';
import { mailLogRouter } from './features/mail-log/routes';
import { adminRouter, organizationsRouter } from './features/organizations/routes';
import { acceptRouter, ordersRouter, webhookHandler } from './features/orders/routes';
import { outboxRouter } from './features/outbox/routes';
import { priceBookRouter } from './features/pricing/routes';
import { quotesRouter } from './features/quotes/routes';
import { thermalRouter } from './features/thermal/routes';
import { exportsRouter } from './features/exports/routes';

export interface AppDeps {
  config: Config;
  database: Database;
  mailer: Mailer;
  /** folder of the built client (vite build); served with an SPA fallback when present */
  clientDir?: string;
  /** uploaded files; a folder under DATA_DIR by default */
  storage?: FileStorage;
  /** the Stripe SDK; built from the configuration by default */
  stripe?: Stripe;
  /** the job queue; a cancellation queues its refund on it (without it, a cancel with a refund fails) */
  jobs?: Jobs;
}

const defaultClientDir = fileURLToPath(new URL('../dist', import.meta.url));

/** Assembles the app in a visible order: headers → body → session → auth → routers → 404 → errors. */
export function createApp({
  config,
  database,
  mailer,
  clientDir = defaultClientDir,
  storage = localStorage(join(resolve(config.DATA_DIR), 'uploads')),
  stripe = createStripe(config),
  jobs,
}: AppDeps) {
  const { db, pool } = database;
  const deps = { db, mailer, config };
  const orderDeps = { ...deps, storage, stripe, jobs };
  const passport = createPassport(db, (email, password) => verifyCredentials(deps, email, password));

  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', config.APP_URL.startsWith('https://') ? 1 : false);

  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          // naive-ui injects its component styles at run time
          'style-src': ["'self'", "'unsafe-inline'"],
          'img-src': ["'self'", 'data:', 'blob:'],
          'upgrade-insecure-requests': config.APP_URL.startsWith('https://') ? [] : null,
        },
      },
    }),
  );
  // Stripe signs the exact bytes it sends: this one route reads its body raw, before the JSON parser
  app.post('/api/payments/webhook', express.raw({ type: 'application/json', limit: '1mb' }), webhookHandler(orderDeps));
  app.use(express.json({ limit: '1mb' }));
  app.use('/api', sessionMiddleware(config, pool));
  app.use('/api', passport.session());
  // exempt: the thermal API is public and changes nothing; the webhook is verified by its signature
  app.use('/api', csrfGuard([config.APP_URL], ['/thermal/rate', '/thermal/size', '/payments/webhook']));

  app.use('/api/health', healthRouter(pool));
  app.use('/api/auth', authRouter(deps, pool, passport));
  app.use('/api/fluids', fluidsRouter());
  app.use('/api/thermal', thermalRouter(pool, config));
  app.use('/api/organizations', organizationsRouter(deps));
  app.use('/api', exportsRouter(orderDeps));
  app.use('/api/quotes', acceptRouter(orderDeps));
  app.use('/api/quotes', quotesRouter(orderDeps));
  app.use('/api/orders', ordersRouter(orderDeps));
  app.use('/api/admin/price-book', priceBookRouter(deps));
  app.use('/api/admin/mail', mailLogRouter(deps));
  app.use('/api/admin', adminRouter(deps));
  app.use('/api/dev', outboxRouter(config.OUTBOX_URL));
  app.use('/api', notFoundHandler);

  if (existsSync(clientDir)) {
    app.use(express.static(clientDir, { index: false, maxAge: '1h' }));
    // Every other GET is a client route: hand out the single page.
    app.get(/^\/(?!api\/).*/, (_req, res) => res.sendFile('index.html', { root: clientDir, maxAge: 0 }));
  }
  app.use(notFoundHandler);
  app.use(errorHandler);
  return app;
}
