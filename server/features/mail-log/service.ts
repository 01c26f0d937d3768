import type { Db } from '../../../db';
import type { ListMailQuery, MailDetail, MailList, MailSummary } from '../../../shared/schemas/mail-log';
import { conflict, notFound } from '../../lib/errors';
import type { Mailer } from '../../lib/mail';
import * as repo from './repository';

export interface MailLogDeps {
  db: Db;
  mailer: Mailer;
}

const iso = (value: Date | string) => new Date(value).toISOString();

function toSummary(row: Omit<repo.MailRow, 'text' | 'updatedAt'>): MailSummary {
  return {
    id: row.id,
    to: row.to,
    subject: row.subject,
    status: row.status,
    attempts: row.attempts,
    lastError: row.lastError,
    createdAt: iso(row.createdAt),
    sentAt: row.sentAt ? iso(row.sentAt) : null,
    resendOf: row.resendOf,
  };
}

const toDetail = (row: repo.MailRow): MailDetail => ({ ...toSummary(row), text: row.text, updatedAt: iso(row.updatedAt) });

export async function listMail(deps: MailLogDeps, query: ListMailQuery): Promise<MailList> {
  const { items, total } = await repo.listMail(deps.db, query);
  return { items: items.map(toSummary), total, page: query.page, pageSize: query.pageSize };
}

export async function getMail(deps: MailLogDeps, id: string): Promise<MailDetail> {
  const row = await repo.findMail(deps.db, id);
  if (!row) throw notFound('There is no such message in the mail log.');
  return toDetail(row);
}

/**
 * Queues a copy of a sent or failed message (the copy names the one it resends). A message still
 * waiting in the queue is refused: it will be tried again on its own, and a copy would send it twice.
 */
export async function resendMail(deps: MailLogDeps, id: string): Promise<MailDetail> {
  const row = await repo.findMail(deps.db, id);
  if (!row) throw notFound('There is no such message in the mail log.');
  if (row.status === 'queued') throw conflict('This message is still waiting to be sent; resend it once it has been sent or has failed.', 'still-queued');
  const copyId = await deps.mailer.resend(id);
  const copy = copyId ? await repo.findMail(deps.db, copyId) : undefined;
  if (!copy) throw notFound('There is no such message in the mail log.');
  return toDetail(copy);
}
