import { bigint, boolean, date, index, integer, jsonb, pgEnum, pgSequence, pgTable, text, timestamp, unique, uuid } from 'drizzle-orm/pg-core';
import { quoteStatuses } from '../../shared/schemas/quotes';
import { organizations } from './organizations';
import { users } from './users';

export const quoteStatus = pgEnum('quote_status', quoteStatuses);
export const revisionKind = pgEnum('revision_kind', ['budget', 'draft', 'offer']);

/** Numbers people read (`Q-2026-0042`) come from this sequence. */
export const quoteNumberSeq = pgSequence('quote_number_seq', { startWith: 1001 });

export const quotes = pgTable(
  'quotes',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    number: text('number').notNull().unique(),
    organizationId: uuid('organization_id').notNull().references(() => organizations.id),
    submittedBy: uuid('submitted_by').notNull().references(() => users.id),
    assigneeId: uuid('assignee_id').references(() => users.id),
    status: quoteStatus('status').notNull(),
    /** optimistic lock: bumped by every change */
    version: integer('version').notNull().default(1),
    currentRevision: integer('current_revision').notNull(),
    quantity: integer('quantity').notNull(),
    needBy: date('need_by', { mode: 'string' }),
    validUntil: timestamp('valid_until', { withTimezone: true }),
    reference: text('reference'),
    notes: text('notes'),
    /** the current duty (a SizeRequest), validated by the shared zod schema before it is stored */
    duty: jsonb('duty').notNull(),
    priceTotalMinor: bigint('price_total_minor', { mode: 'number' }).notNull(),
    currency: text('currency').notNull(),
    designSummary: text('design_summary').notNull(),
    /**
     * What the customer may see: the figures of the last revision meant for them (budget or offer),
     * never a draft's. Updated only when such a revision is stored.
     */
    customerTotalMinor: bigint('customer_total_minor', { mode: 'number' }).notNull(),
    customerQuantity: integer('customer_quantity').notNull(),
    customerDesignSummary: text('customer_design_summary').notNull(),
    /** the submitter's idempotency key: a retried submission returns the quote it already made */
    clientKey: text('client_key'),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index('quotes_status_updated_idx').on(t.status, t.updatedAt),
    index('quotes_org_updated_idx').on(t.organizationId, t.updatedAt),
    index('quotes_assignee_idx').on(t.assigneeId),
    unique('quotes_submitter_client_key_uq').on(t.submittedBy, t.clientKey),
  ],
);

/** Immutable: each keeps inputs, design, rating, price lines and price-book version (a `Revision`). */
export const quoteRevisions = pgTable(
  'quote_revisions',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    quoteId: uuid('quote_id').notNull().references(() => quotes.id, { onDelete: 'cascade' }),
    number: integer('number').notNull(),
    kind: revisionKind('kind').notNull(),
    data: jsonb('data').notNull(),
    priceBookVersion: integer('price_book_version').notNull(),
    totalMinor: bigint('total_minor', { mode: 'number' }).notNull(),
    createdBy: uuid('created_by').notNull().references(() => users.id),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [unique('quote_revisions_quote_number_uq').on(t.quoteId, t.number)],
);

/** The audit trail and the conversation: who changed what and why. */
export const quoteEvents = pgTable(
  'quote_events',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    quoteId: uuid('quote_id').notNull().references(() => quotes.id, { onDelete: 'cascade' }),
    actorId: uuid('actor_id').references(() => users.id),
    kind: text('kind').notNull(),
    message: text('message'),
    internal: boolean('internal').notNull().default(false),
    data: jsonb('data'),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('quote_events_quote_idx').on(t.quoteId, t.createdAt)],
);

/** Files stored outside the web root under random names (server/lib/storage.ts). */
export const attachments = pgTable(
  'attachments',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    quoteId: uuid('quote_id').notNull().references(() => quotes.id, { onDelete: 'cascade' }),
    uploadedBy: uuid('uploaded_by').notNull().references(() => users.id),
    filename: text('filename').notNull(),
    contentType: text('content_type').notNull(),
    size: integer('size').notNull(),
    sha256: text('sha256').notNull(),
    storageKey: text('storage_key').notNull().unique(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('attachments_quote_idx').on(t.quoteId)],
);
