import { index, jsonb, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { users } from './users';

/**
 * What admins changed (users, organisations, materials, fluids, shipping releases): who, when, the
 * record, and its fields before → after. Written in the same transaction as the change; never edited.
 */
export const auditLog = pgTable(
  'audit_log',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    at: timestamp('at', { withTimezone: true }).notNull().defaultNow(),
    actorId: uuid('actor_id').references(() => users.id),
    /** e.g. `user.role-changed`, `user.deactivated`, `material.updated`, `fluid.created` */
    action: text('action').notNull(),
    /** `user`, `organization`, `material`, `fluid`, `order` */
    entity: text('entity').notNull(),
    entityId: text('entity_id').notNull(),
    before: jsonb('before'),
    after: jsonb('after'),
  },
  (t) => [index('audit_log_at_idx').on(t.at), index('audit_log_entity_idx').on(t.entity, t.entityId)],
);
