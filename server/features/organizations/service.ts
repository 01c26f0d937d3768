import type { Db } from '../../../db';
import { formatDateTime } from '../../../shared/format';
import type { InviteInput, SessionUser } from '../../../shared/schemas/auth';
import { isStaff } from '../../lib/auth/guards';
import { newToken } from '../../lib/auth/tokens';
import type { Config } from '../../lib/config';
import { HttpError, conflict, notFound } from '../../lib/errors';
import type { Mailer } from '../../lib/mail';
import * as repo from './repository';

export interface OrganizationDeps {
  db: Db;
  mailer: Mailer;
  config: Config;
}

/** An organisation with its members. Customers see only their own; any other id is "not found". */
export async function getOrganization(deps: OrganizationDeps, viewer: SessionUser, id: string) {
  if (!isStaff(viewer) && viewer.organizationId !== id) throw notFound('No such organisation.');
  const organization = await repo.findOrganization(deps.db, id);
  if (!organization) throw notFound('No such organisation.');
  return { organization, members: await repo.listMembers(deps.db, id) };
}

/**
 * An admin invites someone by e-mail: staff roles join the fabricator, the customer role joins the
 * chosen customer organisation. The link carries a one-time token valid for INVITATION_TTL_DAYS.
 */
export async function invite(deps: OrganizationDeps, admin: SessionUser, input: InviteInput) {
  if (await repo.userExists(deps.db, input.email)) {
    throw conflict('Somebody with this e-mail address has an account already.', 'email-taken');
  }
  let organization: { id: string; name: string };
  if (input.role === 'customer') {
    const org = input.organizationId ? await repo.findOrganization(deps.db, input.organizationId) : undefined;
    if (!org || org.kind !== 'customer') {
      throw new HttpError(400, 'invalid-input', 'Choose the customer organisation the new user joins.', {
        organizationId: 'a customer organisation is required for the customer role',
      });
    }
    organization = org;
  } else {
    const fabricator = await repo.findFabricator(deps.db);
    if (!fabricator) throw new HttpError(500, 'internal', 'No fabricator organisation is set up.');
    organization = fabricator;
  }
  const { token, hash } = newToken();
  const expiresAt = new Date(Date.now() + deps.config.INVITATION_TTL_DAYS * 86_400_000);
  const link = `${deps.config.APP_URL}/register?invite=${token}`;
  // the invitation and its e-mail commit together
  return deps.db.transaction(async (tx) => {
    const invitation = await repo.insertInvitation(tx, {
      email: input.email,
      role: input.role,
      organizationId: organization.id,
      tokenHash: hash,
      invitedBy: admin.id,
      expiresAt,
    });
    await deps.mailer.send(
      {
        to: input.email,
        subject: `${admin.name} invites you to Bundlesmith`,
        text:
          `Hello,\n\n${admin.name} of Alder Creek Thermal Works invites you to Bundlesmith as ${input.role} ` +
          `of ${organization.name}.\nCreate your account here (the link works once, until ${formatDateTime(expiresAt, { timeZone: 'UTC' })} UTC):\n\n${link}\n`,
      },
      tx,
    );
    return invitation;
  });
}
