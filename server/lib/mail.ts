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

/**
 * Sends queued mail: up to 20 messages per fetch, in parallel. A message that fails is failed on
 * its own (pg-boss retries it later); the others in the batch complete, so none is sent twice.
 */
export async function startMailWorker(jobs: Jobs, transport: Transporter, from: string): Promise<void> {
  await jobs.work<MailMessage>(QUEUES.mail, { pollingIntervalSeconds: 0.5, batchSize: 20 }, async (batch) => {
    await Promise.all(
      batch.map(async (job) => {
        try {
          await transport.sendMail({ from, ...job.data });
        } catch (err) {
          await jobs.fail(QUEUES.mail, job.id, { message: (err as Error).message });
        }
      }),
    );
  });
}
