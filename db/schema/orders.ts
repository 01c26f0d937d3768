import { bigint, integer, jsonb, pgEnum, pgSequence, pgTable, text, timestamp, uuid, index } from 'drizzle-orm/pg-core';
import { orderEventKinds } from '../../shared/schemas/events';
import { orderStatuses } from '../../shared/schemas/orders';
import { organizations } from './organizations';
import { quotes } from './quotes';
import { users } from './users';

export const orderStatus = pgEnum('order_status', orderStatuses);
export const acceptanceStatus = pgEnum('acceptance_status', ['awaiting-payment', 'payment-failed', 'paid', 'canceled']);
export const orderNumberSeq = pgSequence('order_number_seq', { startWith: 501 });

/** A buyer's acceptance of an offer revision, with its deposit PaymentIntent. */
export const acceptances = pgTable('acceptances', {
  id: uuid('id').primaryKey().defaultRandom(),
  quoteId: uuid('quote_id').notNull().references(() => quotes.id),
  revisionNumber: integer('revision_number').notNull(),
  acceptedBy: uuid('accepted_by').notNull().references(() => users.id),
  poNumber: text('po_number').notNull(),
  billingContact: jsonb('billing_contact').notNull(),
  deliveryAddress: jsonb('delivery_address').notNull(),
  paymentIntentId: text('payment_intent_id').notNull().unique(),
  amountMinor: bigint('amount_minor', { mode: 'number' }).notNull(),
  currency: text('currency').notNull(),
  status: acceptanceStatus('status').notNull().default('awaiting-payment'),
  lastError: text('last_error'),
  createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
});

/** Every verified webhook event, once: a replayed event id changes nothing. */
export const paymentEvents = pgTable('payment_events', {
  id: text('id').primaryKey(),
  type: text('type').notNull(),
  payload: jsonb('payload').notNull(),
  outcome: text('outcome'),
  receivedAt: timestamp('received_at', { withTimezone: true }).notNull().defaultNow(),
});

export const orders = pgTable(
  'orders',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    number: text('number').notNull().unique(),
    quoteId: uuid('quote_id').notNull().unique().references(() => quotes.id),
    acceptanceId: uuid('acceptance_id').notNull().unique().references(() => acceptances.id),
    organizationId: uuid('organization_id').notNull().references(() => organizations.id),
    revisionNumber: integer('revision_number').notNull(),
    status: orderStatus('status').notNull(),
    /** step before an interruption (on hold), to resume from */
    heldFrom: orderStatus('held_from'),
    totalMinor: bigint('total_minor', { mode: 'number' }).notNull(),
    depositMinor: bigint('deposit_minor', { mode: 'number' }).notNull(),
    refundedMinor: bigint('refunded_minor', { mode: 'number' }).notNull().default(0),
    /**
     * Decided by a cancellation in the same transaction as the status change; a job then asks the
     * payment service for it (idempotency key per order), and the charge.refunded webhook completes it.
     */
    refundDueMinor: bigint('refund_due_minor', { mode: 'number' }).notNull().default(0),
    refundStatus: text('refund_status', { enum: ['none', 'pending', 'requested', 'refunded', 'failed'] }).notNull().default('none'),
    refundError: text('refund_error'),
    currency: text('currency').notNull(),
    hydrotestPressurePa: bigint('hydrotest_pressure_pa', { mode: 'number' }),
    /** an admin let the order ship before its balance is paid (payment terms, a trusted customer) */
    shipReleaseReason: text('ship_release_reason'),
    shipReleasedBy: uuid('ship_released_by').references(() => users.id),
    shipReleasedAt: timestamp('ship_released_at', { withTimezone: true }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('orders_status_idx').on(t.status, t.updatedAt), index('orders_org_idx').on(t.organizationId)],
);

/**
 * The order's timeline: who moved it to which step, when, with what note; besides the steps, staff
 * notes, hold reasons and each side's hydrotest (`kind`; who sees which: shared/schemas/events.ts).
 */
export const orderEvents = pgTable(
  'order_events',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    orderId: uuid('order_id').notNull().references(() => orders.id, { onDelete: 'cascade' }),
    actorId: uuid('actor_id').references(() => users.id),
    status: orderStatus('status').notNull(),
    kind: text('kind', { enum: orderEventKinds }).notNull().default('step'),
    note: text('note'),
    data: jsonb('data'),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('order_events_order_idx').on(t.orderId, t.createdAt)],
);
