import type { Db } from '../../../db';
import type { RegisterInput, ResetConfirmInput, SessionUser } from '../../../shared/schemas/auth';
import type { Config } from '../../lib/config';
import { HttpError, conflict } from '../../lib/errors';
import { decoyHash, hashPassword, verifyPassword } from '../../lib/auth/passwords';
import { hashToken, newToken } from '../../lib/auth/tokens';
import type { Mailer } from '../../lib/mail';
import * as repo from './repository';
import { openRegistration, sealRegistration } from './registration-token';

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

/** How long the link that finishes a self-registration works. */
export const REGISTRATION_LINK_HOURS = 24;

/** What every self-registration request answers, whether the address or organisation exists or not. */
export const REGISTRATION_SENT = 'Check your e-mail to continue: we sent a message to the address you gave.';

/**
 * Self-registration of a new customer organisation, step 1. The answer never says whether the
 * e-mail or the organisation exists (REGISTRATION_SENT, always); the mailbox learns it: a new address
 * gets the link that creates the account (confirmRegistration), a registered one a "someone tried to
 * register with your address" notice, and an organisation name in use an invitation hint.
 */
export async function requestRegistration(deps: AuthDeps, input: RegisterInput & { organizationName: string }): Promise<void> {
  const passwordHash = await hashPassword(input.password); // hashed either way: the same time for every answer
  const existing = await repo.findLoginByEmail(deps.db, input.email);
  const signature = `\n\nAlder Creek Thermal Works`;
  if (existing || (await repo.emailTaken(deps.db, input.email))) {
    await deps.mailer.send({
      to: input.email,
      subject: 'Someone tried to register with your address',
      text:
        `Hello${existing ? ` ${existing.name}` : ''},\n\nSomeone (perhaps you) tried to create a Bundlesmith account with this e-mail address, ` +
        `which already has one. Nothing was changed.\n\nTo sign in: ${deps.config.APP_URL}/sign-in\n` +
        `Forgot the password? ${deps.config.APP_URL}/reset-password\n\nIf it was not you, ignore this message.${signature}`,
    });
    return;
  }
  if (await repo.organizationNameTaken(deps.db, input.organizationName)) {
    await deps.mailer.send({
      to: input.email,
      subject: 'Your Bundlesmith registration',
      text:
        `Hello ${input.name},\n\nAn organisation called "${input.organizationName}" is registered already, so no account was made. ` +
        `Ask a colleague there to invite you (their administrator can), or register again under your company's full name.${signature}`,
    });
    return;
  }
  const token = sealRegistration(deps.config.SESSION_SECRET, {
    name: input.name,
    email: input.email,
    passwordHash,
    organizationName: input.organizationName,
    expiresAt: Date.now() + REGISTRATION_LINK_HOURS * 3_600_000,
  });
  await deps.mailer.send({
    to: input.email,
    subject: 'Finish creating your Bundlesmith account',
    text:
      `Hello ${input.name},\n\nFollow this link within ${REGISTRATION_LINK_HOURS} hours to create the account of ${input.organizationName}:\n\n` +
      `${deps.config.APP_URL}/register/confirm?token=${token}\n\nIf you did not ask for an account, ignore this message.${signature}`,
  });
}

/** Step 2: the link from the e-mail creates the organisation and its first user (409 when taken since). */
export async function confirmRegistration(deps: AuthDeps, token: string): Promise<SessionUser> {
  const pending = openRegistration(deps.config.SESSION_SECRET, token);
  if (!pending) {
    throw new HttpError(400, 'invalid-token', 'This registration link is not valid any more; register again.', { token: 'expired or altered' });
  }
  const userId = await deps.db.transaction(async (tx) => {
    if (await repo.emailTaken(tx, pending.email)) {
      throw conflict('Your account exists already (this link was used): sign in.', 'email-taken');
    }
    if (await repo.organizationNameTaken(tx, pending.organizationName)) {
      throw conflict(`An organisation called "${pending.organizationName}" was registered meanwhile: ask a colleague there for an invitation.`, 'organization-taken');
    }
    const organizationId = await repo.insertCustomerOrganization(tx, pending.organizationName);
    return repo.insertUser(tx, { organizationId, email: pending.email, name: pending.name, role: 'customer', passwordHash: pending.passwordHash });
  });
  return (await repo.findSessionUser(deps.db, userId))!;
}

/**
 * Registration through an admin's invitation: the invitation (sent to that address) is checked
 * first, so a made-up token learns nothing about which addresses have accounts; then the account
 * joins the invitation's organisation with its role and is signed in at once.
 */
export async function registerInvited(deps: AuthDeps, input: RegisterInput & { inviteToken: string }): Promise<SessionUser> {
  const passwordHash = await hashPassword(input.password);
  const userId = await deps.db.transaction(async (tx) => {
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
    if (await repo.emailTaken(tx, input.email)) {
      throw conflict('An account with this e-mail address exists already; sign in or reset the password.', 'email-taken');
    }
    await repo.markInvitationAccepted(tx, invitation.id);
    return repo.insertUser(tx, {
      organizationId: invitation.organizationId,
      email: input.email,
      name: input.name,
      role: invitation.role,
      passwordHash,
    });
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
