import { integer, numeric, pgEnum, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';

/** The fabricator (staff belong to it) and the customer companies that ask for coolers. */
export const organizationKind = pgEnum('organization_kind', ['fabricator', 'customer']);

export const organizations = pgTable('organizations', {
  id: uuid('id').primaryKey().defaultRandom(),
  name: text('name').notNull().unique(),
  kind: organizationKind('kind').notNull(),
  /** a customer's own deposit share in percent (e.g. '30'); null = the price book's */
  depositPct: numeric('deposit_pct'),
  /** net days a trusted customer has to pay the balance after shipping; null = balance before shipping */
  paymentTermsDays: integer('payment_terms_days'),
  /** optimistic lock for admin edits */
  version: integer('version').notNull().default(1),
  createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
});
