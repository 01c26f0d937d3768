/**
 * The quote workflow's view of pricing and sizing together: size (or evaluate) a design with the
 * active price book as the cost function, then price it. Thermal and pricing failures become 422s.
 */
import type { SessionUser } from '../../../shared/schemas/auth';
import type { DesignEdit, Revision } from '../../../shared/schemas/quotes';
import type { Design, SizeRequest } from '../../../shared/schemas/thermal';
import { evaluateDesign } from '../../../shared/thermal/evaluate';
import { priceDesign } from '../pricing/price';
import { getActivePricing } from '../pricing/service';
import { sizeCooler } from '../thermal/service';
import type { QuoteDeps } from './deps';

export type ActiveBook = Awaited<ReturnType<typeof getActivePricing>>;

export async function activeBook(deps: QuoteDeps): Promise<ActiveBook> {
  return getActivePricing(deps.db);
}

/** Sizes the duty ranked by the fabricator's own prices; the recommended design plus alternatives. */
export function sizeWithBook(duty: SizeRequest, book: ActiveBook): { design: Design; alternatives: Design[] } {
  const result = sizeCooler(duty, { costOf: book.costOf, maxCandidates: 12 });
  return { design: result.recommended, alternatives: result.candidates.filter((c) => c !== result.recommended) };
}

export function evaluateWithBook(duty: SizeRequest, edit: DesignEdit, book: ActiveBook): Design {
  return evaluateDesign(duty, edit, book.costOf);
}

export function priceWithBook(
  design: Design,
  book: ActiveBook,
  opts: { quantity: number; needBy?: string | null; overrides?: { key: string; amount_minor: number; reason: string; by: string }[] },
): Revision['price'] {
  // a design the book cannot price throws PricingError, an HttpError 422 naming the missing entry
  return priceDesign(design, book.data, book.version, {
    quantity: opts.quantity,
    ...(opts.needBy ? { needBy: opts.needBy } : {}),
    ...(opts.overrides?.length ? { overrides: opts.overrides } : {}),
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
