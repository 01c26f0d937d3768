import { and, eq, gt, isNull, sql } from 'drizzle-orm';
import type { Db } from '../../../db';
import { invitations, organizations, passwordResets, users } from '../../../db/schema';
import type { Role, SessionUser } from '../../../shared/schemas/auth';

type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];
type Executor = Db | Tx;

const sessionUserColumns = {
  id: users.id,
  email: users.email,
  name: users.name,
  role: users.role,
  organizationId: users.organizationId,
  organizationName: organizations.name,
};

export async function findSessionUser(db: Executor, id: string): Promise<SessionUser | undefined> {
  const [row] = await db
    .select(sessionUserColumns)
    .from(users)
    .innerJoin(organizations, eq(organizations.id, users.organizationId))
    .where(and(eq(users.id, id), isNull(users.disabledAt)));
  return row;
}

export async function findLoginByEmail(db: Executor, email: string) {
  const [row] = await db
    .select({ ...sessionUserColumns, passwordHash: users.passwordHash })
    .from(users)
    .innerJoin(organizations, eq(organizations.id, users.organizationId))
    .where(and(eq(users.email, email), isNull(users.disabledAt)));
  return row;
}

export async function emailTaken(db: Executor, email: string): Promise<boolean> {
  const [row] = await db.select({ id: users.id }).from(users).where(eq(users.email, email));
  return row !== undefined;
}

export async function organizationNameTaken(db: Executor, name: string): Promise<boolean> {
  const [row] = await db
    .select({ id: organizations.id })
    .from(organizations)
    .where(sql`lower(${organizations.name}) = lower(${name})`);
  return row !== undefined;
}

export async function insertCustomerOrganization(db: Executor, name: string): Promise<string> {
  const [row] = await db.insert(organizations).values({ name, kind: 'customer' }).returning({ id: organizations.id });
  return row!.id;
}

export async function insertUser(
  db: Executor,
  values: { organizationId: string; email: string; name: string; role: Role; passwordHash: string },
): Promise<string> {
  const [row] = await db.insert(users).values(values).returning({ id: users.id });
  return row!.id;
}

export async function setPassword(db: Executor, userId: string, passwordHash: string) {
  await db.update(users).set({ passwordHash }).where(eq(users.id, userId));
}

/** Ends every session of a user (after a password reset). */
export async function deleteSessionsOf(db: Executor, userId: string) {
  await db.execute(sql`delete from session where sess->'passport'->>'user' = ${userId}`);
}

/** Locks and returns an unused, unexpired invitation by token hash. */
export async function takeOpenInvitation(db: Executor, tokenHash: string) {
  const [row] = await db
    .select()
    .from(invitations)
    .where(and(eq(invitations.tokenHash, tokenHash), isNull(invitations.acceptedAt), gt(invitations.expiresAt, sql`now()`)))
    .for('update');
  return row;
}

export async function markInvitationAccepted(db: Executor, id: string) {
  await db.update(invitations).set({ acceptedAt: sql`now()` }).where(eq(invitations.id, id));
}

export async function insertPasswordReset(db: Executor, userId: string, tokenHash: string, ttlMinutes: number) {
  await db.insert(passwordResets).values({
    userId,
    tokenHash,
    expiresAt: sql`now() + ${ttlMinutes} * interval '1 minute'`,
  });
}

/** Locks and returns an unused, unexpired reset by token hash. */
export async function takeOpenPasswordReset(db: Executor, tokenHash: string) {
  const [row] = await db
    .select()
    .from(passwordResets)
    .where(and(eq(passwordResets.tokenHash, tokenHash), isNull(passwordResets.usedAt), gt(passwordResets.expiresAt, sql`now()`)))
    .for('update');
  return row;
}

/** Marks this reset used and voids the user's other open resets. */
export async function closePasswordResets(db: Executor, userId: string) {
  await db
    .update(passwordResets)
    .set({ usedAt: sql`now()` })
    .where(and(eq(passwordResets.userId, userId), isNull(passwordResets.usedAt)));
}
