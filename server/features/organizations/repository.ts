import { asc, eq } from 'drizzle-orm';
import type { Db } from '../../../db';
import { invitations, organizations, users } from '../../../db/schema';
import type { Role } from '../../../shared/schemas/auth';
import type { Executor } from '../../lib/sql-adapter';

export async function listOrganizations(db: Db) {
  return db
    .select({ id: organizations.id, name: organizations.name, kind: organizations.kind })
    .from(organizations)
    .orderBy(asc(organizations.kind), asc(organizations.name));
}

export async function findOrganization(db: Db, id: string) {
  const [row] = await db
    .select({ id: organizations.id, name: organizations.name, kind: organizations.kind })
    .from(organizations)
    .where(eq(organizations.id, id));
  return row;
}

export async function findFabricator(db: Db) {
  const [row] = await db
    .select({ id: organizations.id, name: organizations.name })
    .from(organizations)
    .where(eq(organizations.kind, 'fabricator'))
    .limit(1);
  return row;
}

export async function listMembers(db: Db, organizationId: string) {
  return db
    .select({ id: users.id, name: users.name, email: users.email, role: users.role })
    .from(users)
    .where(eq(users.organizationId, organizationId))
    .orderBy(asc(users.name));
}

export async function userExists(db: Db, email: string) {
  const [row] = await db.select({ id: users.id }).from(users).where(eq(users.email, email));
  return row !== undefined;
}

export async function insertInvitation(
  db: Executor,
  values: { email: string; role: Role; organizationId: string; tokenHash: string; invitedBy: string; expiresAt: Date },
) {
  const [row] = await db
    .insert(invitations)
    .values(values)
    .returning({ id: invitations.id, email: invitations.email, role: invitations.role, expiresAt: invitations.expiresAt });
  return row!;
}
