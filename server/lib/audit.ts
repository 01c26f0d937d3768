import { count, desc, eq } from 'drizzle-orm';
import type { Db } from '../../db';
import { auditLog, users } from '../../db/schema';

type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];

export interface AuditEntry {
  actorId: string | null;
  /** what happened, `<entity>.<verb>`: `user.role-changed`, `material.updated`, `order.ship-released` */
  action: string;
  entity: 'user' | 'organization' | 'material' | 'fluid' | 'order' | 'invoice';
  entityId: string;
  /** the changed fields only, before and after (null for a creation / a removal) */
  before: Record<string, unknown> | null;
  after: Record<string, unknown> | null;
}

/**
 * Records an admin change in the audit trail. Call it inside the transaction that makes the change,
 * so the record and the change land together or not at all.
 */
export async function recordAudit(tx: Tx | Db, entry: AuditEntry): Promise<void> {
  await tx.insert(auditLog).values(entry);
}

/** The fields of `after` whose values differ from `before`, each side limited to those fields. */
export function changedFields<T extends Record<string, unknown>>(before: T, after: Partial<T>): { before: Partial<T>; after: Partial<T> } | null {
  const b: Partial<T> = {};
  const a: Partial<T> = {};
  for (const key of Object.keys(after) as (keyof T)[]) {
    if (after[key] === undefined) continue;
    if (JSON.stringify(before[key]) === JSON.stringify(after[key])) continue;
    b[key] = before[key];
    a[key] = after[key];
  }
  return Object.keys(a).length ? { before: b, after: a } : null;
}

export interface AuditRow {
  at: string;
  actor: string | null;
  action: string;
  entity: string;
  entityId: string;
  before: unknown;
  after: unknown;
}

/** Newest first, a page at a time (the actor by name, or null for the system). */
export async function listAudit(db: Db, page: number, pageSize: number): Promise<{ items: AuditRow[]; total: number }> {
  const rows = await db
    .select({ at: auditLog.at, actor: users.name, action: auditLog.action, entity: auditLog.entity, entityId: auditLog.entityId, before: auditLog.before, after: auditLog.after })
    .from(auditLog)
    .leftJoin(users, eq(users.id, auditLog.actorId))
    .orderBy(desc(auditLog.at), desc(auditLog.id))
    .limit(pageSize)
    .offset((page - 1) * pageSize);
  const [{ n }] = await db.select({ n: count() }).from(auditLog);
  return { items: rows.map((r) => ({ ...r, at: r.at.toISOString() })), total: n };
}
