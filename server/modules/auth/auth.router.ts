import { Router, type Request } from 'express';
import type passport from 'passport';
import type {} from 'express-session';
import { signInSchema } from '../../../shared/schemas/auth.schema';
import { AppError } from '../../common/app-error';
import { requireAuth } from '../../common/auth.middleware';
import { actorOf, type SessionActor } from '../../common/session-actor';
import { validate } from '../../common/validate.middleware';
import type { UserService } from '../users/user.service';
import type { AuthService } from './auth.service';
import { signInRateLimits, type SignInLimits } from './sign-in-rate-limit';

/** One answer for unknown e-mail, wrong password and deactivated account. */
const SIGN_IN_FAILED = 'E-mail or password is incorrect';

const signIn = { body: signInSchema };
const noBody = { body: signInSchema.pick({}).strict() };

/** POST /sign-in, POST /sign-out, GET /me under /api/auth. */
export function authRouter(deps: {
  passport: passport.Authenticator;
  auth: AuthService;
  users: UserService;
  limits: SignInLimits;
  cookieName: string;
}): Router {
  const router = Router();

  router.post('/sign-in', ...signInRateLimits(deps.limits), validate(signIn), async (req, res) => {
    const actor = await authenticate(deps.passport, req);
    if (!actor) throw new AppError(401, 'unauthenticated', SIGN_IN_FAILED);
    // req.logIn regenerates the session (passport 0.7), so a planted session id is useless.
    await new Promise<void>((resolve, reject) => req.logIn(actor, (err) => (err ? reject(err) : resolve())));
    await deps.auth.recordSignIn(actor);
    res.json({ user: await deps.users.get(actor, actor.id) });
  });

  router.post('/sign-out', validate(noBody), async (req, res) => {
    if (req.user) {
      await new Promise<void>((resolve, reject) => req.logOut((err) => (err ? reject(err) : resolve())));
    }
    await new Promise<void>((resolve) => req.session.destroy(() => resolve()));
    res.clearCookie(deps.cookieName, { path: '/' });
    res.status(204).end();
  });

  router.get('/me', requireAuth, async (req, res) => {
    const actor = actorOf(req);
    res.json({ user: await deps.users.get(actor, actor.id) });
  });

  return router;
}

function authenticate(instance: passport.Authenticator, req: Request): Promise<SessionActor | null> {
  return new Promise((resolve, reject) => {
    instance.authenticate('local', { session: false }, (err: unknown, user: SessionActor | false) => {
      if (err) reject(err);
      else resolve(user || null);
    })(req, req.res!, reject);
  });
}
