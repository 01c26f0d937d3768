import { integer, jsonb, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import type { PriceBook } from '../../shared/schemas/price-book';
import { users } from './users';

/**
 * The fabricator's price book, one row per saved version (never updated in place): revisions keep
 * the version they were priced with, so an old offer can be reproduced. The active book is the
 * highest version.
 */
export const priceBooks = pgTable('price_books', {
  id: uuid('id').primaryKey().defaultRandom(),
  version: integer('version').notNull().unique(),
  /** a PriceBook (shared/schemas/price-book.ts), validated before it is stored */
  data: jsonb('data').$type<PriceBook>().notNull(),
  note: text('note'),
  /** null for the seeded demo book */
  createdBy: uuid('created_by').references(() => users.id),
  createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
});
