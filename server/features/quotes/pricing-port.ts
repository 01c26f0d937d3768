/**
 * The quote workflow's view of pricing and sizing together: size (or evaluate) a design with the
 * active price book as the cost function, then price it. Thermal and pricing failures become 422s.
 */
import type { SessionUser } from '../../../shared/schemas/auth';
import type { DesignEdit, FreeLine, Revision } from '../../../shared/schemas/quotes';
import type { Design, SizeRequest } from '../../../shared/schemas/thermal';
import { priceDesign } from '../pricing/price';
import { getActivePricing } from '../pricing/service';
import type { Config } from '../../lib/config';
import { evaluateInPool, sizeInPool, type BookRef } from '../../lib/thermal-pool';
import type { QuoteDeps } from './deps';

export type ActiveBook = Awaited<ReturnType<typeof getActivePricing>>;

export async function activeBook(deps: QuoteDeps): Promise<ActiveBook> {
  return getActivePricing(deps.db);
}

/** The book as the thermal worker needs it: the worker rebuilds the cost function once per version. */
const bookRef = (book: ActiveBook): BookRef => ({ version: book.version, createdAt: book.createdAt, data: book.data });

/**
 * Sizes the duty ranked by the fabricator's own prices, in the thermal worker pool (within
 * THERMAL_TIME_BUDGET_MS); the recommended design plus alternatives.
 */
export async function sizeWithBook(config: Config, duty: SizeRequest, book: ActiveBook): Promise<{ design: Design; alternatives: Design[] }> {
  const result = await sizeInPool(config, duty, { book: bookRef(book), maxCandidates: 12 });
  // the candidates crossed a thread boundary: the recommended one is the first, not the same object
  const [design, ...alternatives] = result.candidates;
  return { design: design ?? result.recommended, alternatives };
}

/** Rates a hand-set geometry for the duty, priced by the book's cost function, in the worker pool. */
export function evaluateWithBook(config: Config, duty: SizeRequest, edit: DesignEdit, book: ActiveBook): Promise<Design> {
  return evaluateInPool(config, duty, edit, bookRef(book));
}

export function priceWithBook(
  design: Design,
  book: ActiveBook,
  opts: {
    quantity: number;
    needBy?: string | null;
    overrides?: { key: string; amount_minor: number; reason: string; by: string }[];
    freeLines?: (FreeLine & { by: string })[];
  },
): Revision['price'] {
  // a design the book cannot price throws PricingError, an HttpError 422 naming the missing entry
  return priceDesign(design, book.data, book.version, {
    quantity: opts.quantity,
    ...(opts.needBy ? { needBy: opts.needBy } : {}),
    ...(opts.overrides?.length ? { overrides: opts.overrides } : {}),
    ...(opts.freeLines?.length ? { freeLines: opts.freeLines } : {}),
  });
}

/** A revision record: everything needed to reproduce the offer later. */
export function buildRevision(
  number: number,
  kind: Revision['kind'],
  by: SessionUser,
  duty: SizeRequest,
  design: Design,
  alternatives: Design[],
  price: Revision['price'],
  book: ActiveBook,
  validUntil?: string,
): Revision {
  return {
    number,
    kind,
    createdAt: new Date().toISOString(),
    createdBy: by.name,
    duty,
    design,
    alternatives: alternatives.map(({ rating: _r, ...a }) => a),
    price,
    leadTimeWeeks: book.data.standardLeadTimeWeeks,
    ...(validUntil ? { validUntil } : {}),
  };
}
