import nodemailer, { type Transporter } from 'nodemailer';
import type { Jobs } from './jobs';
import { QUEUES } from './jobs';

export interface MailMessage {
  to: string;
  subject: string;
  text: string;
  html?: string;
}

/** Queues e-mail; the worker sends it through nodemailer with retries (see startMailWorker). */
export interface Mailer {
  send(message: MailMessage): Promise<void>;
}

export function createTransport(smtpUrl: string): Transporter {
  return nodemailer.createTransport(smtpUrl);
}

export function queuedMailer(jobs: Jobs): Mailer {
  return {
    async send(message) {
      // Retried with growing delays for about an hour; a job that still fails stays in
      // pgboss.job with state 'failed', which admins can list.
      await jobs.send(QUEUES.mail, message, { retryLimit: 10, retryDelay: 5, retryBackoff: true });
    },
  };
}

export async function startMailWorker(jobs: Jobs, transport: Transporter, from: string): Promise<void> {
  await jobs.work<MailMessage>(QUEUES.mail, { pollingIntervalSeconds: 0.5 }, async (batch) => {
    for (const job of batch) {
      await transport.sendMail({ from, ...job.data });
    }
  });
}
