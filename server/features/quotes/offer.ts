/** The offer PDF of a quote revision, rendered on request from the frozen revision (reproducible). */
import type { SessionUser } from '../../../shared/schemas/auth';
import { isStaff } from '../../lib/auth/guards';
import { notFound } from '../../lib/errors';
import type { QuoteDeps } from './deps';
import { FABRICATOR, OFFER_TERMS } from './fabricator';
import { renderOfferPdf } from './offer-pdf';
import { getPriceBookVersion } from '../pricing/repository';
import { customerPrice } from './present';
import * as repo from './repository';
import { loadVisible } from './service';

/**
 * Customers get offers (and the budget offer while under review), never a draft; staff any revision.
 * Without a revision number: the latest offer, or the current revision for staff.
 */
export async function offerPdf(deps: QuoteDeps, user: SessionUser, id: string, opts: { revision?: number; units: 'SI' | 'US' }) {
  const row = await loadVisible(deps, user, id);
  const staff = isStaff(user);
  const number = opts.revision ?? (await repo.latestOfferRevision(deps.db, id)) ?? (staff ? row.currentRevision : 1);
  const rev = await repo.findRevision(deps.db, id, number);
  if (!rev || (!staff && rev.kind === 'draft')) throw notFound('No such offer for this quote.');
  const book = await getPriceBookVersion(deps.db, rev.priceBookVersion);
  const pdf = await renderOfferPdf({
    fabricator: FABRICATOR,
    customer: { organizationName: row.organizationName, contactName: row.submittedByName, contactEmail: row.submittedByEmail },
    quote: { number: row.number, reference: row.reference, quantity: rev.data.price.quantity, needBy: row.needBy },
    revision: { ...rev.data, price: customerPrice(rev.data.price) },
    issuedAt: new Date(rev.createdAt).toISOString(),
    units: opts.units,
    depositPct: book.deposit_pct,
    showLines: 'summary',
    terms: OFFER_TERMS,
  });
  return { pdf, filename: `${row.number}-rev${number}.pdf` };
}
