import { index, integer, jsonb, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';

/** A document a message carries, rendered at send time (server/lib/mail.ts). */
export interface MailAttachmentRef {
  kind: 'offer-pdf';
  quoteId: string;
  revision: number;
  units?: 'SI' | 'US';
}

/**
 * Every e-mail the app sends, kept beyond the job queue's archive: written in the same transaction as
 * the change it reports (a transactional outbox; the queue job is inserted in that transaction too),
 * then marked sent or failed by the mail worker. Admins list failures and resend from here.
 */
export const mailLog = pgTable(
  'mail_log',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    to: text('to').notNull(),
    subject: text('subject').notNull(),
    text: text('text').notNull(),
    html: text('html'),
    /**
     * Files the message carries, named rather than stored (`[{ kind: 'offer-pdf', quoteId, revision }]`):
     * the mail worker renders each when it sends, from frozen records, so a retry or a resend carries
     * the same document and the queue never holds large bytes.
     */
    attachments: jsonb('attachments').$type<MailAttachmentRef[]>(),
    /** queued → sent, or failed once the queue has given up (retries in between keep it queued) */
    status: text('status', { enum: ['queued', 'sent', 'failed'] }).notNull().default('queued'),
    attempts: integer('attempts').notNull().default(0),
    lastError: text('last_error'),
    /** the mail_log row this one resends, if any */
    resendOf: uuid('resend_of'),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
    sentAt: timestamp('sent_at', { withTimezone: true }),
  },
  (t) => [index('mail_log_status_idx').on(t.status, t.createdAt), index('mail_log_created_idx').on(t.createdAt)],
);
