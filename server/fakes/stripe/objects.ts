/**
 * The stored objects, shaped like Stripe's API objects (a subset of their fields, same names and
 * meanings), so the JSON the SDK hands the app looks like what production returns.
 */
export type Metadata = Record<string, string>;

export type PaymentIntentStatus =
  | 'requires_payment_method'
  | 'requires_confirmation'
  | 'requires_action'
  | 'processing'
  | 'requires_capture'
  | 'canceled'
  | 'succeeded';

export interface PaymentError {
  type: 'card_error';
  code: string;
  decline_code: string;
  message: string;
  charge: string;
  doc_url: string;
  payment_method: { id: string; object: 'payment_method'; type: 'card'; card: CardSummary };
}

export interface CardSummary {
  brand: string;
  last4: string;
}

export interface PaymentIntent {
  id: string;
  object: 'payment_intent';
  amount: number;
  amount_capturable: number;
  amount_received: number;
  automatic_payment_methods: { enabled: boolean; allow_redirects?: 'always' | 'never' } | null;
  canceled_at: number | null;
  cancellation_reason: string | null;
  capture_method: 'automatic_async';
  client_secret: string;
  confirmation_method: 'automatic';
  created: number;
  currency: string;
  customer: string | null;
  description: string | null;
  last_payment_error: PaymentError | null;
  latest_charge: string | null;
  livemode: false;
  metadata: Metadata;
  next_action: null;
  payment_method: string | null;
  payment_method_types: string[];
  receipt_email: string | null;
  status: PaymentIntentStatus;
}

export interface Charge {
  id: string;
  object: 'charge';
  amount: number;
  amount_captured: number;
  amount_refunded: number;
  captured: boolean;
  created: number;
  currency: string;
  description: string | null;
  failure_code: string | null;
  failure_message: string | null;
  livemode: false;
  metadata: Metadata;
  outcome: { network_status: string; reason: string | null; seller_message: string; type: string };
  paid: boolean;
  payment_intent: string;
  payment_method: string;
  payment_method_details: { type: 'card'; card: CardSummary };
  refunded: boolean;
  status: 'succeeded' | 'failed';
}

export interface Refund {
  id: string;
  object: 'refund';
  amount: number;
  charge: string;
  created: number;
  currency: string;
  metadata: Metadata;
  payment_intent: string;
  reason: string | null;
  status: 'succeeded';
}

export type EventType =
  | 'payment_intent.succeeded'
  | 'payment_intent.payment_failed'
  | 'payment_intent.canceled'
  | 'charge.refunded';

export interface StripeEvent {
  id: string;
  object: 'event';
  api_version: string;
  created: number;
  data: { object: PaymentIntent | Charge };
  livemode: false;
  pending_webhooks: number;
  request: { id: string | null; idempotency_key: string | null };
  type: EventType;
}

/** Where a state change came from, copied into the event's `request` as Stripe does. */
export interface RequestOrigin {
  id: string | null;
  idempotencyKey: string | null;
}

export const NO_REQUEST: RequestOrigin = { id: null, idempotencyKey: null };
