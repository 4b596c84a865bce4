import { Authenticator } from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import type { DataSource } from 'typeorm';
import { User } from '../entities/user';
import { passwords } from './passwords';

/**
 * One Passport instance per app (not the global singleton), so tests can build
 * several apps side by side. The session holds only the user id; the user is
 * read again on every request, so a role change applies at once.
 */
export function configurePassport(dataSource: DataSource) {
  const passport = new Authenticator();
  const users = dataSource.getRepository(User);
  passport.use(
    new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, (email, password, done) => {
      users
        .findOneBy({ email })
        .then(async (user) => ((await passwords.verify(password, user?.passwordHash)) && user ? done(null, user) : done(null, false)))
        .catch(done);
    }),
  );
  passport.serializeUser((user, done) => done(null, user.id));
  passport.deserializeUser((id: string, done) => {
    users
      .findOneBy({ id })
      .then((user) => done(null, user ?? false))
      .catch(done);
  });
  return passport;
}
