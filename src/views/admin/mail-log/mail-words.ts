/** Words for the mail log: status tags, and what an SMTP error means for the person reading it. */
import type { MailStatus } from '@shared/schemas/mail-log';

export { MAIL_STATUS_LABEL } from '@shared/schemas/mail-log';

export const MAIL_STATUS_TAG: Record<MailStatus, 'default' | 'info' | 'success' | 'error'> = {
  queued: 'info',
  sent: 'success',
  failed: 'error',
};

// the error text as nodemailer words it: a Node network code, or the SMTP server's numbered reply
const EXPLANATIONS: [RegExp, string][] = [
  [/ECONNREFUSED/, 'The mail server refused the connection: it may be down, or the address in SMTP_URL may be wrong.'],
  [/ENOTFOUND|EAI_AGAIN/, 'The mail server’s name could not be found: check the host in SMTP_URL.'],
  [/ETIMEDOUT|timeout/i, 'The mail server did not answer in time.'],
  [/ECONNRESET|closed/i, 'The connection to the mail server was cut off before the message was taken.'],
  [/EAUTH|535|534/, 'The mail server refused the application’s sign-in: check the user and password in SMTP_URL.'],
  [/\b55\d\b/, 'The mail server refused the message or its recipient address.'],
  [/\b4\d\d\b/, 'The mail server asked to try again later.'],
];

/** A sentence about a delivery error; null when there is none. */
export function explainMailError(lastError: string | null): string | null {
  if (!lastError) return null;
  return EXPLANATIONS.find(([pattern]) => pattern.test(lastError))?.[1] ?? 'The mail server did not take the message.';
}
