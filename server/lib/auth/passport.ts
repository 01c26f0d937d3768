import { Passport } from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import type { Db } from '../../../db';
import type { SessionUser } from '../../../shared/schemas/auth';
import { findSessionUser } from '../../features/auth/repository';

/**
 * One passport instance per app (tests build several apps). The session stores only the user id;
 * each request reloads the user, so a disabled account or changed role takes effect at once.
 */
export function createPassport(
  db: Db,
  verify: (email: string, password: string) => Promise<SessionUser | null>,
): InstanceType<typeof Passport> {
  const passport = new Passport();
  passport.use(
    new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, (email, password, done) => {
      verify(email, password).then((user) => done(null, user ?? false), done);
    }),
  );
  passport.serializeUser<string>((user, done) => done(null, user.id));
  passport.deserializeUser<string>((id, done) => {
    findSessionUser(db, id).then((user) => done(null, user ?? false), done);
  });
  return passport;
}
