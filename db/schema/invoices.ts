import { bigint, index, pgEnum, pgSequence, pgTable, text, timestamp, unique, uuid } from 'drizzle-orm/pg-core';
import { orders } from './orders';
import { users } from './users';

export const invoiceKind = pgEnum('invoice_kind', ['deposit', 'balance']);
export const invoiceStatus = pgEnum('invoice_status', ['open', 'paid', 'void']);

/** Numbers people read (`INV-2026-0001`) come from this sequence. */
export const invoiceNumberSeq = pgSequence('invoice_number_seq', { startWith: 1 });

/**
 * An order's invoices: the deposit (issued paid, as the receipt of the accepted offer's payment) and
 * the balance (issued when the shop marks the order ready to ship, paid through the payment service).
 * One of each kind per order; money in the currency's minor unit.
 */
export const invoices = pgTable(
  'invoices',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    number: text('number').notNull().unique(),
    orderId: uuid('order_id').notNull().references(() => orders.id, { onDelete: 'cascade' }),
    kind: invoiceKind('kind').notNull(),
    amountMinor: bigint('amount_minor', { mode: 'number' }).notNull(),
    currency: text('currency').notNull(),
    status: invoiceStatus('status').notNull().default('open'),
    /** the payment service's PaymentIntent that collects (or collected) it */
    paymentIntentId: text('payment_intent_id').unique(),
    /** net days from issue when the organisation has payment terms; null = due before shipping */
    dueAt: timestamp('due_at', { withTimezone: true }),
    issuedAt: timestamp('issued_at', { withTimezone: true }).notNull().defaultNow(),
    paidAt: timestamp('paid_at', { withTimezone: true }),
    voidedAt: timestamp('voided_at', { withTimezone: true }),
    voidReason: text('void_reason'),
  },
  (t) => [unique('invoices_order_kind_uq').on(t.orderId, t.kind), index('invoices_status_idx').on(t.status, t.issuedAt)],
);

/**
 * Price changes agreed after the offer (extra work, freight changed, a discount): they move the
 * balance. Never edited; a correction is a new line.
 */
export const orderAdjustments = pgTable(
  'order_adjustments',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    orderId: uuid('order_id').notNull().references(() => orders.id, { onDelete: 'cascade' }),
    label: text('label').notNull(),
    amountMinor: bigint('amount_minor', { mode: 'number' }).notNull(),
    reason: text('reason').notNull(),
    actorId: uuid('actor_id').references(() => users.id),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('order_adjustments_order_idx').on(t.orderId, t.createdAt)],
);
