import passport from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import { emailSchema } from '../../../shared/schemas/user.schema';
import type { SessionActor } from '../../common/session-actor';
import type { AuthService } from './auth.service';

/**
 * A Passport instance of its own per app (never the global one), so several apps in
 * one process (tests) cannot share strategies or serializers. The session stores only
 * the user id; each request reloads the user, so a deactivated user is out at once.
 */
export function createPassport(auth: AuthService): passport.Authenticator {
  const instance = new passport.Authenticator();
  instance.use(
    new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, (email, password, done) => {
      const parsed = emailSchema.safeParse(email);
      if (!parsed.success) return done(null, false);
      auth.verifyCredentials(parsed.data, password).then(
        (actor) => done(null, actor ?? false),
        (err: unknown) => done(err),
      );
    }),
  );
  instance.serializeUser<string>((user, done) => done(null, (user as SessionActor).id));
  instance.deserializeUser<string>((id, done) => {
    auth.loadActor(id).then(
      (actor) => done(null, actor ?? false),
      (err: unknown) => done(err),
    );
  });
  return instance;
}
