import type { RequestHandler } from 'express';
import { randomToken } from './ids';
import type { StripeFakeState } from './state';
import { StripeFakeError } from './errors';

/** JSON with sorted keys, so the same parameters in another order match. */
function canonical(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonical).join(',')}]`;
  if (value && typeof value === 'object') {
    const entries = Object.entries(value as Record<string, unknown>).sort(([a], [b]) => a.localeCompare(b));
    return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonical(v)}`).join(',')}}`;
  }
  return JSON.stringify(value ?? null);
}

/**
 * Stripe's idempotency: the first response under a key (success or failure, once the operation ran)
 * is saved and replayed for the same key and the same request; the same key with another request is a
 * 400 idempotency_error. The SDK sends a key on every POST (its own or the caller's `idempotencyKey`),
 * which is what makes its automatic retries safe, so every POST goes through here.
 */
export function idempotency(state: StripeFakeState): RequestHandler {
  return (req, res, next) => {
    const key = req.get('idempotency-key');
    if (req.method !== 'POST' || !key) return next();
    res.locals.idempotencyKey = key;
    res.setHeader('Idempotency-Key', key);
    const slot = `${String(res.locals.apiKey)} ${key}`;
    const fingerprint = `${req.method} ${req.path} ${canonical(req.body)}`;
    const saved = state.idempotency.get(slot);
    if (saved) {
      if (saved.fingerprint !== fingerprint) {
        throw new StripeFakeError(400, {
          type: 'idempotency_error',
          message: `Keys for idempotent requests can only be used with the same parameters they were first used with. Try using a key other than '${key}' if you meant to execute a different request.`,
        }, true);
      }
      res.setHeader('Idempotent-Replayed', 'true');
      res.setHeader('Original-Request', saved.requestId);
      res.status(saved.status).json(saved.body);
      return;
    }
    const json = res.json.bind(res);
    res.json = (body: unknown) => {
      if (!res.locals.idempotencyNotSaved) {
        state.idempotency.set(slot, {
          fingerprint,
          requestId: String(res.locals.requestId),
          status: res.statusCode,
          body: structuredClone(body),
        });
      }
      return json(body);
    };
    next();
  };
}

/** Stripe answers every request with a Request-Id; events name it in `request.id`. */
export const requestId: RequestHandler = (_req, res, next) => {
  res.locals.requestId = `req_${randomToken(14)}`;
  res.setHeader('Request-Id', res.locals.requestId);
  next();
};
