import { Authenticator } from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import type { DataSource } from 'typeorm';
import { User } from '../entities/user';
import { passwords } from './passwords';
import type { ShortLivedCache } from './short-lived-cache';

/** The `info.message` of a sign-in with the right password to a deactivated account. */
export const DEACTIVATED = 'deactivated';

/**
 * One Passport instance per app (not the global singleton), so tests can build
 * several apps side by side. The session holds only the user id; the user is read
 * again when `cache` has no fresh copy, and a role change drops that copy, so it applies at once.
 */
export function configurePassport(dataSource: DataSource, cache: ShortLivedCache<User>) {
  const passport = new Authenticator();
  const users = dataSource.getRepository(User);
  passport.use(
    new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, (email, password, done) => {
      users
        .findOneBy({ email })
        .then(async (user) => {
          if (!((await passwords.verify(password, user?.passwordHash)) && user)) return done(null, false);
          // Said only after the right password, so the answer tells a stranger nothing about the account.
          if (user.deactivatedAt) return done(null, false, { message: DEACTIVATED });
          done(null, user);
        })
        .catch(done);
    }),
  );
  passport.serializeUser((user, done) => done(null, user.id));
  passport.deserializeUser((id: string, done) => {
    // A deactivated user's session is signed out (passport drops the user id from it).
    const cached = cache.get(id);
    if (cached) return done(null, cached.deactivatedAt ? false : users.create({ ...cached }));
    users
      .findOneBy({ id })
      .then((user) => {
        if (user) cache.set(id, user);
        done(null, user && !user.deactivatedAt ? users.create({ ...user }) : false);
      })
      .catch(done);
  });
  return passport;
}
