import type { ErrorRequestHandler } from 'express';

/**
 * Errors in Stripe's wire shape: `{ error: { type, code?, message, param?, … } }` with Stripe's status
 * codes, because the SDK picks its error class (StripeCardError, StripeInvalidRequestError, …) from
 * the status and `type`, and the app's error handling is written against those classes.
 */
export type StripeErrorType = 'invalid_request_error' | 'card_error' | 'idempotency_error' | 'api_error';

export interface StripeErrorBody {
  type: StripeErrorType;
  message: string;
  code?: string;
  param?: string;
  doc_url?: string;
  [extra: string]: unknown;
}

export class StripeFakeError extends Error {
  constructor(
    readonly status: number,
    readonly body: StripeErrorBody,
    /** Stripe saves no idempotent result for a request refused before it started executing. */
    readonly beforeExecution = false,
  ) {
    super(body.message);
  }
}

const docUrl = (code?: string) => (code ? { doc_url: `https://stripe.com/docs/error-codes/${code.replace(/_/g, '-')}` } : {});

export const invalidRequest = (message: string, extra: { code?: string; param?: string; status?: number } = {}) =>
  new StripeFakeError(extra.status ?? 400, {
    type: 'invalid_request_error',
    message,
    ...(extra.code ? { code: extra.code } : {}),
    ...(extra.param ? { param: extra.param } : {}),
    ...docUrl(extra.code),
  });

/** 404 for an id that does not exist, worded as Stripe words it. */
export const noSuch = (objectName: string, id: string, param = 'id') =>
  invalidRequest(`No such ${objectName}: '${id}'`, { code: 'resource_missing', param, status: 404 });

export const unexpectedState = (message: string) => invalidRequest(message, { code: 'payment_intent_unexpected_state' });

/** A parameter problem found before the operation ran: not saved under an idempotency key. */
export const badParam = (message: string, param: string, code?: string) =>
  new StripeFakeError(400, {
    type: 'invalid_request_error',
    message,
    param,
    ...(code ? { code } : {}),
    ...docUrl(code),
  }, true);

export const errorHandler: ErrorRequestHandler = (err, _req, res, _next) => {
  if (err instanceof StripeFakeError) {
    if (err.beforeExecution) res.locals.idempotencyNotSaved = true;
    res.status(err.status).json({ error: err.body });
    return;
  }
  // body-parser's own errors (malformed bodies) carry a status of their own
  const status = typeof err?.status === 'number' && err.status < 500 ? err.status : 500;
  if (status === 500) console.error('[stripe-fake]', err);
  res.locals.idempotencyNotSaved = true;
  res.status(status).json({
    error: {
      type: status === 500 ? 'api_error' : 'invalid_request_error',
      message: status === 500 ? 'An unknown error occurred in the local Stripe fake.' : String(err?.message ?? 'Bad request'),
    },
  });
};
