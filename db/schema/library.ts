import { boolean, doublePrecision, index, integer, jsonb, pgTable, text, timestamp, unique, uuid } from 'drizzle-orm/pg-core';
import { organizations } from './organizations';
import { users } from './users';

/**
 * The fabricator's material library: tube and shell materials with the properties the engine and the
 * wall checks use, and the price-book key they are priced under. Seeded from the built-in list; admins
 * keep it (each change is in the audit log and bumps `version`).
 */
export const materials = pgTable(
  'materials',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    /** the engine's id (`stainless-316`), stable across edits */
    key: text('key').notNull(),
    kind: text('kind', { enum: ['tube', 'shell'] }).notNull(),
    name: text('name').notNull(),
    /** W/(m·K) */
    conductivity: doublePrecision('conductivity').notNull(),
    /** kg/m³ */
    density: doublePrecision('density').notNull(),
    /** allowable stress in Pa: [{ temperature_C, stress_Pa }], ascending temperature */
    allowableStress: jsonb('allowable_stress').notNull(),
    /** the price book's material key this one is priced under */
    priceBookKey: text('price_book_key'),
    source: text('source'),
    active: boolean('active').notNull().default(true),
    version: integer('version').notNull().default(1),
    updatedBy: uuid('updated_by').references(() => users.id),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [unique('materials_kind_key_uq').on(t.kind, t.key)],
);

/**
 * A fluid an organisation entered as a table of properties against temperature (interpolated,
 * range-checked by the engine): usable by that organisation's requests as `org:<id>`.
 */
export const orgFluids = pgTable(
  'org_fluids',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    organizationId: uuid('organization_id').notNull().references(() => organizations.id),
    name: text('name').notNull(),
    /** [{ temperature_C, density, cp, viscosity, conductivity }] in SI, strictly ascending temperature */
    points: jsonb('points').notNull(),
    source: text('source'),
    active: boolean('active').notNull().default(true),
    version: integer('version').notNull().default(1),
    createdBy: uuid('created_by').references(() => users.id),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [unique('org_fluids_org_name_uq').on(t.organizationId, t.name), index('org_fluids_org_idx').on(t.organizationId)],
);
