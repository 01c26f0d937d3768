/** Review decisions: assign, approve (an offer), send back with questions, decline; the customer's change request. */
import { formatDate, plural } from '../../../shared/format';
import type { SessionUser } from '../../../shared/schemas/auth';
import type { QuoteStatus } from '../../../shared/schemas/quotes';
import { conflict, HttpError } from '../../lib/errors';
import { assertChargeable, depositMinor } from '../../lib/payments';
import { getPriceBookVersion } from '../pricing/repository';
import type { QuoteDeps } from './deps';
import { money, notifyCustomer, notifySales } from './notify';
import { assertBuildable } from './buildable';
import { activeBook } from './pricing-port';
import * as repo from './repository';
import { getQuote, loadVisible } from './service';

const OPEN: QuoteStatus[] = ['in-review', 'questions'];

function requireStatus(status: QuoteStatus, allowed: QuoteStatus[], action: string) {
  if (!allowed.includes(status)) {
    throw new HttpError(409, 'wrong-status', `A quote that is ${status} cannot be ${action}; it must be ${allowed.join(' or ')}.`);
  }
}

const stale = () => conflict('Someone changed this quote since you opened it; reload it, check their change, then try again.', 'stale-version');

export async function assign(deps: QuoteDeps, user: SessionUser, id: string, version: number) {
  await loadVisible(deps, user, id);
  await deps.db.transaction(async (tx) => {
    if (!(await repo.updateQuoteAtVersion(tx, id, version, { assigneeId: user.id }))) throw stale();
    await repo.insertEvent(tx, { quoteId: id, actorId: user.id, kind: 'assigned', message: `${user.name} took this quote`, internal: true });
  });
  return getQuote(deps, user, id);
}

/** Freezes the current design and price as an offer revision, valid for the book's validity days. */
export async function approve(deps: QuoteDeps, user: SessionUser, id: string, input: { version: number; message?: string }) {
  const row = await loadVisible(deps, user, id);
  requireStatus(row.status, OPEN, 'approved');
  const current = await repo.findRevision(deps.db, id, row.currentRevision);
  const book = await activeBook(deps);
  // an offer is only made for a design that can be built as it stands (issue 12)
  assertBuildable(current!.data.design, book.data, 'approved');
  // the buyer must be able to pay the offer's deposit: at least the payment service's minimum charge
  const { deposit_pct } = await getPriceBookVersion(deps.db, current!.priceBookVersion);
  assertChargeable(depositMinor(current!.data.price.total_minor, deposit_pct), current!.data.price.currency);
  const validUntil = new Date(Date.now() + book.data.offerValidityDays * 86_400_000);
  const number = row.currentRevision + 1;
  await deps.db.transaction(async (tx) => {
    const data = {
      ...current!.data,
      number,
      kind: 'offer' as const,
      createdAt: new Date().toISOString(),
      createdBy: user.name,
      validUntil: validUntil.toISOString(),
      // the engineer's message is part of the offer: printed in its PDF and sent in its e-mail
      ...(input.message ? { message: input.message } : {}),
    };
    const ok = await repo.updateQuoteAtVersion(tx, id, input.version, {
      status: 'approved',
      currentRevision: number,
      validUntil,
      assigneeId: row.assigneeId ?? user.id,
      priceTotalMinor: data.price.total_minor,
      // the offer is what the customer sees from now on
      customerTotalMinor: data.price.total_minor,
      customerQuantity: data.price.quantity,
      customerDesignSummary: row.designSummary,
    });
    if (!ok) throw stale();
    await repo.insertRevision(tx, { quoteId: id, number, kind: 'offer', data, priceBookVersion: current!.priceBookVersion, totalMinor: data.price.total_minor, createdBy: user.id });
    await repo.insertEvent(tx, { quoteId: id, actorId: user.id, kind: 'approved', message: input.message ?? null, data: { revision: number } });
    await notifyCustomer(
      deps,
      tx,
      id,
      `Your offer ${row.number} is ready`,
      `Our engineers reviewed your request and approved offer ${row.number}, revision ${number}: ` +
        `${row.designSummary}, ${money(data.price.total_minor, row.currency)} for ${plural(data.price.quantity, 'unit')}, ` +
        `valid until ${formatDate(validUntil, { timeZone: 'UTC' })}.` +
        (input.message ? `\n\n${input.message}` : '') +
        `\n\nThe offer is attached as a PDF. Read it and accept it here:`,
      // the offer PDF, rendered from this revision when the e-mail is sent
      [{ kind: 'offer-pdf', quoteId: id, revision: number }],
    );
  });
  return getQuote(deps, user, id);
}

export async function sendBack(deps: QuoteDeps, user: SessionUser, id: string, input: { version?: number; message: string }) {
  const row = await loadVisible(deps, user, id);
  requireStatus(row.status, OPEN, 'sent back with questions');
  await deps.db.transaction(async (tx) => {
    if (!(await repo.updateQuoteAtVersion(tx, id, input.version ?? row.version, { status: 'questions', assigneeId: row.assigneeId ?? user.id }))) throw stale();
    await repo.insertEvent(tx, { quoteId: id, actorId: user.id, kind: 'questions', message: input.message });
    await notifyCustomer(deps, tx, id, `Questions about your request ${row.number}`, `${user.name} has questions before we can make an offer:\n\n${input.message}\n\nAnswer with "Request a change" on the quote:`);
  });
  return getQuote(deps, user, id);
}

export async function decline(deps: QuoteDeps, user: SessionUser, id: string, input: { version?: number; message: string }) {
  const row = await loadVisible(deps, user, id);
  requireStatus(row.status, [...OPEN, 'approved'], 'declined');
  await deps.db.transaction(async (tx) => {
    if (!(await repo.updateQuoteAtVersion(tx, id, input.version ?? row.version, { status: 'declined' }))) throw stale();
    await repo.insertEvent(tx, { quoteId: id, actorId: user.id, kind: 'declined', message: input.message });
    await notifyCustomer(deps, tx, id, `We cannot offer ${row.number}`, `We are sorry: we cannot make an offer for request ${row.number}.\n\n${input.message}`);
  });
  return getQuote(deps, user, id);
}

/** The customer's message; it reopens engineering review. */
export async function requestChange(deps: QuoteDeps, user: SessionUser, id: string, input: { version?: number; message: string }) {
  const row = await loadVisible(deps, user, id);
  requireStatus(row.status, ['in-review', 'questions', 'approved'], 'changed');
  await deps.db.transaction(async (tx) => {
    if (!(await repo.updateQuoteAtVersion(tx, id, input.version ?? row.version, { status: 'in-review' }))) throw stale();
    await repo.insertEvent(tx, { quoteId: id, actorId: user.id, kind: 'change-requested', message: input.message });
    await notifySales(deps, tx, id, row.assigneeEmail ?? undefined, `${row.organizationName} asks for a change to ${row.number}`, `${user.name} wrote:\n\n${input.message}`);
  });
  return getQuote(deps, user, id);
}
