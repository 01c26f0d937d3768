import type { SessionUser } from '../../../shared/schemas/auth';
import { customerSeesQuoteEvent } from '../../../shared/schemas/events';
import type { CreateQuoteInput, DesignChoice, ListQuotesQuery, QuoteDetail } from '../../../shared/schemas/quotes';
import { createQuoteSchema } from '../../../shared/schemas/quotes';
import { isStaff } from '../../lib/auth/guards';
import { notFound } from '../../lib/errors';
import type { QuoteDeps } from './deps';
import { notifySubmitted } from './notify';
import { keepChosen } from './chosen-design';
import { activeBook, buildRevision, priceWithBook, sizeWithBook } from './pricing-port';
import { designSummary, toDetail, toSummary } from './present';
import * as repo from './repository';

/**
 * A customer's request: sized and priced at once (nothing is stored when the duty is impossible or
 * cannot be priced), stored as quote + budget revision 1 + event + the sales e-mail in one
 * transaction. `clientKey` (the `Idempotency-Key` header) makes a retry safe: the same key from the
 * same customer answers the quote it made the first time (`created: false`), also when both
 * attempts race (the unique (submitted_by, client_key) constraint decides).
 */
export async function submitQuote(
  deps: QuoteDeps,
  customer: SessionUser,
  input: ReturnType<typeof createQuoteSchema.parse>,
  clientKey?: string,
): Promise<{ quote: QuoteDetail; created: boolean; designChoice?: DesignChoice }> {
  if (clientKey) {
    const earlier = await repo.findQuoteIdByClientKey(deps.db, customer.id, clientKey);
    if (earlier) return { quote: await getQuote(deps, customer, earlier), created: false };
  }
  const book = await activeBook(deps);
  // the design picked on the sizing page, when it is still valid (issue 12), else the recommended one and why
  const { design, alternatives, choice } = await keepChosen(deps.config, input.duty, book, await sizeWithBook(deps.config, input.duty, book), input.chosenDesign);
  const price = priceWithBook(design, book, { quantity: input.quantity, needBy: input.needBy });
  const summary = designSummary(design, input.duty);
  const store = () => deps.db.transaction(async (tx) => {
    const number = await repo.nextQuoteNumber(tx);
    const revision = buildRevision(1, 'budget', customer, input.duty, design, alternatives, price, book);
    const quoteId = await repo.insertQuote(tx, {
      number,
      organizationId: customer.organizationId,
      submittedBy: customer.id,
      status: 'in-review',
      currentRevision: 1,
      quantity: input.quantity,
      needBy: input.needBy ?? null,
      reference: input.reference ?? null,
      notes: input.notes ?? null,
      duty: input.duty,
      priceTotalMinor: price.total_minor,
      currency: price.currency,
      designSummary: summary,
      customerTotalMinor: price.total_minor,
      customerQuantity: input.quantity,
      customerDesignSummary: summary,
      clientKey: clientKey ?? null,
    });
    await repo.insertRevision(tx, { quoteId, number: 1, kind: 'budget', data: revision, priceBookVersion: book.version, totalMinor: price.total_minor, createdBy: customer.id });
    await repo.insertEvent(tx, { quoteId, actorId: customer.id, kind: 'submitted', message: input.notes ?? null });
    await notifySubmitted(deps, tx, {
      id: quoteId,
      number,
      organizationName: customer.organizationName,
      submittedByName: customer.name,
      reference: input.reference ?? null,
      designSummary: summary,
      priceTotal_minor: price.total_minor,
      currency: price.currency,
      quantity: input.quantity,
    });
    return quoteId;
  });
  let id: string;
  try {
    id = await store();
  } catch (err) {
    // a concurrent attempt with the same key committed first: answer with its quote
    const earlier = clientKey && repo.isClientKeyConflict(err) ? await repo.findQuoteIdByClientKey(deps.db, customer.id, clientKey) : undefined;
    if (!earlier) throw err;
    return { quote: await getQuote(deps, customer, earlier), created: false };
  }
  return { quote: await getQuote(deps, customer, id), created: true, ...(choice ? { designChoice: choice } : {}) };
}

/** A new quote without an idempotency key (the seed, scripts). */
export async function createQuote(deps: QuoteDeps, customer: SessionUser, input: ReturnType<typeof createQuoteSchema.parse>): Promise<QuoteDetail> {
  return (await submitQuote(deps, customer, input)).quote;
}

/** A quote the viewer may see; another organisation's quote does not exist for a customer (404). */
export async function loadVisible(deps: QuoteDeps, viewer: SessionUser, id: string) {
  const row = await repo.findQuote(deps.db, id);
  if (!row || (!isStaff(viewer) && row.organizationId !== viewer.organizationId)) throw notFound('No such quote.');
  return row;
}

export async function getQuote(deps: QuoteDeps, viewer: SessionUser, id: string, revisionNumber?: number): Promise<QuoteDetail> {
  const row = await loadVisible(deps, viewer, id);
  const staff = isStaff(viewer);
  // a customer sees the last revision meant for them while a draft is being worked on
  const number = revisionNumber ?? (staff ? row.currentRevision : await customerRevisionNumber(deps, id, row.currentRevision));
  const rev = await repo.findRevision(deps.db, id, number);
  if (!rev || (!staff && rev.kind === 'draft')) throw notFound('No such revision of this quote.');
  const [revisions, attachments, events, payment] = await Promise.all([
    repo.listRevisions(deps.db, id),
    repo.listAttachments(deps.db, id),
    repo.listEvents(deps.db, id),
    repo.paymentState(deps.db, id),
  ]);
  // a customer gets only the kinds shared/schemas/events.ts gives them
  const seen = staff ? events : events.filter((e) => customerSeesQuoteEvent(e.kind));
  return toDetail(viewer, row, rev.data, { revisions, attachments, events: seen, ...payment });
}

async function customerRevisionNumber(deps: QuoteDeps, id: string, current: number): Promise<number> {
  const latest = (await repo.listRevisions(deps.db, id)).find((r) => r.kind !== 'draft');
  return latest?.number ?? current;
}

export async function listQuotes(deps: QuoteDeps, viewer: SessionUser, query: ListQuotesQuery) {
  const scope = isStaff(viewer) ? { userId: viewer.id } : { userId: viewer.id, organizationId: viewer.organizationId };
  const { items, total } = await repo.listQuotes(deps.db, query, scope);
  return { items: items.map((row) => toSummary(viewer, row)), total, page: query.page, pageSize: query.pageSize };
}

export type { CreateQuoteInput };
