import { Router } from 'express';
import type pg from 'pg';
import {
  loginSchema,
  registerConfirmSchema,
  registerSchema,
  resetConfirmSchema,
  resetRequestSchema,
  type SessionUser,
} from '../../../shared/schemas/auth';
import type { createPassport } from '../../lib/auth/passport';
import { HttpError, unauthorized } from '../../lib/errors';
import { loginLimiters, mailLimiter, rememberSignInAddress } from '../../lib/rate-limits';
import { parse } from '../../lib/validate';
import * as service from './service';

type PassportInstance = ReturnType<typeof createPassport>;

export function authRouter(deps: service.AuthDeps, pool: pg.Pool, passport: PassportInstance): Router {
  const r = Router();

  r.post('/login', ...loginLimiters(deps.config, pool), (req, res, next) => {
    req.body = parse(loginSchema, req.body);
    passport.authenticate('local', (err: unknown, user: SessionUser | false) => {
      if (err) return next(err);
      if (!user) return next(new HttpError(401, 'invalid-credentials', 'The e-mail address or the password is wrong.'));
      // passport ≥ 0.6 regenerates the session here: a new session id at every sign-in.
      req.logIn(user, (loginErr) => {
        if (loginErr) return next(loginErr);
        // this address becomes one the account's cap across addresses does not hold (see rate-limits.ts)
        rememberSignInAddress(pool, req)
          .catch(() => undefined)
          .then(() => res.json({ user }), next);
      });
    })(req, res, next);
  });

  r.post('/logout', (req, res, next) => {
    req.logout((err) => {
      if (err) return next(err);
      req.session.destroy((destroyErr) => {
        if (destroyErr) return next(destroyErr);
        res.clearCookie('bundlesmith.sid').status(204).end();
      });
    });
  });

  r.get('/me', (req, res) => {
    if (!req.user) throw unauthorized('Not signed in.');
    res.json({ user: req.user });
  });

  // A new organisation: 202 and the same message whether or not the e-mail or the organisation
  // exists; the mailbox gets the link (or a notice). An invitation signs in at once (201 { user }).
  r.post('/register', mailLimiter(pool, 'register'), async (req, res, next) => {
    const input = parse(registerSchema, req.body);
    if (input.inviteToken !== undefined) {
      const user = await service.registerInvited(deps, { ...input, inviteToken: input.inviteToken });
      return req.logIn(user, (err) => (err ? next(err) : res.status(201).json({ user })));
    }
    await service.requestRegistration(deps, { ...input, organizationName: input.organizationName! });
    res.status(202).json({ message: service.REGISTRATION_SENT });
  });

  r.post('/register/confirm', mailLimiter(pool, 'register-confirm'), async (req, res, next) => {
    const { token } = parse(registerConfirmSchema, req.body);
    const user = await service.confirmRegistration(deps, token);
    req.logIn(user, (err) => (err ? next(err) : res.status(201).json({ user })));
  });

  r.post('/password-reset/request', mailLimiter(pool, 'reset'), async (req, res) => {
    const { email } = parse(resetRequestSchema, req.body);
    await service.requestPasswordReset(deps, email);
    res.status(202).json({ message: 'If an account exists for this address, a reset link is on its way.' });
  });

  r.post('/password-reset/confirm', async (req, res) => {
    await service.confirmPasswordReset(deps, parse(resetConfirmSchema, req.body));
    res.status(204).end();
  });

  return r;
}
