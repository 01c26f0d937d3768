/**
 * E-mail for every state change that concerns someone. Each helper takes the transaction of the
 * change it reports: the message is queued in it (transactional outbox), so the change and its
 * e-mail commit together or not at all, and the request never waits for the SMTP server.
 */
import { formatMoney, plural } from '../../../shared/format';
import type { MailAttachmentRef } from '../../lib/mail';
import type { Executor } from '../../lib/sql-adapter';
import type { QuoteDeps } from './deps';
import * as repo from './repository';

const money = formatMoney;

const link = (deps: QuoteDeps, id: string) => `${deps.config.APP_URL}/quotes/${id}`;
const SIGNATURE = '\n\nAlder Creek Thermal Works · Bundlesmith';

/** What sales hear of a new request: the figures as stored, taken from the request itself. */
export interface SubmittedQuote {
  id: string;
  number: string;
  organizationName: string;
  submittedByName: string;
  reference: string | null;
  designSummary: string;
  priceTotal_minor: number;
  currency: string;
  quantity: number;
}

export async function notifySubmitted(deps: QuoteDeps, tx: Executor, q: SubmittedQuote) {
  const to = await repo.staffEmails(tx, 'sales');
  for (const email of to) {
    await deps.mailer.send(
      {
        to: email,
        subject: `New request ${q.number} from ${q.organizationName}`,
        text:
          `${q.submittedByName} of ${q.organizationName} asks for a cooler${q.reference ? ` (their reference: ${q.reference})` : ''}: ` +
          `${q.designSummary} was sized, budget ${money(q.priceTotal_minor, q.currency)} for ${plural(q.quantity, 'unit')}.\n` +
          `Review it within the response target: ${link(deps, q.id)}${SIGNATURE}`,
      },
      tx,
    );
  }
}

/** To the quote's submitter, with the documents `attachments` names (the offer PDF). */
export async function notifyCustomer(deps: QuoteDeps, tx: Executor, quoteId: string, subject: string, body: string, attachments?: MailAttachmentRef[]) {
  const row = await repo.findQuote(tx, quoteId);
  if (!row) return;
  await deps.mailer.send(
    {
      to: row.submittedByEmail,
      subject,
      text: `Hello ${row.submittedByName},\n\n${body}\n\n${link(deps, quoteId)}${SIGNATURE}`,
      ...(attachments?.length ? { attachments } : {}),
    },
    tx,
  );
}

/** To the assignee, or to every sales engineer while nobody has taken the quote. */
export async function notifySales(deps: QuoteDeps, tx: Executor, quoteId: string, assigneeEmail: string | undefined, subject: string, body: string) {
  const to = assigneeEmail ? [assigneeEmail] : await repo.staffEmails(tx, 'sales');
  for (const email of to) {
    await deps.mailer.send({ to: email, subject, text: `${body}\n\n${link(deps, quoteId)}${SIGNATURE}` }, tx);
  }
}

export { money };
