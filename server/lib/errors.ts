import type { ErrorRequestHandler, RequestHandler } from 'express';
import { ZodError } from 'zod';
import { ThermalInputError } from '../../shared/thermal/errors';
import { DATABASE_UNAVAILABLE_MESSAGE, isDatabaseUnavailable, rootMessage } from './outage';

/** A failure with an HTTP status that handlers throw; the error middleware formats it. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: Record<string, string>,
  ) {
    super(message);
    this.name = 'HttpError';
  }
}

export const badRequest = (message: string, fields?: Record<string, string>) =>
  new HttpError(400, 'invalid-input', message, fields);
export const unauthorized = (message = 'Sign in first.') => new HttpError(401, 'unauthorized', message);
export const forbidden = (message = 'Your role may not do this.') => new HttpError(403, 'forbidden', message);
export const notFound = (message = 'Not found.') => new HttpError(404, 'not-found', message);
export const conflict = (message: string, code = 'conflict') => new HttpError(409, code, message);
export const unprocessable = (message: string, code = 'unprocessable', fields?: Record<string, string>) =>
  new HttpError(422, code, message, fields);

/** zod issues → `{ "a.b": "message" }`, the first message per field. */
export function zodFields(err: ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of err.issues) {
    const key = issue.path.length ? issue.path.join('.') : '(body)';
    fields[key] ??= issue.message;
  }
  return fields;
}

export const notFoundHandler: RequestHandler = (req, _res, next) => {
  next(notFound(`No such endpoint: ${req.method} ${req.originalUrl.split('?')[0]}`));
};

/** The one error middleware: every error leaves as `{ error: { code, message, fields? } }`. */
export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  let status = 500;
  let body: { code: string; message: string; fields?: Record<string, string> } = {
    code: 'internal',
    message: 'Something went wrong on our side; it has been logged.',
  };
  if (err instanceof HttpError) {
    status = err.status;
    body = { code: err.code, message: err.message, ...(err.fields ? { fields: err.fields } : {}) };
  } else if (err instanceof ZodError) {
    const fields = zodFields(err);
    status = 400;
    body = { code: 'invalid-input', message: describeFields(fields), fields };
  } else if (err instanceof ThermalInputError) {
    status = 422;
    body = { code: err.code, message: err.message, ...(err.field ? { fields: { [err.field]: err.message } } : {}) };
  } else if (isBodyParserError(err)) {
    status = err.status;
    body = {
      code: err.type === 'entity.too.large' ? 'too-large' : 'malformed-body',
      message: err.type === 'entity.too.large' ? 'The request body is too large.' : 'The request body is not valid JSON.',
    };
  } else if (isDatabaseUnavailable(err)) {
    status = 503;
    body = { code: 'unavailable', message: DATABASE_UNAVAILABLE_MESSAGE };
    if (!res.headersSent) res.setHeader('Retry-After', '30');
    console.error(`[error] ${req.method} ${req.originalUrl}: database unavailable (${rootMessage(err)})`);
  } else {
    console.error(`[error] ${req.method} ${req.originalUrl}`, err);
  }
  if (res.headersSent) return;
  res.status(status).json({ error: body });
};

function describeFields(fields: Record<string, string>): string {
  const entries = Object.entries(fields);
  const first = entries[0];
  if (!first) return 'The request is not valid.';
  const more = entries.length > 1 ? ` (and ${entries.length - 1} more)` : '';
  return `${first[0]}: ${first[1]}${more}`;
}

function isBodyParserError(err: unknown): err is { status: number; type: string } {
  return (
    typeof err === 'object' && err !== null && 'type' in err && 'status' in err &&
    typeof (err as { status: unknown }).status === 'number' && (err as { status: number }).status < 500
  );
}
