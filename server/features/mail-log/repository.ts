import { and, count, desc, eq, ilike, or, type SQL } from 'drizzle-orm';
import type { Db } from '../../../db';
import { mailLog } from '../../../db/schema';
import type { ListMailQuery } from '../../../shared/schemas/mail-log';

const summaryColumns = {
  id: mailLog.id,
  to: mailLog.to,
  subject: mailLog.subject,
  status: mailLog.status,
  attempts: mailLog.attempts,
  lastError: mailLog.lastError,
  createdAt: mailLog.createdAt,
  sentAt: mailLog.sentAt,
  resendOf: mailLog.resendOf,
};

/** One page, newest first; `q` is matched literally (its % and _ are not wildcards) in recipient or subject. */
export async function listMail(db: Db, query: ListMailQuery) {
  const where: SQL[] = [];
  if (query.status) where.push(eq(mailLog.status, query.status));
  if (query.q) {
    const like = `%${query.q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
    where.push(or(ilike(mailLog.to, like), ilike(mailLog.subject, like))!);
  }
  const condition = where.length ? and(...where) : undefined;
  const [items, [total]] = await Promise.all([
    db
      .select(summaryColumns)
      .from(mailLog)
      .where(condition)
      .orderBy(desc(mailLog.createdAt), desc(mailLog.id))
      .limit(query.pageSize)
      .offset((query.page - 1) * query.pageSize),
    db.select({ n: count() }).from(mailLog).where(condition),
  ]);
  return { items, total: total?.n ?? 0 };
}

export async function findMail(db: Db, id: string) {
  const [row] = await db
    .select({ ...summaryColumns, text: mailLog.text, updatedAt: mailLog.updatedAt })
    .from(mailLog)
    .where(eq(mailLog.id, id));
  return row;
}
export type MailRow = NonNullable<Awaited<ReturnType<typeof findMail>>>;
