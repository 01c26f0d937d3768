/**
 * The price book: the active one is the highest version; every save is a new version (old ones
 * stay, revisions name the version they were priced with).
 */
import type { Db } from '../../../db';
import type { PriceBook } from '../../../shared/schemas/price-book';
import type { CostInput } from '../../../shared/thermal/cost-proxy';
import { costFromPriceBook } from './cost';
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
