/** The offer PDF of a quote revision, rendered on request from the frozen revision (reproducible). */
import type { Db } from '../../../db';
import type { SessionUser } from '../../../shared/schemas/auth';
import { isStaff } from '../../lib/auth/guards';
import { notFound } from '../../lib/errors';
import type { AttachmentRenderer, MailFile } from '../../lib/mail';
import type { QuoteDeps } from './deps';
import { FABRICATOR, OFFER_TERMS } from './fabricator';
import { renderOfferPdf } from './offer-pdf';
import { getPriceBookVersion } from '../pricing/repository';
import { customerPrice } from './present';
import * as repo from './repository';
import { loadVisible } from './service';

type QuoteRow = NonNullable<Awaited<ReturnType<typeof repo.findQuote>>>;
type RevisionRow = NonNullable<Awaited<ReturnType<typeof repo.findRevision>>>;

/** The customer's document: the price as customers see it, whoever downloads it. */
async function renderRevision(db: Db, row: QuoteRow, rev: RevisionRow, units: 'SI' | 'US') {
  const book = await getPriceBookVersion(db, rev.priceBookVersion);
  const pdf = await renderOfferPdf({
    fabricator: FABRICATOR,
    customer: { organizationName: row.organizationName, contactName: row.submittedByName, contactEmail: row.submittedByEmail },
    quote: { number: row.number, reference: row.reference, quantity: rev.data.price.quantity, needBy: row.needBy },
    revision: { ...rev.data, price: customerPrice(rev.data.price) },
    issuedAt: new Date(rev.createdAt).toISOString(),
    units,
    depositPct: book.deposit_pct,
    showLines: 'summary',
    terms: OFFER_TERMS,
  });
  return { pdf, filename: `${row.number}-rev${rev.number}.pdf` };
}

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
  return renderRevision(deps.db, row, rev, opts.units);
}

/**
 * The mail worker's renderer: the offer PDF an e-mail names, from its frozen offer revision, so the
 * attachment of a retry or a resend is the same document. Only offer revisions are ever attached.
 */
export function offerAttachmentRenderer(db: Db): AttachmentRenderer {
  return async (ref): Promise<MailFile> => {
    const row = await repo.findQuote(db, ref.quoteId);
    const rev = row && (await repo.findRevision(db, ref.quoteId, ref.revision));
    if (!row || !rev || rev.kind !== 'offer') throw new Error(`No offer revision ${ref.revision} of quote ${ref.quoteId} to attach.`);
    const { pdf, filename } = await renderRevision(db, row, rev, ref.units ?? 'SI');
    return { filename, content: pdf, contentType: 'application/pdf' };
  };
}
