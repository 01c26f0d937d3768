import Stripe from 'stripe';
import { newId, unixNow } from './ids';
import type { Charge, EventType, PaymentIntent, RequestOrigin, StripeEvent } from './objects';
import type { StripeFakeState } from './state';

export interface WebhookOptions {
  /** where events are POSTed; without it events are only listed by GET /v1/events */
  url?: string;
  secret: string;
  /** pause before each retry; the number of entries is the number of retries */
  retryDelaysMs: readonly number[];
  /** a receiver slower than this counts as failed, like Stripe's own timeout */
  timeoutMs: number;
  log: (line: string) => void;
}

/**
 * Records events and delivers them the way Stripe does: signed JSON POSTs, re-signed on every attempt
 * (a fresh timestamp, so a retry is never "stale"), retried with back-off on a non-2xx answer or a
 * network error. Delivery runs detached from the API request that caused it: the API answers first,
 * exactly as Stripe's does, so the app cannot rely on the webhook having arrived.
 */
export class WebhookSender {
  private readonly timers = new Set<NodeJS.Timeout>();
  private readonly inFlight = new Set<AbortController>();
  private closed = false;

  constructor(
    private readonly state: StripeFakeState,
    private readonly options: WebhookOptions,
  ) {}

  /** Records the event (a snapshot of the object now) and starts its delivery; returns at once. */
  emit(type: EventType, object: PaymentIntent | Charge, origin: RequestOrigin): StripeEvent {
    const event: StripeEvent = {
      id: newId('evt'),
      object: 'event',
      api_version: Stripe.API_VERSION,
      created: unixNow(),
      data: { object: structuredClone(object) },
      livemode: false,
      pending_webhooks: this.options.url ? 1 : 0,
      request: { id: origin.id, idempotency_key: origin.idempotencyKey },
      type,
    };
    this.state.events.push(event);
    if (this.options.url && !this.closed) void this.attempt(event, this.options.url, 1);
    return event;
  }

  /** Stops retries and aborts deliveries in flight (tests, shutdown). */
  close() {
    this.closed = true;
    for (const t of this.timers) clearTimeout(t);
    this.timers.clear();
    for (const c of this.inFlight) c.abort();
    this.inFlight.clear();
  }

  private async attempt(event: StripeEvent, url: string, attempt: number): Promise<void> {
    const payload = JSON.stringify(event, null, 2);
    const header = Stripe.webhooks.generateTestHeaderString({ payload, secret: this.options.secret });
    const controller = new AbortController();
    this.inFlight.add(controller);
    const timeout = setTimeout(() => controller.abort(), this.options.timeoutMs);
    let status: number | undefined;
    let error: string | undefined;
    try {
      const res = await fetch(url, {
        method: 'POST',
        headers: { 'content-type': 'application/json; charset=utf-8', 'stripe-signature': header },
        body: payload,
        signal: controller.signal,
      });
      status = res.status;
      await res.arrayBuffer().catch(() => undefined); // drain, so the socket is reused
    } catch (err) {
      error = err instanceof Error ? err.message : String(err);
    } finally {
      clearTimeout(timeout);
      this.inFlight.delete(controller);
    }
    if (this.closed) return;
    this.state.deliveries.push({ eventId: event.id, type: event.type, attempt, status, error, at: new Date() });
    if (status !== undefined && status >= 200 && status < 300) {
      event.pending_webhooks = 0;
      return;
    }
    const delay = this.options.retryDelaysMs[attempt - 1];
    const why = error ?? `HTTP ${status}`;
    if (delay === undefined) {
      this.options.log(`[stripe-fake] gave up delivering ${event.type} ${event.id} after ${attempt} attempts (${why})`);
      return;
    }
    this.options.log(`[stripe-fake] ${event.type} ${event.id} attempt ${attempt} failed (${why}); retrying in ${delay} ms`);
    const timer = setTimeout(() => {
      this.timers.delete(timer);
      void this.attempt(event, url, attempt + 1);
    }, delay);
    this.timers.add(timer);
  }
}
