/** E-mail for every state change that concerns someone, queued (never blocks the request). */
import type { QuoteDetail } from '../../../shared/schemas/quotes';
import type { QuoteDeps } from './deps';
import * as repo from './repository';

const money = (minor: number, currency: string) =>
  new Intl.NumberFormat('en-US', { style: 'currency', currency }).format(minor / 100);

const link = (deps: QuoteDeps, id: string) => `${deps.config.APP_URL}/quotes/${id}`;
const SIGNATURE = '\n\nAlder Creek Thermal Works · Bundlesmith';

async function customerAddress(deps: QuoteDeps, quoteId: string) {
  const row = await repo.findQuote(deps.db, quoteId);
  return row ? { email: row.submittedByEmail, name: row.submittedByName } : undefined;
}

export async function notifySubmitted(deps: QuoteDeps, q: QuoteDetail) {
  const to = await repo.staffEmails(deps.db, 'sales');
  for (const email of to) {
    await deps.mailer.send({
      to: email,
      subject: `New request ${q.number} from ${q.organizationName}`,
      text:
        `${q.submittedBy.name} of ${q.organizationName} asks for a cooler: ${q.designSummary} was sized, ` +
        `budget ${money(q.priceTotal_minor, q.currency)} for ${q.quantity} unit(s).\n` +
        `Review it within the response target: ${link(deps, q.id)}${SIGNATURE}`,
    });
  }
}

export async function notifyCustomer(deps: QuoteDeps, quoteId: string, subject: string, body: string) {
  const to = await customerAddress(deps, quoteId);
  if (!to) return;
  await deps.mailer.send({ to: to.email, subject, text: `Hello ${to.name},\n\n${body}\n\n${link(deps, quoteId)}${SIGNATURE}` });
}

export async function notifySales(deps: QuoteDeps, quoteId: string, assigneeEmail: string | undefined, subject: string, body: string) {
  const to = assigneeEmail ? [assigneeEmail] : await repo.staffEmails(deps.db, 'sales');
  for (const email of to) {
    await deps.mailer.send({ to: email, subject, text: `${body}\n\n${link(deps, quoteId)}${SIGNATURE}` });
  }
}

export { money };
