import { index, integer, pgEnum, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { organizations } from './organizations';

export const userRole = pgEnum('user_role', ['customer', 'sales', 'shop', 'admin']);

export const users = pgTable(
  'users',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    organizationId: uuid('organization_id').notNull().references(() => organizations.id),
    /** stored lower-cased and trimmed */
    email: text('email').notNull().unique(),
    name: text('name').notNull(),
    role: userRole('role').notNull(),
    /** `scrypt$N$r$p$salt$hash`, see server/lib/auth/passwords.ts */
    passwordHash: text('password_hash').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    disabledAt: timestamp('disabled_at', { withTimezone: true }),
    /** optimistic lock for admin edits (role, active) */
    version: integer('version').notNull().default(1),
  },
  (t) => [index('users_organization_idx').on(t.organizationId)],
);
