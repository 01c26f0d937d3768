/**
 * The buyer accepts an approved, unexpired offer: PO number, billing contact, delivery address.
 * A PaymentIntent for the deposit is created (idempotency key per acceptance); the browser is sent
 * to pay. Only the verified webhook moves money state (webhook.ts). The payment service is asked
 * before anything is stored: when it is down the buyer gets a 503 (nothing charged) and the quote
 * stays approved, with no acceptance.
 */
import { poLabel } from '../../../shared/format';
import type { SessionUser } from '../../../shared/schemas/auth';
import { acceptQuoteSchema, type AcceptResult } from '../../../shared/schemas/orders';
import { parse } from '../../lib/validate';
import { HttpError } from '../../lib/errors';
import { assertChargeable, depositMinor, paymentCall } from '../../lib/payments';
import { getPriceBookVersion } from '../pricing/repository';
import * as quoteRepo from '../quotes/repository';
import { loadVisible } from '../quotes/service';
import type { OrderDeps } from './deps';
import * as repo from './repository';

/**
 * The body is read only for a first acceptance; an accepted, unpaid quote keeps the details it was
 * accepted with, and the call just hands out the same payment again.
 */
export async function acceptQuote(deps: OrderDeps, buyer: SessionUser, quoteId: string, body: unknown): Promise<AcceptResult> {
  const quote = await loadVisible(deps, buyer, quoteId);
  if (quote.status === 'accepted') return retryPayment(deps, quoteId);
  const input = parse(acceptQuoteSchema, body);
  if (quote.status !== 'approved') {
    throw new HttpError(409, 'wrong-status', `Only an approved offer can be accepted; this quote is ${quote.status}.`);
  }
  if (quote.validUntil && new Date(quote.validUntil) < new Date()) {
    throw new HttpError(409, 'offer-expired', 'This offer has expired; ask for a revised offer with "Request a change".');
  }
  const revision = (await quoteRepo.findRevision(deps.db, quoteId, quote.currentRevision))!;
  const book = await getPriceBookVersion(deps.db, revision.priceBookVersion);
  const total = revision.data.price.total_minor;
  const deposit = depositMinor(total, book.deposit_pct);
  assertChargeable(deposit, revision.data.price.currency);
  const acceptanceId = crypto.randomUUID();
  const intent = await paymentCall(() => deps.stripe.paymentIntents.create(
    {
      amount: deposit,
      currency: revision.data.price.currency.toLowerCase(),
      automatic_payment_methods: { enabled: true },
      description: `Deposit for ${quote.number} revision ${revision.number}`,
      metadata: { quoteId, quoteNumber: quote.number, revision: String(revision.number), acceptanceId },
    },
    { idempotencyKey: `accept-${acceptanceId}` },
  ));
  await deps.db.transaction(async (tx) => {
    const ok = await quoteRepo.updateQuoteAtVersion(tx, quoteId, quote.version, { status: 'accepted' });
    if (!ok) throw new HttpError(409, 'stale-version', 'The offer changed while you accepted it; reload and try again.');
    await tx.insert(repo.acceptances).values({
      id: acceptanceId,
      quoteId,
      revisionNumber: revision.number,
      acceptedBy: buyer.id,
      poNumber: input.poNumber,
      billingContact: input.billingContact,
      deliveryAddress: input.deliveryAddress,
      paymentIntentId: intent.id,
      amountMinor: deposit,
      currency: revision.data.price.currency,
    });
    await quoteRepo.insertEvent(tx, { quoteId, actorId: buyer.id, kind: 'accepted', message: `Accepted with ${poLabel(input.poNumber)}; deposit requested.` });
  });
  return paymentResult(deps, quoteId, intent.id, intent.client_secret ?? '', deposit, revision.data.price.currency);
}

/** Accepted but not paid (a declined card, a closed tab): the same PaymentIntent, paid again. */
async function retryPayment(deps: OrderDeps, quoteId: string): Promise<AcceptResult> {
  const open = await repo.openAcceptance(deps.db, quoteId);
  if (!open) throw new HttpError(409, 'wrong-status', 'This offer is accepted and its deposit is being processed.');
  const intent = await paymentCall(() => deps.stripe.paymentIntents.retrieve(open.paymentIntentId));
  return paymentResult(deps, quoteId, intent.id, intent.client_secret ?? '', open.amountMinor, open.currency);
}

function paymentResult(deps: OrderDeps, quoteId: string, id: string, clientSecret: string, amount: number, currency: string): AcceptResult {
  const returnUrl = `${deps.config.APP_URL}/quotes/${quoteId}?payment=returned`;
  const base = deps.config.STRIPE_PAY_URL;
  return {
    paymentIntentId: id,
    clientSecret,
    amount_minor: amount,
    currency,
    paymentUrl: base ? `${base}/pay/${id}?return_url=${encodeURIComponent(returnUrl)}` : returnUrl,
  };
}
