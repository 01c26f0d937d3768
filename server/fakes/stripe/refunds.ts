import { badParam, invalidRequest, noSuch } from './errors';
import { newId, unixNow } from './ids';
import type { Metadata, RequestOrigin, Refund } from './objects';
import { getIntent, type Ledger } from './payment-intents';

export interface CreateRefundInput {
  payment_intent?: string;
  charge?: string;
  amount?: number;
  reason?: string;
  metadata?: Metadata;
}

/**
 * Refunds the intent's successful charge, in full or in part. Refunds settle at once (status
 * succeeded) and each one sends `charge.refunded` with the updated charge, as Stripe does for
 * partial refunds too; `charge.refunded: true` only once nothing is left.
 */
export function createRefund(ledger: Ledger, input: CreateRefundInput, origin: RequestOrigin): Refund {
  if (!input.payment_intent && !input.charge) {
    throw badParam('One of the following params should be provided for this request: payment_intent or charge.', 'payment_intent', 'parameter_missing');
  }
  const chargeId = input.charge ?? getIntent(ledger, input.payment_intent!, 'payment_intent').latest_charge;
  const charge = chargeId ? ledger.state.charges.get(chargeId) : undefined;
  if (input.charge && !charge) throw noSuch('charge', input.charge, 'charge');
  if (!charge || charge.status !== 'succeeded') {
    throw invalidRequest(
      `This PaymentIntent (${input.payment_intent ?? charge?.payment_intent}) does not have a successful charge to refund.`,
      { code: 'charge_not_refundable' },
    );
  }
  const left = charge.amount_captured - charge.amount_refunded;
  if (left <= 0) {
    throw invalidRequest(`Charge ${charge.id} has already been refunded.`, { code: 'charge_already_refunded' });
  }
  const amount = input.amount ?? left;
  if (amount > left) {
    throw invalidRequest(
      `Refund amount (${amount}) is greater than unrefunded amount on charge (${left}).`,
      { code: 'amount_too_large', param: 'amount' },
    );
  }
  const refund: Refund = {
    id: newId('re'),
    object: 'refund',
    amount,
    charge: charge.id,
    created: unixNow(),
    currency: charge.currency,
    metadata: input.metadata ?? {},
    payment_intent: charge.payment_intent,
    reason: input.reason ?? null,
    status: 'succeeded',
  };
  ledger.state.refunds.set(refund.id, refund);
  charge.amount_refunded += amount;
  charge.refunded = charge.amount_refunded === charge.amount_captured;
  ledger.webhooks.emit('charge.refunded', charge, origin);
  return refund;
}
