import type { RequestHandler } from 'express';
import type { Role, SessionUser } from '../../../shared/schemas/auth';
import { forbidden, unauthorized } from '../errors';

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    // passport's req.user is our session user
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type
    interface User extends SessionUser {}
  }
}

export const STAFF_ROLES: readonly Role[] = ['sales', 'shop', 'admin'];

/** 401 unless signed in. */
export const requireUser: RequestHandler = (req, _res, next) => {
  next(req.user ? undefined : unauthorized());
};

/** 401 unless signed in, 403 unless the user's role is one of `roles`. */
export function requireRole(...roles: Role[]): RequestHandler {
  return (req, _res, next) => {
    if (!req.user) return next(unauthorized());
    if (!roles.includes(req.user.role)) return next(forbidden());
    next();
  };
}

export const isStaff = (user: SessionUser) => STAFF_ROLES.includes(user.role);

/** The signed-in user of a request that passed requireUser/requireRole. */
export function currentUser(req: { user?: SessionUser }): SessionUser {
  if (!req.user) throw unauthorized();
  return req.user;
}
