/** Words for the mail log: status tags, and what an SMTP error means for the person reading it. */
import type { MailStatus } from '@shared/schemas/mail-log';

export { MAIL_STATUS_LABEL } from '@shared/schemas/mail-log';

export const MAIL_STATUS_TAG: Record<MailStatus, 'default' | 'info' | 'success' | 'error'> = {
  queued: 'info',
  sent: 'success',
  failed: 'error',
};

// the error text as nodemailer words it: a Node network code, or the SMTP server's numbered reply
// after a colon ("Message failed: 550 5.1.1 …"); digits elsewhere (an address's port) mean nothing
const EXPLANATIONS: [RegExp, string][] = [
  [/ECONNREFUSED/, 'The mail server refused the connection: it may be down, or the address in SMTP_URL may be wrong.'],
  [/ENOTFOUND|EAI_AGAIN/, 'The mail server’s name could not be found: check the host in SMTP_URL.'],
  [/ETIMEDOUT|timeout|Greeting never received/i, 'The mail server did not answer in time.'],
  [/Invalid login|(^|: )53[45][ -]/, 'The mail server refused the application’s sign-in: check the user and password in SMTP_URL.'],
  [/(^|: )5\d\d[ -]/, 'The mail server refused the message or its recipient address.'],
  [/(^|: )4\d\d[ -]/, 'The mail server asked to try again later.'],
  [/ECONNRESET|closed/i, 'The connection to the mail server was cut off before the message was taken.'],
];

/** A sentence about a delivery error; null when there is none. */
export function explainMailError(lastError: string | null): string | null {
  if (!lastError) return null;
  return EXPLANATIONS.find(([pattern]) => pattern.test(lastError))?.[1] ?? 'The mail server did not take the message.';
}
