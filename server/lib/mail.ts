import { eq, sql } from 'drizzle-orm';
import nodemailer, { type Transporter } from 'nodemailer';
import type PgBoss from 'pg-boss';
import type { Db } from '../../db';
import { mailLog, type MailAttachmentRef } from '../../db/schema';
import type { Jobs } from './jobs';
import { QUEUES } from './jobs';
import { jobsDb, type Executor } from './sql-adapter';

export interface MailMessage {
  to: string;
  subject: string;
  text: string;
  html?: string;
  /** documents the message carries, named here and rendered by the mail worker when it sends */
  attachments?: MailAttachmentRef[];
}

export type { MailAttachmentRef };

/** A rendered attachment, as nodemailer takes it. */
export interface MailFile {
  filename: string;
  content: Buffer;
  contentType: string;
}

/**
 * Renders the documents messages name (the offer PDF from its frozen revision). The app gives the
 * worker one; a message naming a document with no renderer fails its attempt and is retried.
 */
export type AttachmentRenderer = (ref: MailAttachmentRef) => Promise<MailFile>;

const noRenderer: AttachmentRenderer = async (ref) => {
  throw new Error(`No renderer for the mail attachment ${ref.kind}.`);
};

/**
 * Queues e-mail. Pass the transaction of the change the message reports: the mail-log row and the
 * queue job are written in it (a transactional outbox), so a crash or a rollback never leaves a
 * change without its e-mail, nor an e-mail about a change that did not happen.
 */
export interface Mailer {
  send(message: MailMessage, tx?: Executor): Promise<void>;
  /** Queues a copy of a logged message (an admin's resend); undefined when there is no such message. */
  resend(mailLogId: string): Promise<string | undefined>;
}

/** Retries with growing delays for about an hour (pg-boss: 5 s doubling, 10 retries); a job left active by a crash or an outage comes back after 2 minutes. */
const RETRY = { retryLimit: 10, retryDelay: 5, retryBackoff: true, expireInSeconds: 120 } as const;

interface MailJob {
  mailLogId: string;
}

export function createTransport(smtpUrl: string): Transporter {
  return nodemailer.createTransport(smtpUrl);
}

export function queuedMailer(jobs: Jobs, db: Db): Mailer {
  return {
    async send(message, tx) {
      if (tx) await enqueue(jobs, tx, message);
      else await db.transaction((own) => enqueue(jobs, own, message));
    },
    resend: (mailLogId) => resendMail(jobs, db, mailLogId),
  };
}

async function enqueue(jobs: Jobs, tx: Executor, message: MailMessage, resendOf?: string) {
  const [row] = await tx
    .insert(mailLog)
    .values({
      to: message.to,
      subject: message.subject,
      text: message.text,
      html: message.html ?? null,
      attachments: message.attachments?.length ? message.attachments : null,
      resendOf: resendOf ?? null,
    })
    .returning({ id: mailLog.id });
  await jobs.send(QUEUES.mail, { mailLogId: row!.id } satisfies MailJob, { ...RETRY, db: jobsDb(tx) });
  return row!.id;
}

/** Queues a copy of a logged message (an admin's resend); the copy names the one it resends. */
export async function resendMail(jobs: Jobs, db: Db, id: string): Promise<string | undefined> {
  return db.transaction(async (tx) => {
    const [old] = await tx.select().from(mailLog).where(eq(mailLog.id, id));
    if (!old) return undefined;
    const copy = { to: old.to, subject: old.subject, text: old.text, ...(old.html ? { html: old.html } : {}), ...(old.attachments ? { attachments: old.attachments } : {}) };
    return enqueue(jobs, tx, copy, old.id);
  });
}

/**
 * Sends queued mail: up to 20 messages per fetch, in parallel. A message that fails is failed on
 * its own (pg-boss retries it later) and its log row counts the attempt; the others in the batch
 * complete, so none is sent twice. After the last retry the log row says `failed`.
 */
export async function startMailWorker(jobs: Jobs, db: Db, transport: Transporter, from: string, render: AttachmentRenderer = noRenderer): Promise<void> {
  await jobs.work<MailJob>(QUEUES.mail, { pollingIntervalSeconds: 0.5, batchSize: 20, includeMetadata: true }, async (batch) => {
    await Promise.all(batch.map((job) => sendOne(jobs, db, transport, from, render, job)));
  });
}

async function sendOne(jobs: Jobs, db: Db, transport: Transporter, from: string, render: AttachmentRenderer, job: PgBoss.JobWithMetadata<MailJob>) {
  try {
    const delivery = await deliverLogged(db, transport, from, job.data.mailLogId, job.retryCount >= job.retryLimit, render);
    if (delivery.status === 'queued' || delivery.status === 'failed') await jobs.fail(QUEUES.mail, job.id, { message: delivery.error.message });
  } catch (err) {
    // the database went away mid-send: leave the job to pg-boss's expiry and retry
    console.error(`[mail] job ${job.id}: ${(err as Error).message}`);
    await jobs.fail(QUEUES.mail, job.id, { message: (err as Error).message }).catch(() => undefined);
  }
}

export type Delivery = { status: 'skipped' | 'sent' } | { status: 'queued' | 'failed'; error: Error };

/**
 * One delivery attempt of a logged message, as the mail worker makes it: the log row counts the
 * attempt and keeps the error; `lastAttempt` (no retry follows) turns a failure into `failed`.
 * Skipped when the row is gone or already sent (an earlier delivery of the same job). The documents
 * the row names are rendered first; one that cannot be rendered fails the attempt like an SMTP error.
 */
export async function deliverLogged(
  db: Db,
  transport: Transporter,
  from: string,
  mailLogId: string,
  lastAttempt: boolean,
  render: AttachmentRenderer = noRenderer,
): Promise<Delivery> {
  const [row] = await db.select().from(mailLog).where(eq(mailLog.id, mailLogId));
  if (!row || row.status === 'sent') return { status: 'skipped' };
  try {
    const attachments = await Promise.all((row.attachments ?? []).map(render));
    await transport.sendMail({
      from,
      to: row.to,
      subject: row.subject,
      text: row.text,
      ...(row.html ? { html: row.html } : {}),
      ...(attachments.length ? { attachments } : {}),
    });
  } catch (err) {
    const status = lastAttempt ? 'failed' : 'queued';
    await db
      .update(mailLog)
      .set({ attempts: sql`${mailLog.attempts} + 1`, lastError: (err as Error).message.slice(0, 2000), status, updatedAt: sql`now()` })
      .where(eq(mailLog.id, row.id));
    return { status, error: err as Error };
  }
  await db
    .update(mailLog)
    .set({ attempts: sql`${mailLog.attempts} + 1`, status: 'sent', lastError: null, sentAt: sql`now()`, updatedAt: sql`now()` })
    .where(eq(mailLog.id, row.id));
  return { status: 'sent' };
}

/** For the seed and benches: mail is dropped, not queued. */
export const discardMailer: Mailer = { send: async () => undefined, resend: async () => undefined };
