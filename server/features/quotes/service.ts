import type { SessionUser } from '../../../shared/schemas/auth';
import type { CreateQuoteInput, ListQuotesQuery, QuoteDetail } from '../../../shared/schemas/quotes';
import { createQuoteSchema } from '../../../shared/schemas/quotes';
import { isStaff } from '../../lib/auth/guards';
import { notFound } from '../../lib/errors';
import type { QuoteDeps } from './deps';
import { notifySubmitted } from './notify';
import { activeBook, buildRevision, priceWithBook, sizeWithBook } from './pricing-port';
import { designSummary, toDetail, toSummary } from './present';
import * as repo from './repository';

/**
 * A customer's request: sized and priced at once (nothing is stored when the duty is impossible or
 * cannot be priced), stored as quote + budget revision 1 + event in one transaction.
 */
export async function createQuote(deps: QuoteDeps, customer: SessionUser, input: ReturnType<typeof createQuoteSchema.parse>) {
  const book = await activeBook(deps);
  const { design, alternatives } = await sizeWithBook(deps.config, input.duty, book);
  const price = priceWithBook(design, book, { quantity: input.quantity, needBy: input.needBy });
  const id = await deps.db.transaction(async (tx) => {
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
      designSummary: designSummary(design),
      customerTotalMinor: price.total_minor,
      customerQuantity: input.quantity,
      customerDesignSummary: designSummary(design),
    });
    await repo.insertRevision(tx, { quoteId, number: 1, kind: 'budget', data: revision, priceBookVersion: book.version, totalMinor: price.total_minor, createdBy: customer.id });
    await repo.insertEvent(tx, { quoteId, actorId: customer.id, kind: 'submitted', message: input.notes ?? null });
    return quoteId;
  });
  const detail = await getQuote(deps, customer, id);
  await notifySubmitted(deps, detail);
  return detail;
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
    repo.listEvents(deps.db, id, staff),
    repo.paymentState(deps.db, id),
  ]);
  return toDetail(viewer, row, rev.data, { revisions, attachments, events, ...payment });
}

async function customerRevisionNumber(deps: QuoteDeps, id: string, current: number): Promise<number> {
  const latest = (await repo.listRevisions(deps.db, id)).find((r) => r.kind !== 'draft');
  return latest?.number ?? current;
}

export async function listQuotes(deps: QuoteDeps, viewer: SessionUser, query: ListQuotesQuery) {
  const scope = isStaff(viewer) ? { userId: viewer.id } : { userId: viewer.id, organizationId: viewer.organizationId };
  const { items, total } = await repo.listQuotes(deps.db, query, scope);
  return { items: items.map(toSummary), total, page: query.page, pageSize: query.pageSize };
}

export type { CreateQuoteInput };
