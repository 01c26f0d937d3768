import { desc, eq, lt, sql } from 'drizzle-orm';
import type { Db } from '../../../db';
import { priceBooks, users } from '../../../db/schema';
import type { PriceBook } from '../../../shared/schemas/price-book';
import { HttpError } from '../../lib/errors';

export interface StoredPriceBook {
  version: number;
  data: PriceBook;
  note: string | null;
  createdAt: Date;
}

const columns = { version: priceBooks.version, data: priceBooks.data, note: priceBooks.note, createdAt: priceBooks.createdAt };

/** The highest version, or undefined when no price book was ever saved. */
export async function findLatestPriceBook(db: Db): Promise<StoredPriceBook | undefined> {
  const [row] = await db.select(columns).from(priceBooks).orderBy(desc(priceBooks.version)).limit(1);
  return row;
}

/**
 * Inserts the next version (max + 1, computed in the same statement). Two admins saving at the
 * same instant collide on the unique version; the loser is retried by the service.
 */
export async function insertNextPriceBook(db: Db, data: PriceBook, createdBy: string | null, note?: string): Promise<StoredPriceBook> {
  const [row] = await db
    .insert(priceBooks)
    .values({ version: sql`(select coalesce(max(${priceBooks.version}), 0) + 1 from ${priceBooks})`, data, createdBy, note: note ?? null })
    .returning(columns);
  return row!;
}

/** Inserts exactly `version`; a concurrent save of the same version loses on the unique key (23505). */
export async function insertPriceBookVersion(db: Db, version: number, data: PriceBook, createdBy: string, note: string): Promise<StoredPriceBook> {
  const [row] = await db.insert(priceBooks).values({ version, data, createdBy, note }).returning(columns);
  return row!;
}

/** Saved versions, newest first, with the name of the admin who saved each. */
export async function listPriceBookVersions(db: Db, limit: number) {
  return db
    .select({ version: priceBooks.version, note: priceBooks.note, createdBy: users.name, createdAt: priceBooks.createdAt })
    .from(priceBooks)
    .leftJoin(users, eq(users.id, priceBooks.createdBy))
    .orderBy(desc(priceBooks.version))
    .limit(limit);
}

/** The data of one version, or undefined. */
export async function findPriceBookVersion(db: Db, version: number): Promise<PriceBook | undefined> {
  const [row] = await db.select({ data: priceBooks.data }).from(priceBooks).where(eq(priceBooks.version, version));
  return row?.data;
}

/** The highest version below `version` (the one it replaced), or undefined for the first. */
export async function findPreviousVersion(db: Db, version: number): Promise<number | undefined> {
  const [row] = await db
    .select({ version: priceBooks.version })
    .from(priceBooks)
    .where(lt(priceBooks.version, version))
    .orderBy(desc(priceBooks.version))
    .limit(1);
  return row?.version;
}

export interface ActivePriceBook {
  version: number;
  data: PriceBook;
  createdAt: Date;
}

/** The active (highest) version; 503 `no-price-book` when none was ever saved. */
export async function getActivePriceBook(db: Db): Promise<ActivePriceBook> {
  const row = await findLatestPriceBook(db);
  if (!row) throw new HttpError(503, 'no-price-book', 'No price book has been saved yet; an admin must save one (the demo seed adds version 1).');
  return { version: row.version, data: row.data, createdAt: row.createdAt };
}

/** One saved version (revisions keep the version they were priced with, e.g. for the deposit %). */
export async function getPriceBookVersion(db: Db, version: number): Promise<PriceBook> {
  const [row] = await db.select(columns).from(priceBooks).where(eq(priceBooks.version, version));
  if (!row) throw new HttpError(500, 'internal', `Price book version ${version} is missing.`);
  return row.data;
}

/** A unique-constraint violation (PostgreSQL 23505), also when drizzle wraps the driver's error. */
export function isUniqueViolation(err: unknown): boolean {
  for (let e: unknown = err; e && typeof e === 'object'; e = (e as { cause?: unknown }).cause) {
    if ((e as { code?: unknown }).code === '23505') return true;
  }
  return false;
}
