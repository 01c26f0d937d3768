import { pgEnum, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';

/** The fabricator (staff belong to it) and the customer companies that ask for coolers. */
export const organizationKind = pgEnum('organization_kind', ['fabricator', 'customer']);

export const organizations = pgTable('organizations', {
  id: uuid('id').primaryKey().defaultRandom(),
  name: text('name').notNull().unique(),
  kind: organizationKind('kind').notNull(),
  createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
});
