/**
 * The admin's mail log: every e-mail the app queued, whether it went out, how often it was tried and
 * why it failed, and a resend.
 */
import { z } from 'zod';

export const mailStatuses = ['queued', 'sent', 'failed'] as const;
export const mailStatusSchema = z.enum(mailStatuses);
export type MailStatus = z.infer<typeof mailStatusSchema>;

export const MAIL_STATUS_LABEL: Record<MailStatus, string> = { queued: 'Waiting to send', sent: 'Sent', failed: 'Failed' };

export const listMailQuerySchema = z.object({
  status: mailStatusSchema.optional(),
  /** part of the recipient or the subject */
  q: z
    .string()
    .trim()
    .max(100)
    .regex(/^[^\u0000-\u001F\u007F]*$/, { error: 'contains a control character' })
    .optional(),
  page: z.coerce.number().int().min(1).max(10_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(20),
});
export type ListMailQuery = z.infer<typeof listMailQuerySchema>;

export const mailIdParamsSchema = z.object({ id: z.uuid({ error: 'must be a mail log id (UUID)' }) });

export const mailSummarySchema = z.object({
  id: z.uuid(),
  to: z.string(),
  subject: z.string(),
  status: mailStatusSchema,
  attempts: z.int(),
  lastError: z.string().nullable(),
  createdAt: z.string(),
  sentAt: z.string().nullable(),
  /** the message this one resends */
  resendOf: z.uuid().nullable(),
});
export type MailSummary = z.infer<typeof mailSummarySchema>;

export const mailDetailSchema = mailSummarySchema.extend({ text: z.string(), updatedAt: z.string() });
export type MailDetail = z.infer<typeof mailDetailSchema>;

export const mailListSchema = z.object({ items: z.array(mailSummarySchema), total: z.int(), page: z.int(), pageSize: z.int() });
export type MailList = z.infer<typeof mailListSchema>;
