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
  opts: {
    windowMs: number;
    limit: number;
    key: (req: Request) => string;
    failuresOnly?: boolean;
    message: string;
    skip?: (req: Request) => boolean | Promise<boolean>;
  },
) {
  return rateLimit({
    windowMs: opts.windowMs,
    limit: opts.limit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    skipSuccessfulRequests: opts.failuresOnly ?? false,
    keyGenerator: opts.key,
    ...(opts.skip ? { skip: opts.skip } : {}),
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
const accountAtAddress = (req: Request) => `${emailOf(req)}|${address(req)}`;

/** How long an address where an account signed in counts as that account's usual address. */
const KNOWN_ADDRESS_DAYS = 30;
const knownKey = (req: Request) => `login-known:${accountAtAddress(req)}`;

/** Remembers that this account signed in from this address (called after a successful sign-in). */
export async function rememberSignInAddress(pool: pg.Pool, req: Request): Promise<void> {
  await pool.query(
    `insert into rate_limit_hits (key, hits, reset_at) values ($1, 1, now() + $2 * interval '1 day')
     on conflict (key) do update set hits = 1, reset_at = excluded.reset_at`,
    [knownKey(req), KNOWN_ADDRESS_DAYS],
  );
}

async function isKnownAddress(pool: pg.Pool, req: Request): Promise<boolean> {
  try {
    const { rowCount } = await pool.query(`select 1 from rate_limit_hits where key = $1 and reset_at > now()`, [knownKey(req)]);
    return (rowCount ?? 0) > 0;
  } catch {
    return false; // unknown is the safe answer: the account's cap applies
  }
}

/**
 * Sign-in: failed attempts are counted so that a guesser cannot lock the owner out.
 * - per account AND address: LOGIN_MAX_PER_ACCOUNT_ADDRESS per window, then 4× that per day (a
 *   stepped backoff): the guesser's address is throttled for that account, the owner elsewhere is not;
 * - per address, whatever the account: LOGIN_MAX_PER_ADDRESS per window (one address spraying accounts);
 * - per account across all addresses: LOGIN_MAX_PER_ACCOUNT per window, looser, against guessing from
 *   many addresses; an address this account signed in from in the last 30 days is not held by it.
 */
export function loginLimiters(config: Config, pool: pg.Pool) {
  const windowMs = config.LOGIN_WINDOW_MINUTES * 60_000;
  const message = `Too many failed sign-in attempts; wait ${config.LOGIN_WINDOW_MINUTES} minutes or reset your password.`;
  const pairLimit = config.LOGIN_MAX_PER_ACCOUNT_ADDRESS;
  return [
    limiter(pool, 'login-pair', { windowMs, limit: pairLimit, key: accountAtAddress, failuresOnly: true, message }),
    limiter(pool, 'login-pair-day', {
      windowMs: 24 * 60 * 60_000,
      limit: pairLimit * 4,
      key: accountAtAddress,
      failuresOnly: true,
      message: 'Too many failed sign-in attempts for this account from your address today; reset your password or try again tomorrow.',
    }),
    limiter(pool, 'login-addr', { windowMs, limit: config.LOGIN_MAX_PER_ADDRESS, key: address, failuresOnly: true, message }),
    limiter(pool, 'login-acct', {
      windowMs,
      limit: config.LOGIN_MAX_PER_ACCOUNT,
      key: emailOf,
      failuresOnly: true,
      message,
      skip: (req) => isKnownAddress(pool, req),
    }),
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
