import { and, asc, count, desc, eq, ilike, or, sql, type SQL } from 'drizzle-orm';
import type { Db } from '../../../db';
import { acceptances, orderEvents, orders, organizations, paymentEvents, quotes, users } from '../../../db/schema';
import type { OrderEventKind } from '../../../shared/schemas/events';
import type { ListOrdersQuery, OrderStatus } from '../../../shared/schemas/orders';

type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];
export type Executor = Db | Tx;

const orderColumns = {
  id: orders.id,
  number: orders.number,
  quoteId: orders.quoteId,
  quoteNumber: quotes.number,
  organizationId: orders.organizationId,
  organizationName: organizations.name,
  status: orders.status,
  heldFrom: orders.heldFrom,
  revisionNumber: orders.revisionNumber,
  poNumber: acceptances.poNumber,
  paymentIntentId: acceptances.paymentIntentId,
  needBy: quotes.needBy,
  totalMinor: orders.totalMinor,
  depositMinor: orders.depositMinor,
  refundedMinor: orders.refundedMinor,
  currency: orders.currency,
  hydrotestPressurePa: orders.hydrotestPressurePa,
  buyerEmail: users.email,
  buyerName: users.name,
  createdAt: orders.createdAt,
  updatedAt: orders.updatedAt,
};

function baseSelect(db: Executor) {
  return db
    .select(orderColumns)
    .from(orders)
    .innerJoin(quotes, eq(quotes.id, orders.quoteId))
    .innerJoin(organizations, eq(organizations.id, orders.organizationId))
    .innerJoin(acceptances, eq(acceptances.id, orders.acceptanceId))
    .innerJoin(users, eq(users.id, acceptances.acceptedBy));
}

export async function findOrder(db: Executor, id: string) {
  const [row] = await baseSelect(db).where(eq(orders.id, id));
  return row;
}
export type OrderRow = NonNullable<Awaited<ReturnType<typeof findOrder>>>;

const SORTS: Record<ListOrdersQuery['sort'], SQL> = {
  created: asc(orders.createdAt),
  '-created': desc(orders.createdAt),
  updated: asc(orders.updatedAt),
  '-updated': desc(orders.updatedAt),
  needBy: sql`${quotes.needBy} asc nulls last`,
  '-needBy': sql`${quotes.needBy} desc nulls last`,
  number: asc(orders.number),
  '-number': desc(orders.number),
};

export async function listOrders(db: Db, query: ListOrdersQuery, organizationId?: string) {
  const where: SQL[] = [];
  if (organizationId) where.push(eq(orders.organizationId, organizationId));
  if (query.status) where.push(eq(orders.status, query.status));
  if (query.q) {
    const like = `%${query.q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
    where.push(or(ilike(orders.number, like), ilike(quotes.number, like), ilike(organizations.name, like), ilike(acceptances.poNumber, like))!);
  }
  const condition = where.length ? and(...where) : undefined;
  const [items, [total]] = await Promise.all([
    baseSelect(db).where(condition).orderBy(SORTS[query.sort], desc(orders.id)).limit(query.pageSize).offset((query.page - 1) * query.pageSize),
    db
      .select({ n: count() })
      .from(orders)
      .innerJoin(quotes, eq(quotes.id, orders.quoteId))
      .innerJoin(organizations, eq(organizations.id, orders.organizationId))
      .innerJoin(acceptances, eq(acceptances.id, orders.acceptanceId))
      .where(condition),
  ]);
  return { items, total: total?.n ?? 0 };
}

export async function timeline(db: Executor, orderId: string) {
  return db
    .select({ kind: orderEvents.kind, status: orderEvents.status, note: orderEvents.note, by: users.name, at: orderEvents.createdAt, data: orderEvents.data })
    .from(orderEvents)
    .leftJoin(users, eq(users.id, orderEvents.actorId))
    .where(eq(orderEvents.orderId, orderId))
    .orderBy(asc(orderEvents.createdAt));
}

/** One timeline event; `kind` decides who sees it (shared/schemas/events.ts), a step by default. */
export async function addEvent(db: Executor, orderId: string, actorId: string | null, status: OrderStatus, note?: string | null, data?: unknown, kind: OrderEventKind = 'step') {
  // the clock, not the transaction's start: a step and its note written together keep their order
  await db.insert(orderEvents).values({ orderId, actorId, status, kind, note: note ?? null, data: data ?? null, createdAt: sql`clock_timestamp()` });
}

/** The order's status, its row locked until the transaction ends. */
export async function lockOrderStatus(db: Executor, id: string): Promise<OrderStatus | undefined> {
  const [row] = await db.select({ status: orders.status }).from(orders).where(eq(orders.id, id)).for('update');
  return row?.status;
}

/** Moves the order from `from` to `to`; false when it was not at `from` any more (a concurrent move). */
export async function moveOrder(db: Executor, id: string, from: OrderStatus, changes: Partial<typeof orders.$inferInsert> & { status: OrderStatus }) {
  const rows = await db
    .update(orders)
    .set({ ...changes, updatedAt: sql`now()` })
    .where(and(eq(orders.id, id), eq(orders.status, from)))
    .returning({ id: orders.id });
  return rows.length === 1;
}

export async function nextOrderNumber(db: Executor): Promise<string> {
  const { rows } = await db.execute<{ n: string }>(sql`select nextval('order_number_seq') as n`);
  return `O-${new Date().getUTCFullYear()}-${String(rows[0]!.n).padStart(4, '0')}`;
}

/** Records a webhook event; false when this event id was seen before (a replay). */
export async function recordPaymentEvent(db: Executor, id: string, type: string, payload: unknown): Promise<boolean> {
  const rows = await db.insert(paymentEvents).values({ id, type, payload }).onConflictDoNothing().returning({ id: paymentEvents.id });
  return rows.length === 1;
}

export async function setPaymentEventOutcome(db: Executor, id: string, outcome: string) {
  await db.update(paymentEvents).set({ outcome }).where(eq(paymentEvents.id, id));
}

export async function findAcceptanceByIntent(db: Executor, paymentIntentId: string) {
  const [row] = await db.select().from(acceptances).where(eq(acceptances.paymentIntentId, paymentIntentId)).for('update');
  return row;
}

export async function openAcceptance(db: Executor, quoteId: string) {
  const [row] = await db
    .select()
    .from(acceptances)
    .where(and(eq(acceptances.quoteId, quoteId), or(eq(acceptances.status, 'awaiting-payment'), eq(acceptances.status, 'payment-failed'))))
    .orderBy(desc(acceptances.createdAt))
    .limit(1);
  return row;
}

export { acceptances, orders };
