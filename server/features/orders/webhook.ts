/**
 * `POST /api/payments/webhook`: the only way money state changes. The signature is verified on the
 * raw body; every event is recorded once (a replay changes nothing); a succeeded deposit creates the
 * order exactly once, after checking amount and currency against what was asked.
 *
 * An event is recorded and applied in ONE transaction, with the e-mail it causes: when applying it
 * fails, nothing is recorded, the service gets a 5xx and its retry does the work.
 */
import { and, eq, inArray, sql } from 'drizzle-orm';
import type Stripe from 'stripe';
import { HttpError } from '../../lib/errors';
import type { Executor } from '../../lib/sql-adapter';
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
  return deps.db.transaction(async (tx) => {
    // a concurrent delivery of the same id waits here on the primary key until this one ends
    if (!(await repo.recordPaymentEvent(tx, event.id, event.type, event))) return 'replay';
    const outcome = await dispatch(deps, tx, event);
    await repo.setPaymentEventOutcome(tx, event.id, outcome);
    return outcome;
  });
}

async function dispatch(deps: OrderDeps, tx: Executor, event: Stripe.Event): Promise<string> {
  switch (event.type) {
    case 'payment_intent.succeeded':
      return depositPaid(deps, tx, event.data.object);
    case 'payment_intent.payment_failed':
      return depositFailed(deps, tx, event.data.object);
    case 'payment_intent.canceled':
      return setAcceptance(tx, event.data.object.id, 'canceled', null);
    case 'charge.refunded':
      return refunded(deps, tx, event.data.object);
    default:
      return 'ignored';
  }
}

async function depositPaid(deps: OrderDeps, tx: Executor, intent: Stripe.PaymentIntent): Promise<string> {
  const acceptance = await repo.findAcceptanceByIntent(tx, intent.id);
  if (!acceptance) return 'unknown-intent';
  if (acceptance.status === 'paid') return 'already-paid';
  const received = intent.amount_received ?? intent.amount;
  if (received !== acceptance.amountMinor || intent.currency.toUpperCase() !== acceptance.currency.toUpperCase()) {
    console.error(`[payments] ${intent.id}: paid ${received} ${intent.currency}, asked ${acceptance.amountMinor} ${acceptance.currency}`);
    return 'amount-mismatch';
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
  if (!order) return 'already-ordered';
  await tx.update(repo.acceptances).set({ status: 'paid', lastError: null }).where(eqId(acceptance.id));
  await quoteRepo.updateQuoteAtVersion(tx, acceptance.quoteId, quote.version, { status: 'ordered' });
  await quoteRepo.insertEvent(tx, { quoteId: acceptance.quoteId, actorId: null, kind: 'ordered', message: `Deposit received; order ${number}.` });
  await repo.addEvent(tx, order.id, null, 'deposit-paid', 'Deposit received.', { paymentIntentId: intent.id });
  await notifyPaid(deps, tx, order.id);
  return 'order-created';
}

async function depositFailed(deps: OrderDeps, tx: Executor, intent: Stripe.PaymentIntent): Promise<string> {
  const message = intent.last_payment_error?.message ?? 'The card was declined.';
  const outcome = await setAcceptance(tx, intent.id, 'payment-failed', message);
  if (outcome === 'updated') await notifyPaymentFailed(deps, tx, intent.id, message);
  return outcome;
}

async function setAcceptance(tx: Executor, intentId: string, status: 'payment-failed' | 'canceled', lastError: string | null) {
  const rows = await tx
    .update(repo.acceptances)
    .set({ status, lastError })
    .where(andIntentUnpaid(intentId))
    .returning({ id: repo.acceptances.id });
  return rows.length ? 'updated' : 'no-open-acceptance';
}

/** The refund completes a cancellation: cancelOrder (service.ts) decided it, the refund job asked for it. */
async function refunded(deps: OrderDeps, tx: Executor, charge: Stripe.Charge): Promise<string> {
  const intentId = typeof charge.payment_intent === 'string' ? charge.payment_intent : charge.payment_intent?.id;
  if (!intentId) return 'no-intent';
  const acceptance = await repo.findAcceptanceByIntent(tx, intentId);
  if (!acceptance) return 'unknown-intent';
  const rows = await tx
    .update(repo.orders)
    .set({ refundedMinor: charge.amount_refunded, refundStatus: 'refunded', refundError: null, updatedAt: sql`now()` })
    .where(eqAcceptance(acceptance.id))
    .returning({ id: repo.orders.id });
  if (!rows[0]) return 'no-order';
  await repo.addEvent(tx, rows[0].id, null, 'cancelled', `Refund of ${charge.amount_refunded} ${charge.currency.toUpperCase()} (minor units) completed.`);
  await notifyRefunded(deps, tx, rows[0].id);
  return 'refund-recorded';
}

const eqId = (id: string) => eq(repo.acceptances.id, id);
const eqAcceptance = (id: string) => eq(repo.orders.acceptanceId, id);
const andIntentUnpaid = (intentId: string) =>
  and(eq(repo.acceptances.paymentIntentId, intentId), inArray(repo.acceptances.status, ['awaiting-payment', 'payment-failed']));
