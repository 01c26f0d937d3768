/**
 * `POST /api/payments/webhook`: the only way money state changes. The signature is verified on the
 * raw body; every event is recorded once (a replay changes nothing); a succeeded deposit creates the
 * order exactly once, after checking amount and currency against what was asked.
 */
import { and, eq, inArray } from 'drizzle-orm';
import type Stripe from 'stripe';
import { HttpError } from '../../lib/errors';
import * as quoteRepo from '../quotes/repository';
import type { OrderDeps } from './deps';
import { notifyPaid, notifyPaymentFailed, notifyRefunded } from './notify';
import * as repo from './repository';

export function verifyEvent(deps: OrderDeps, rawBody: Buffer | undefined, signature: string | undefined): Stripe.Event {
  if (!rawBody || !signature) throw new HttpError(400, 'bad-signature', 'Missing body or Stripe-Signature header.');
  try {
    return deps.stripe.webhooks.constructEvent(rawBody, signature, deps.config.STRIPE_WEBHOOK_SECRET);
  } catch (err) {
    throw new HttpError(400, 'bad-signature', `Webhook signature rejected: ${(err as Error).message}`);
  }
}

export async function handleEvent(deps: OrderDeps, event: Stripe.Event): Promise<string> {
  if (!(await repo.recordPaymentEvent(deps.db, event.id, event.type, event))) return 'replay';
  const outcome = await dispatch(deps, event);
  await repo.setPaymentEventOutcome(deps.db, event.id, outcome);
  return outcome;
}

async function dispatch(deps: OrderDeps, event: Stripe.Event): Promise<string> {
  switch (event.type) {
    case 'payment_intent.succeeded':
      return depositPaid(deps, event.data.object);
    case 'payment_intent.payment_failed':
      return depositFailed(deps, event.data.object);
    case 'payment_intent.canceled':
      return setAcceptance(deps, event.data.object.id, 'canceled', null);
    case 'charge.refunded':
      return refunded(deps, event.data.object);
    default:
      return 'ignored';
  }
}

async function depositPaid(deps: OrderDeps, intent: Stripe.PaymentIntent): Promise<string> {
  const result = await deps.db.transaction(async (tx) => {
    const acceptance = await repo.findAcceptanceByIntent(tx, intent.id);
    if (!acceptance) return { outcome: 'unknown-intent' as const };
    if (acceptance.status === 'paid') return { outcome: 'already-paid' as const };
    const received = intent.amount_received ?? intent.amount;
    if (received !== acceptance.amountMinor || intent.currency.toUpperCase() !== acceptance.currency.toUpperCase()) {
      console.error(`[payments] ${intent.id}: paid ${received} ${intent.currency}, asked ${acceptance.amountMinor} ${acceptance.currency}`);
      return { outcome: 'amount-mismatch' as const };
    }
    const quote = (await quoteRepo.findQuote(tx, acceptance.quoteId))!;
    const number = await repo.nextOrderNumber(tx);
    const [order] = await tx
      .insert(repo.orders)
      .values({
        number,
        quoteId: acceptance.quoteId,
        acceptanceId: acceptance.id,
        organizationId: quote.organizationId,
        revisionNumber: acceptance.revisionNumber,
        status: 'deposit-paid',
        totalMinor: quote.priceTotal_minor,
        depositMinor: acceptance.amountMinor,
        currency: acceptance.currency,
      })
      .onConflictDoNothing()
      .returning({ id: repo.orders.id });
    if (!order) return { outcome: 'already-ordered' as const };
    await tx.update(repo.acceptances).set({ status: 'paid', lastError: null }).where(eqId(acceptance.id));
    await quoteRepo.updateQuoteAtVersion(tx, acceptance.quoteId, quote.version, { status: 'ordered' });
    await quoteRepo.insertEvent(tx, { quoteId: acceptance.quoteId, actorId: null, kind: 'ordered', message: `Deposit received; order ${number}.` });
    await repo.addEvent(tx, order.id, null, 'deposit-paid', 'Deposit received.', { paymentIntentId: intent.id });
    return { outcome: 'order-created' as const, orderId: order.id };
  });
  if (result.outcome === 'order-created') await notifyPaid(deps, result.orderId);
  return result.outcome;
}

async function depositFailed(deps: OrderDeps, intent: Stripe.PaymentIntent): Promise<string> {
  const message = intent.last_payment_error?.message ?? 'The card was declined.';
  const outcome = await setAcceptance(deps, intent.id, 'payment-failed', message);
  if (outcome === 'updated') await notifyPaymentFailed(deps, intent.id, message);
  return outcome;
}

async function setAcceptance(deps: OrderDeps, intentId: string, status: 'payment-failed' | 'canceled', lastError: string | null) {
  const rows = await deps.db
    .update(repo.acceptances)
    .set({ status, lastError })
    .where(andIntentUnpaid(intentId))
    .returning({ id: repo.acceptances.id });
  return rows.length ? 'updated' : 'no-open-acceptance';
}

/** The refund completes a cancellation started by cancelOrder (service.ts). */
async function refunded(deps: OrderDeps, charge: Stripe.Charge): Promise<string> {
  const intentId = typeof charge.payment_intent === 'string' ? charge.payment_intent : charge.payment_intent?.id;
  if (!intentId) return 'no-intent';
  const acceptance = await repo.findAcceptanceByIntent(deps.db, intentId);
  if (!acceptance) return 'unknown-intent';
  const rows = await deps.db
    .update(repo.orders)
    .set({ refundedMinor: charge.amount_refunded })
    .where(eqAcceptance(acceptance.id))
    .returning({ id: repo.orders.id });
  if (rows[0]) {
    await repo.addEvent(deps.db, rows[0].id, null, 'cancelled', `Refund of ${charge.amount_refunded} ${charge.currency.toUpperCase()} (minor units) completed.`);
    await notifyRefunded(deps, rows[0].id);
  }
  return rows.length ? 'refund-recorded' : 'no-order';
}

const eqId = (id: string) => eq(repo.acceptances.id, id);
const eqAcceptance = (id: string) => eq(repo.orders.acceptanceId, id);
const andIntentUnpaid = (intentId: string) =>
  and(eq(repo.acceptances.paymentIntentId, intentId), inArray(repo.acceptances.status, ['awaiting-payment', 'payment-failed']));
