/**
 * E-mail about orders: receipts, payment problems, steps the customer should know of, refunds. Each
 * takes the transaction of the change it reports: the message is queued with it or not at all. Mail
 * about money also goes to the billing contact given at acceptance.
 */
import { poLabel } from '../../../shared/format';
import { CUSTOMER_EMAIL_STEPS, ORDER_STATUS_LABEL, type OrderStatus } from '../../../shared/schemas/orders';
import { money } from '../quotes/notify';
import type { Executor } from '../../lib/sql-adapter';
import * as quoteRepo from '../quotes/repository';
import type { OrderDeps } from './deps';
import * as repo from './repository';

const SIGNATURE = '\n\nAlder Creek Thermal Works · Bundlesmith';
const orderLink = (deps: OrderDeps, id: string) => `${deps.config.APP_URL}/orders/${id}`;

/**
 * Who hears about money (receipts, a failed deposit, refunds): the buyer who accepted, the quote's
 * submitter and the billing contact given at acceptance, each once (case-insensitive).
 */
async function billingRecipients(tx: Executor, paymentIntentId: string, ...people: (string | undefined)[]): Promise<string[]> {
  const acceptance = await repo.findAcceptanceByIntent(tx, paymentIntentId);
  const billing = (acceptance?.billingContact as { email?: string } | undefined)?.email;
  const seen = new Map<string, string>();
  for (const email of [...people, billing]) if (email && !seen.has(email.toLowerCase())) seen.set(email.toLowerCase(), email);
  return [...seen.values()];
}


export async function notifyPaid(deps: OrderDeps, tx: Executor, orderId: string) {
  const o = (await repo.findOrder(tx, orderId))!;
  const balance = o.totalMinor - o.depositMinor;
  const submitter = (await quoteRepo.findQuote(tx, o.quoteId))?.submittedByEmail;
  for (const to of await billingRecipients(tx, o.paymentIntentId, o.buyerEmail, submitter)) {
    await deps.mailer.send({
      to,
      subject: `Receipt: deposit for order ${o.number}`,
      text:
        `Hello,\n\nWe received the deposit of ${money(o.depositMinor, o.currency)} for order ${o.number} of ${o.organizationName} ` +
        `(offer ${o.quoteNumber}, ${poLabel(o.poNumber)}).\nOrder total ${money(o.totalMinor, o.currency)}; balance due before shipment ` +
        `${money(balance, o.currency)}.\n\nFollow the order here: ${orderLink(deps, orderId)}${SIGNATURE}`,
    }, tx);
  }
  for (const email of await quoteRepo.staffEmails(tx, 'sales')) {
    await deps.mailer.send({
      to: email,
      subject: `Deposit paid: order ${o.number} (${o.organizationName})`,
      text: `${o.organizationName} paid the deposit for ${o.quoteNumber}. Release order ${o.number} to the shop: ${orderLink(deps, orderId)}${SIGNATURE}`,
    }, tx);
  }
}

export async function notifyPaymentFailed(deps: OrderDeps, tx: Executor, intentId: string, reason: string) {
  const acceptance = await repo.findAcceptanceByIntent(tx, intentId);
  if (!acceptance) return;
  const quote = await quoteRepo.findQuote(tx, acceptance.quoteId);
  if (!quote) return;
  for (const to of await billingRecipients(tx, intentId, quote.submittedByEmail)) {
    await deps.mailer.send({
      to,
      subject: `Deposit for ${quote.number} not paid`,
      text: `The deposit payment for ${quote.number} did not go through: ${reason}\nThe acceptance stands; pay again from the offer page: ${deps.config.APP_URL}/quotes/${quote.id}${SIGNATURE}`,
    }, tx);
  }
}

/**
 * The e-mail of a step the customer hears of (shared CUSTOMER_EMAIL_STEPS: the shop board asks before
 * such a move). `note` is the step's customer note only: staff notes never reach this e-mail.
 */
export async function notifyStep(deps: OrderDeps, tx: Executor, orderId: string, status: OrderStatus, note?: string | null) {
  if (!CUSTOMER_EMAIL_STEPS.includes(status)) return;
  const o = (await repo.findOrder(tx, orderId))!;
  await deps.mailer.send({
    to: o.buyerEmail,
    subject: `Order ${o.number}: ${ORDER_STATUS_LABEL[status]}`,
    text: `Hello ${o.buyerName},\n\nYour order ${o.number} is now at: ${ORDER_STATUS_LABEL[status]}.${note ? `\n\n${note}` : ''}\n\n${orderLink(deps, orderId)}${SIGNATURE}`,
  }, tx);
}

export async function notifyRefunded(deps: OrderDeps, tx: Executor, orderId: string) {
  const o = (await repo.findOrder(tx, orderId))!;
  const submitter = (await quoteRepo.findQuote(tx, o.quoteId))?.submittedByEmail;
  for (const to of await billingRecipients(tx, o.paymentIntentId, o.buyerEmail, submitter)) {
    await deps.mailer.send({
      to,
      subject: `Refund for cancelled order ${o.number}`,
      text: `We refunded ${money(o.refundedMinor, o.currency)} of the deposit for order ${o.number} of ${o.organizationName}.${SIGNATURE}`,
    }, tx);
  }
}
