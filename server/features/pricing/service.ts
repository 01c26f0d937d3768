/**
 * The price book: the active one is the highest version; every save is a new version (old ones
 * stay, revisions name the version they were priced with).
 */
import type { Db } from '../../../db';
import type { PriceBook, PriceBookChange, PriceBookVersionSummary } from '../../../shared/schemas/price-book';
import type { CostInput } from '../../../shared/thermal/cost-proxy';
import { conflict, notFound } from '../../lib/errors';
import { costFromPriceBook } from './cost';
import { diffPriceBooks } from './diff';
import * as repo from './repository';
import { getActivePriceBook, type ActivePriceBook } from './repository';

export { getActivePriceBook, type ActivePriceBook };

/** Saves `data` (already validated) as the next version. */
export async function savePriceBook(db: Db, data: PriceBook, userId: string | null, note?: string): Promise<ActivePriceBook> {
  for (let attempt = 1; ; attempt++) {
    try {
      const row = await repo.insertNextPriceBook(db, data, userId, note);
      return { version: row.version, data: row.data, createdAt: row.createdAt };
    } catch (err) {
      if (attempt >= 3 || !repo.isUniqueViolation(err)) throw err;
    }
  }
}

/**
 * An admin's save: the edit started from `baseVersion`, so it becomes exactly `baseVersion + 1`.
 * When another admin saved meanwhile (the active version moved on, or a concurrent save took the
 * same number on the unique key) it is refused with 409 `stale-version` and nothing is stored.
 */
export async function saveEditedPriceBook(
  db: Db,
  input: { priceBook: PriceBook; baseVersion: number; note: string },
  userId: string,
): Promise<ActivePriceBook> {
  const stale = (active: number) =>
    conflict(
      `The price book changed while you edited it: you started from version ${input.baseVersion}, the active one is ${active}. Reload, redo your change and save again.`,
      'stale-version',
    );
  const active = await getActivePriceBook(db);
  if (active.version !== input.baseVersion) throw stale(active.version);
  try {
    const row = await repo.insertPriceBookVersion(db, input.baseVersion + 1, input.priceBook, userId, input.note);
    return { version: row.version, data: row.data, createdAt: row.createdAt };
  } catch (err) {
    if (repo.isUniqueViolation(err)) throw stale((await getActivePriceBook(db)).version);
    throw err;
  }
}

/** The history, newest first (at most `limit` versions). */
export async function listVersions(db: Db, limit = 200): Promise<PriceBookVersionSummary[]> {
  const rows = await repo.listPriceBookVersions(db, limit);
  return rows.map((r) => ({ version: r.version, note: r.note, createdBy: r.createdBy, createdAt: r.createdAt.toISOString() }));
}

/** What `version` changed against the version before it (the first version: everything added). */
export async function versionDiff(db: Db, version: number): Promise<{ version: number; previousVersion: number | null; changes: PriceBookChange[] }> {
  const after = await repo.findPriceBookVersion(db, version);
  if (!after) throw notFound(`There is no price book version ${version}.`);
  const previousVersion = (await repo.findPreviousVersion(db, version)) ?? null;
  const before = previousVersion === null ? {} : await repo.findPriceBookVersion(db, previousVersion);
  return { version, previousVersion, changes: diffPriceBooks(before, after) };
}

export interface ActivePricing extends ActivePriceBook {
  /** the sizing search's cost function for this version (built once per version per process) */
  costOf: (design: CostInput) => number;
}

const costCache = new Map<number, (design: CostInput) => number>();

/** The active book with its cost function, for sizing and pricing a quote in one go. */
export async function getActivePricing(db: Db): Promise<ActivePricing> {
  const active = await getActivePriceBook(db);
  let costOf = costCache.get(active.version);
  if (!costOf) {
    costOf = costFromPriceBook(active.data);
    costCache.clear();
    costCache.set(active.version, costOf);
  }
  return { ...active, costOf };
}
