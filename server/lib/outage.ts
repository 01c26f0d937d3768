/**
 * Telling an outage of a service we depend on from a bug: a request that fails because PostgreSQL
 * cannot be reached answers 503 with words the user can act on, never a 500. Drizzle and pg-boss
 * wrap the driver's error, so the whole `cause` chain is searched.
 */

/** Node's socket errors and PostgreSQL's connection-exception / operator-intervention classes. */
const NETWORK_CODES = new Set(['ECONNREFUSED', 'ECONNRESET', 'ETIMEDOUT', 'EPIPE', 'EHOSTUNREACH', 'ENOTFOUND', 'EAI_AGAIN']);
const PG_CODES = /^(08|57P0[1-3]|53300)/; // 08xxx connection exception; 57P01-03 shutdown/cannot connect now; 53300 too many connections
const MESSAGES = /Connection terminated|timeout exceeded when trying to connect|Client has encountered a connection error|connect ECONNREFUSED|Connection ended unexpectedly/i;

export function isDatabaseUnavailable(err: unknown): boolean {
  for (let e: unknown = err, depth = 0; e && depth < 6; e = (e as { cause?: unknown }).cause, depth++) {
    if (typeof e !== 'object') return false;
    const { code, message } = e as { code?: unknown; message?: unknown };
    if (typeof code === 'string' && (NETWORK_CODES.has(code) || PG_CODES.test(code))) return true;
    if (typeof message === 'string' && MESSAGES.test(message)) return true;
    if (e instanceof AggregateError && e.errors.some((inner) => isDatabaseUnavailable(inner))) return true;
  }
  return false;
}

export const DATABASE_UNAVAILABLE_MESSAGE =
  'The service is briefly unavailable (our database cannot be reached). Nothing was changed; try again in a minute.';

/** The driver's own words at the bottom of the cause chain (never the failed query and its parameters). */
export function rootMessage(err: unknown): string {
  let e: unknown = err;
  for (let depth = 0; depth < 6 && e && typeof e === 'object' && (e as { cause?: unknown }).cause; depth++) e = (e as { cause: unknown }).cause;
  return e instanceof Error ? e.message : String(e);
}
