import { badParam, noSuch, StripeFakeError, unexpectedState } from './errors';
import { newId, randomToken, unixNow } from './ids';
import type { Charge, Metadata, PaymentError, PaymentIntent, RequestOrigin } from './objects';
import type { StripeFakeState } from './state';
import { TEST_CARDS } from './test-cards';
import type { WebhookSender } from './webhooks';

/**
 * The PaymentIntent life cycle, shared by the API routes and the hosted test page. Card payments
 * settle at once here (no 3-D Secure, no `processing`): confirm goes straight to succeeded or back to
 * requires_payment_method with last_payment_error, which is what Stripe's test cards do.
 */
export interface Ledger {
  state: StripeFakeState;
  webhooks: WebhookSender;
}

export interface CreateIntentInput {
  amount: number;
  currency: string;
  metadata?: Metadata;
  description?: string;
  receipt_email?: string;
  automatic_payment_methods?: { enabled: boolean; allow_redirects?: 'always' | 'never' };
  payment_method_types?: string[];
}

export function createIntent({ state }: Ledger, input: CreateIntentInput): PaymentIntent {
  const id = newId('pi');
  const intent: PaymentIntent = {
    id,
    object: 'payment_intent',
    amount: input.amount,
    amount_capturable: 0,
    amount_received: 0,
    automatic_payment_methods: input.automatic_payment_methods ?? null,
    canceled_at: null,
    cancellation_reason: null,
    capture_method: 'automatic_async',
    client_secret: `${id}_secret_${randomToken(25)}`,
    confirmation_method: 'automatic',
    created: unixNow(),
    currency: input.currency,
    customer: null,
    description: input.description ?? null,
    last_payment_error: null,
    latest_charge: null,
    livemode: false,
    metadata: input.metadata ?? {},
    next_action: null,
    payment_method: null,
    payment_method_types: input.payment_method_types ?? ['card'],
    receipt_email: input.receipt_email ?? null,
    status: 'requires_payment_method',
  };
  state.paymentIntents.set(id, intent);
  return intent;
}

export function getIntent({ state }: Ledger, id: string, param = 'intent'): PaymentIntent {
  const intent = state.paymentIntents.get(id);
  if (!intent) throw noSuch('payment_intent', id, param);
  return intent;
}

/** Confirms with a test PaymentMethod; a decline throws the 402 card_error Stripe sends. */
export function confirmIntent(ledger: Ledger, id: string, paymentMethod: string | undefined, origin: RequestOrigin): PaymentIntent {
  const intent = getIntent(ledger, id);
  if (intent.status === 'succeeded') {
    throw unexpectedState('You cannot confirm this PaymentIntent because it has already succeeded after being previously confirmed.');
  }
  if (intent.status === 'canceled') {
    throw unexpectedState('You cannot confirm this PaymentIntent because it has a status of canceled.');
  }
  const pmName = paymentMethod ?? intent.payment_method ?? undefined;
  if (!pmName) {
    throw badParam('You cannot confirm this PaymentIntent because it\'s missing a payment method. Pass payment_method.', 'payment_method', 'parameter_missing');
  }
  const card = TEST_CARDS[pmName];
  if (!card) throw badParam(`No such PaymentMethod: '${pmName}'`, 'payment_method', 'resource_missing');

  const pmId = newId('pm');
  const charge = createCharge(ledger, intent, pmId, card.brand, card.last4, card.decline);
  intent.payment_method = pmId;
  intent.latest_charge = charge.id;
  if (!card.decline) {
    intent.status = 'succeeded';
    intent.amount_received = intent.amount;
    intent.last_payment_error = null;
    ledger.webhooks.emit('payment_intent.succeeded', intent, origin);
    return intent;
  }
  const error: PaymentError = {
    type: 'card_error',
    code: card.decline.code,
    decline_code: card.decline.decline_code,
    message: card.decline.message,
    charge: charge.id,
    doc_url: 'https://stripe.com/docs/error-codes/card-declined',
    payment_method: { id: pmId, object: 'payment_method', type: 'card', card: { brand: card.brand, last4: card.last4 } },
  };
  // Stripe detaches the failed method so the buyer must choose another one
  intent.status = 'requires_payment_method';
  intent.payment_method = null;
  intent.last_payment_error = error;
  ledger.webhooks.emit('payment_intent.payment_failed', intent, origin);
  throw new StripeFakeError(402, { ...error, payment_intent: structuredClone(intent) });
}

const CANCELABLE = new Set(['requires_payment_method', 'requires_capture', 'requires_confirmation', 'requires_action', 'processing']);

export function cancelIntent(ledger: Ledger, id: string, reason: string | undefined, origin: RequestOrigin): PaymentIntent {
  const intent = getIntent(ledger, id);
  if (!CANCELABLE.has(intent.status)) {
    throw unexpectedState(
      `You cannot cancel this PaymentIntent because it has a status of ${intent.status}. Only a PaymentIntent with one of the following statuses may be canceled: ${[...CANCELABLE].join(', ')}.`,
    );
  }
  intent.status = 'canceled';
  intent.canceled_at = unixNow();
  intent.cancellation_reason = reason ?? null;
  ledger.webhooks.emit('payment_intent.canceled', intent, origin);
  return intent;
}

function createCharge(
  { state }: Ledger,
  intent: PaymentIntent,
  pmId: string,
  brand: string,
  last4: string,
  decline: { code: string; decline_code: string; message: string } | undefined,
): Charge {
  const charge: Charge = {
    id: newId('ch'),
    object: 'charge',
    amount: intent.amount,
    amount_captured: decline ? 0 : intent.amount,
    amount_refunded: 0,
    captured: !decline,
    created: unixNow(),
    currency: intent.currency,
    description: intent.description,
    failure_code: decline?.code ?? null,
    failure_message: decline?.message ?? null,
    livemode: false,
    metadata: { ...intent.metadata },
    outcome: decline
      ? { network_status: 'declined_by_network', reason: decline.decline_code, seller_message: 'The bank did not return any further details with this decline.', type: 'issuer_declined' }
      : { network_status: 'approved_by_network', reason: null, seller_message: 'Payment complete.', type: 'authorized' },
    paid: !decline,
    payment_intent: intent.id,
    payment_method: pmId,
    payment_method_details: { type: 'card', card: { brand, last4 } },
    refunded: false,
    status: decline ? 'failed' : 'succeeded',
  };
  state.charges.set(charge.id, charge);
  return charge;
}
