import type { Charge, PaymentIntent, Refund, StripeEvent } from './objects';

/** One webhook delivery attempt, kept so tests and a curious developer can see what happened. */
export interface DeliveryAttempt {
  eventId: string;
  type: string;
  attempt: number;
  status?: number;
  error?: string;
  at: Date;
}

/** A response remembered under an idempotency key: replayed byte for byte on a retry. */
export interface SavedResponse {
  fingerprint: string;
  /** the Request-Id of the first answer, sent again as Original-Request on a replay */
  requestId: string;
  status: number;
  body: unknown;
}

/**
 * Everything the fake knows, in memory: a restart forgets it, like a fresh Stripe test account.
 * Exposed by createStripeFake() so tests can look inside without another endpoint.
 */
export class StripeFakeState {
  readonly paymentIntents = new Map<string, PaymentIntent>();
  readonly charges = new Map<string, Charge>();
  readonly refunds = new Map<string, Refund>();
  /** in creation order; the list endpoint reverses it */
  readonly events: StripeEvent[] = [];
  readonly deliveries: DeliveryAttempt[] = [];
  /** keyed by `${apiKey} ${idempotencyKey}`: Stripe scopes keys to the account's key */
  readonly idempotency = new Map<string, SavedResponse>();

  clear() {
    this.paymentIntents.clear();
    this.charges.clear();
    this.refunds.clear();
    this.events.length = 0;
    this.deliveries.length = 0;
    this.idempotency.clear();
  }
}
