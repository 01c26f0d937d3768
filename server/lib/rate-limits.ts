import type { Request } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import type pg from 'pg';
import type { Config } from './config';
import { HttpError } from './errors';
import { FallbackRateLimitStore } from './rate-limit-fallback';
import { PgRateLimitStore } from './rate-limit-store';


function limiter(
  pool: pg.Pool,
  name: string,
  opts: { windowMs: number; limit: number; key: (req: Request) => string; failuresOnly?: boolean; message: string },
) {
  return rateLimit({
    windowMs: opts.windowMs,
    limit: opts.limit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    skipSuccessfulRequests: opts.failuresOnly ?? false,
    keyGenerator: opts.key,
    // counted in PostgreSQL; in memory while the database is down (fail open, see rate-limit-fallback.ts)
    store: new FallbackRateLimitStore(new PgRateLimitStore(pool, name)),
    handler: (_req, _res, next) => next(new HttpError(429, 'too-many-requests', opts.message)),
  });
}

const address = (req: Request) => ipKeyGenerator(req.ip ?? 'unknown');
const emailOf = (req: Request) => {
  const email: unknown = req.body?.email;
  return typeof email === 'string' ? email.trim().toLowerCase() : '(none)';
};

/** Sign-in: failed attempts counted per account and per address. */
export function loginLimiters(config: Config, pool: pg.Pool) {
  const windowMs = config.LOGIN_WINDOW_MINUTES * 60_000;
  const message = `Too many failed sign-in attempts; wait ${config.LOGIN_WINDOW_MINUTES} minutes or reset your password.`;
  return [
    limiter(pool, 'login-addr', { windowMs, limit: config.LOGIN_MAX_PER_ADDRESS, key: address, failuresOnly: true, message }),
    limiter(pool, 'login-acct', { windowMs, limit: config.LOGIN_MAX_PER_ACCOUNT, key: emailOf, failuresOnly: true, message }),
  ];
}

/** E-mail-sending endpoints (password reset, registration): a cap per address. */
export function mailLimiter(pool: pg.Pool, name: string, limit = 20) {
  return limiter(pool, name, {
    windowMs: 15 * 60_000,
    limit,
    key: address,
    message: 'Too many requests from your address; try again in a quarter of an hour.',
  });
}

/** Public computation endpoints: a cap per address per minute. */
export function publicApiLimiter(pool: pg.Pool, name: string, limit = 120) {
  return limiter(pool, name, {
    windowMs: 60_000,
    limit,
    key: address,
    message: 'Too many requests from your address; slow down a little.',
  });
}
