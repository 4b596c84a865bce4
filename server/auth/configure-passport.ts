import { Authenticator } from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import type { DataSource } from 'typeorm';
import { User } from '../entities/user';
import { passwords } from './passwords';
import type { ShortLivedCache } from './short-lived-cache';

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
        .then(async (user) =>
          (await passwords.verify(password, user?.passwordHash)) && user ? done(null, user) : done(null, false),
        )
        .catch(done);
    }),
  );
  passport.serializeUser((user, done) => done(null, user.id));
  passport.deserializeUser((id: string, done) => {
    const cached = cache.get(id);
    if (cached) return done(null, users.create({ ...cached }));
    users
      .findOneBy({ id })
      .then((user) => {
        if (user) cache.set(id, user);
        done(null, user ? users.create({ ...user }) : false);
      })
      .catch(done);
  });
  return passport;
}
