/** Seeds version 1 of the invented demo price book when no price book exists (idempotent). */
import { demoPriceBook } from '../server/features/pricing/demo-price-book';
import { findLatestPriceBook } from '../server/features/pricing/repository';
import { savePriceBook } from '../server/features/pricing/service';
import type { Db } from './index';

/** Returns the version added, or undefined when a price book was already there. */
export async function seedPriceBook(db: Db): Promise<number | undefined> {
  if (await findLatestPriceBook(db)) return undefined;
  const saved = await savePriceBook(db, demoPriceBook, null, 'Demo price book of Alder Creek Thermal Works (invented figures)');
  return saved.version;
}
