import { Passport } from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import type { AuthService } from './service';

/** A passport instance of its own per app, so apps built in tests never share strategies. */
export type AppPassport = InstanceType<typeof Passport>;

export function createPassport(auth: AuthService): AppPassport {
  const passport = new Passport();
  passport.use(
    'local',
    new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, (email, password, done) => {
      auth.verifyCredentials(email, password).then((user) => done(null, user ?? false), done);
    }),
  );
  passport.serializeUser((user, done) => done(null, (user as Express.User).id));
  passport.deserializeUser((id: unknown, done) => {
    // false ends the session quietly: the account was deleted or deactivated since sign-in.
    if (typeof id !== 'number') return done(null, false);
    auth.findActiveUser(id).then((user) => done(null, user ?? false), done);
  });
  return passport;
}
