import type { Response } from 'express';
import type { RequestOrigin } from '../objects';

/** The request id and idempotency key of the API call that caused an event (event.request). */
export const originOf = (res: Response): RequestOrigin => ({
  id: typeof res.locals.requestId === 'string' ? res.locals.requestId : null,
  idempotencyKey: typeof res.locals.idempotencyKey === 'string' ? res.locals.idempotencyKey : null,
});
