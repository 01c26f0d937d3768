import { and, asc, count, desc, eq, ilike, or, sql, type SQL } from 'drizzle-orm';
import { alias } from 'drizzle-orm/pg-core';
import type { Db } from '../../../db';
import { acceptances, attachments, orders, organizations, quoteEvents, quoteRevisions, quotes, users } from '../../../db/schema';
import { customerSeesQuoteEvent, type QuoteEventKind } from '../../../shared/schemas/events';
import type { ListQuotesQuery, Revision } from '../../../shared/schemas/quotes';

export type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];
export type Executor = Db | Tx;

const submitter = alias(users, 'submitter');
const assignee = alias(users, 'assignee');

const summaryColumns = {
  id: quotes.id,
  number: quotes.number,
  status: quotes.status,
  version: quotes.version,
  organizationId: quotes.organizationId,
  organizationName: organizations.name,
  reference: quotes.reference,
  quantity: quotes.quantity,
  needBy: quotes.needBy,
  validUntil: quotes.validUntil,
  priceTotal_minor: quotes.priceTotalMinor,
  currency: quotes.currency,
  submittedById: submitter.id,
  submittedByName: submitter.name,
  submittedByEmail: submitter.email,
  assigneeId: assignee.id,
  assigneeName: assignee.name,
  assigneeEmail: assignee.email,
  createdAt: quotes.createdAt,
  updatedAt: quotes.updatedAt,
  designSummary: quotes.designSummary,
  // what the customer may see: the figures of the last revision meant for them (never a draft's)
  customerTotal_minor: quotes.customerTotalMinor,
  customerQuantity: quotes.customerQuantity,
  customerDesignSummary: quotes.customerDesignSummary,
  currentRevision: quotes.currentRevision,
  notes: quotes.notes,
  duty: quotes.duty,
};

function baseSelect(db: Executor) {
  return db
    .select(summaryColumns)
    .from(quotes)
    .innerJoin(organizations, eq(organizations.id, quotes.organizationId))
    .innerJoin(submitter, eq(submitter.id, quotes.submittedBy))
    .leftJoin(assignee, eq(assignee.id, quotes.assigneeId));
}

export async function findQuote(db: Executor, id: string) {
  const [row] = await baseSelect(db).where(eq(quotes.id, id));
  return row;
}

/** Sort orders; `value` sorts customers by the total they were shown, staff by the current one. */
const sorts = (customerView: boolean): Record<string, SQL> => ({
  created: asc(quotes.createdAt),
  '-created': desc(quotes.createdAt),
  updated: asc(quotes.updatedAt),
  '-updated': desc(quotes.updatedAt),
  value: asc(customerView ? quotes.customerTotalMinor : quotes.priceTotalMinor),
  '-value': desc(customerView ? quotes.customerTotalMinor : quotes.priceTotalMinor),
  needBy: sql`${quotes.needBy} asc nulls last`,
  '-needBy': sql`${quotes.needBy} desc nulls last`,
  number: asc(quotes.number),
  '-number': desc(quotes.number),
});

/** A scope with an organisation is a customer's: it filters, sorts and searches by the customer's figures. */
export async function listQuotes(db: Db, query: ListQuotesQuery, scope: { organizationId?: string; userId: string }) {
  const customerView = scope.organizationId !== undefined;
  const where: SQL[] = [];
  if (scope.organizationId) where.push(eq(quotes.organizationId, scope.organizationId));
  if (query.status) where.push(eq(quotes.status, query.status));
  if (query.assignee === 'me') where.push(eq(quotes.assigneeId, scope.userId));
  else if (query.assignee === 'none') where.push(sql`${quotes.assigneeId} is null`);
  else if (query.assignee) where.push(eq(quotes.assigneeId, query.assignee));
  if (query.q) {
    const like = `%${query.q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
    const summary = customerView ? quotes.customerDesignSummary : quotes.designSummary;
    where.push(or(ilike(quotes.number, like), ilike(organizations.name, like), ilike(quotes.reference, like), ilike(summary, like))!);
  }
  const condition = where.length ? and(...where) : undefined;
  const [items, [total]] = await Promise.all([
    baseSelect(db)
      .where(condition)
      .orderBy(sorts(customerView)[query.sort]!, desc(quotes.id))
      .limit(query.pageSize)
      .offset((query.page - 1) * query.pageSize),
    db
      .select({ n: count() })
      .from(quotes)
      .innerJoin(organizations, eq(organizations.id, quotes.organizationId))
      .where(condition),
  ]);
  return { items, total: total?.n ?? 0 };
}

export async function nextQuoteNumber(db: Executor): Promise<string> {
  const { rows } = await db.execute<{ n: string }>(sql`select nextval('quote_number_seq') as n`);
  return `Q-${new Date().getUTCFullYear()}-${String(rows[0]!.n).padStart(4, '0')}`;
}

export async function insertQuote(db: Executor, values: typeof quotes.$inferInsert) {
  const [row] = await db.insert(quotes).values(values).returning({ id: quotes.id });
  return row!.id;
}

/** The quote a customer's earlier submission with this idempotency key made, if any. */
export async function findQuoteIdByClientKey(db: Executor, submittedBy: string, clientKey: string) {
  const [row] = await db
    .select({ id: quotes.id })
    .from(quotes)
    .where(and(eq(quotes.submittedBy, submittedBy), eq(quotes.clientKey, clientKey)));
  return row?.id;
}

/** The unique (submitted_by, client_key) violation of a racing duplicate, also when drizzle wraps the driver's error. */
export function isClientKeyConflict(err: unknown): boolean {
  for (let e: unknown = err; e && typeof e === 'object'; e = (e as { cause?: unknown }).cause) {
    const pg = e as { code?: unknown; constraint?: unknown };
    if (pg.code === '23505' && pg.constraint === 'quotes_submitter_client_key_uq') return true;
  }
  return false;
}

/** Applies `changes` only if the quote is still at `version`; returns false when it was not. */
export async function updateQuoteAtVersion(
  db: Executor,
  id: string,
  version: number,
  changes: Partial<typeof quotes.$inferInsert>,
): Promise<boolean> {
  const rows = await db
    .update(quotes)
    .set({ ...changes, version: sql`${quotes.version} + 1`, updatedAt: sql`now()` })
    .where(and(eq(quotes.id, id), eq(quotes.version, version)))
    .returning({ id: quotes.id });
  return rows.length === 1;
}

export async function insertRevision(
  db: Executor,
  values: { quoteId: string; number: number; kind: Revision['kind']; data: Revision; priceBookVersion: number; totalMinor: number; createdBy: string },
) {
  await db.insert(quoteRevisions).values(values);
}

export async function findRevision(db: Executor, quoteId: string, number: number) {
  const [row] = await db
    .select()
    .from(quoteRevisions)
    .where(and(eq(quoteRevisions.quoteId, quoteId), eq(quoteRevisions.number, number)));
  return row ? { ...row, data: row.data as Revision } : undefined;
}

export async function listRevisions(db: Executor, quoteId: string) {
  return db
    .select({
      number: quoteRevisions.number,
      kind: quoteRevisions.kind,
      createdAt: quoteRevisions.createdAt,
      createdBy: users.name,
      total_minor: quoteRevisions.totalMinor,
    })
    .from(quoteRevisions)
    .innerJoin(users, eq(users.id, quoteRevisions.createdBy))
    .where(eq(quoteRevisions.quoteId, quoteId))
    .orderBy(desc(quoteRevisions.number));
}

export async function latestOfferRevision(db: Executor, quoteId: string) {
  const [row] = await db
    .select({ number: quoteRevisions.number })
    .from(quoteRevisions)
    .where(and(eq(quoteRevisions.quoteId, quoteId), eq(quoteRevisions.kind, 'offer')))
    .orderBy(desc(quoteRevisions.number))
    .limit(1);
  return row?.number;
}

/**
 * One quote event. Its kind decides who sees it (shared/schemas/events.ts) and sets `internal`; a
 * caller's `internal` that disagrees with the kind's audience is a bug and throws.
 */
export async function insertEvent(
  db: Executor,
  values: { quoteId: string; actorId: string | null; kind: QuoteEventKind; message?: string | null; internal?: boolean; data?: unknown },
) {
  const internal = !customerSeesQuoteEvent(values.kind);
  if (values.internal !== undefined && values.internal !== internal) throw new Error(`insertEvent: a '${values.kind}' event is ${internal ? 'internal' : 'customer-visible'} (shared/schemas/events.ts)`);
  await db.insert(quoteEvents).values({ ...values, message: values.message ?? null, internal });
}

/** Every event of the quote, oldest first: the service keeps what the viewer may see. */
export async function listEvents(db: Executor, quoteId: string) {
  const where = eq(quoteEvents.quoteId, quoteId);
  return db
    .select({
      id: quoteEvents.id,
      kind: quoteEvents.kind,
      message: quoteEvents.message,
      internal: quoteEvents.internal,
      actorName: users.name,
      actorRole: users.role,
      createdAt: quoteEvents.createdAt,
    })
    .from(quoteEvents)
    .leftJoin(users, eq(users.id, quoteEvents.actorId))
    .where(where)
    .orderBy(asc(quoteEvents.createdAt));
}

export async function listAttachments(db: Executor, quoteId: string) {
  return db
    .select({
      id: attachments.id,
      filename: attachments.filename,
      contentType: attachments.contentType,
      size: attachments.size,
      sha256: attachments.sha256,
      uploadedBy: users.name,
      createdAt: attachments.createdAt,
      storageKey: attachments.storageKey,
    })
    .from(attachments)
    .innerJoin(users, eq(users.id, attachments.uploadedBy))
    .where(eq(attachments.quoteId, quoteId))
    .orderBy(asc(attachments.createdAt));
}

export async function insertAttachment(db: Executor, values: typeof attachments.$inferInsert) {
  const [row] = await db.insert(attachments).values(values).returning({ id: attachments.id });
  return row!.id;
}

export async function staffEmails(db: Executor, role: 'sales' | 'shop' | 'admin') {
  const rows = await db.select({ email: users.email }).from(users).where(and(eq(users.role, role), sql`${users.disabledAt} is null`));
  return rows.map((r) => r.email);
}

/** The latest acceptance's payment state and the order, if any (for the quote page). */
export async function paymentState(db: Executor, quoteId: string) {
  const [acceptance] = await db
    .select({ status: acceptances.status, lastError: acceptances.lastError, amount_minor: acceptances.amountMinor, currency: acceptances.currency })
    .from(acceptances)
    .where(eq(acceptances.quoteId, quoteId))
    .orderBy(desc(acceptances.createdAt))
    .limit(1);
  const [order] = await db.select({ id: orders.id }).from(orders).where(eq(orders.quoteId, quoteId));
  return { payment: acceptance ?? null, orderId: order?.id ?? null };
}
