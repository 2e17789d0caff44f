import passportModule from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import type { AuthService } from '../services/auth.service.js';

export type PassportInstance = passportModule.PassportStatic;

/** A passport instance of this app's own (tests build several apps in one process). */
export function createPassport(auth: AuthService): PassportInstance {
  const passport = new passportModule.Passport() as unknown as PassportInstance;
  passport.use(
    new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, (email, password, done) => {
      auth.verifyCredentials(email, password).then((user) => done(null, user ?? false), done);
    }),
  );
  passport.serializeUser<number>((user, done) => done(null, user.id));
  passport.deserializeUser<number>((id, done) => {
    auth.sessionUser(id).then((user) => done(null, user ?? false), done);
  });
  return passport;
}
