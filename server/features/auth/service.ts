import type { Db } from '../../../db';
import type { RegisterInput, ResetConfirmInput, SessionUser } from '../../../shared/schemas/auth';
import type { Config } from '../../lib/config';
import { HttpError, conflict } from '../../lib/errors';
import { decoyHash, hashPassword, verifyPassword } from '../../lib/auth/passwords';
import { hashToken, newToken } from '../../lib/auth/tokens';
import type { Mailer } from '../../lib/mail';
import * as repo from './repository';

export interface AuthDeps {
  db: Db;
  mailer: Mailer;
  config: Config;
}

/** The user for these credentials, or null. Unknown e-mails cost the same time as wrong passwords. */
export async function verifyCredentials(deps: AuthDeps, email: string, password: string): Promise<SessionUser | null> {
  const row = await repo.findLoginByEmail(deps.db, email);
  const ok = await verifyPassword(password, row?.passwordHash ?? (await decoyHash()));
  if (!row || !ok) return null;
  const { passwordHash: _omit, ...user } = row;
  return user;
}

/**
 * Self-registration: a new customer organisation, or joining the organisation (and role) of an
 * invitation. The invitation must be open and addressed to the same e-mail.
 */
export async function register(deps: AuthDeps, input: RegisterInput): Promise<SessionUser> {
  const passwordHash = await hashPassword(input.password);
  const userId = await deps.db.transaction(async (tx) => {
    if (await repo.emailTaken(tx, input.email)) {
      throw conflict('An account with this e-mail address exists already; sign in or reset the password.', 'email-taken');
    }
    if (input.inviteToken !== undefined) {
      const invitation = await repo.takeOpenInvitation(tx, hashToken(input.inviteToken));
      if (!invitation) {
        throw new HttpError(400, 'invalid-invitation', 'This invitation link is not valid any more; ask for a new one.', {
          inviteToken: 'expired, used or unknown',
        });
      }
      if (invitation.email !== input.email) {
        throw new HttpError(400, 'invitation-email', 'Register with the e-mail address the invitation was sent to.', {
          email: 'must be the invited address',
        });
      }
      await repo.markInvitationAccepted(tx, invitation.id);
      return repo.insertUser(tx, {
        organizationId: invitation.organizationId,
        email: input.email,
        name: input.name,
        role: invitation.role,
        passwordHash,
      });
    }
    const orgName = input.organizationName!;
    if (await repo.organizationNameTaken(tx, orgName)) {
      throw conflict(
        `An organisation called "${orgName}" is registered already: ask a colleague there for an invitation.`,
        'organization-taken',
      );
    }
    const organizationId = await repo.insertCustomerOrganization(tx, orgName);
    return repo.insertUser(tx, { organizationId, email: input.email, name: input.name, role: 'customer', passwordHash });
  });
  return (await repo.findSessionUser(deps.db, userId))!;
}

/** Sends a one-time reset link when the account exists; says nothing either way. */
export async function requestPasswordReset(deps: AuthDeps, email: string): Promise<void> {
  const user = await repo.findLoginByEmail(deps.db, email);
  if (!user) return;
  const { token, hash } = newToken();
  const ttl = deps.config.PASSWORD_RESET_TTL_MINUTES;
  const link = `${deps.config.APP_URL}/reset-password/confirm?token=${token}`;
  // the token and its e-mail commit together: no usable token without its message, nor the reverse
  await deps.db.transaction(async (tx) => {
    await repo.insertPasswordReset(tx, user.id, hash, ttl);
    await deps.mailer.send(
      {
        to: user.email,
        subject: 'Reset your Bundlesmith password',
        text:
          `Hello ${user.name},\n\nSomeone (we hope you) asked to reset the password of your Bundlesmith account.\n` +
          `Choose a new password here within ${ttl} minutes:\n\n${link}\n\n` +
          `If you did not ask for this, ignore this message; your password stays as it is.\n\nAlder Creek Thermal Works`,
      },
      tx,
    );
  });
}

export async function confirmPasswordReset(deps: AuthDeps, input: ResetConfirmInput): Promise<void> {
  const passwordHash = await hashPassword(input.password);
  await deps.db.transaction(async (tx) => {
    const reset = await repo.takeOpenPasswordReset(tx, hashToken(input.token));
    if (!reset) {
      throw new HttpError(400, 'invalid-token', 'This reset link has expired or was used already; ask for a new one.', {
        token: 'expired, used or unknown',
      });
    }
    await repo.setPassword(tx, reset.userId, passwordHash);
    await repo.closePasswordResets(tx, reset.userId);
    await repo.deleteSessionsOf(tx, reset.userId);
  });
}
