import { Router, type Request, type Response } from 'express';
import type passport from 'passport';
import './session-lifetime.middleware';
import { signInSchema } from '../../../shared/schemas/auth.schema';
import { AppError } from '../../common/app-error';
import { requireAuth } from '../../common/auth.middleware';
import { actorOf, type SessionActor } from '../../common/session-actor';
import { validate } from '../../common/validate.middleware';
import type { UserService } from '../users/user.service';
import type { AuthService } from './auth.service';
import { signInKeys, type SignInThrottle } from './sign-in-throttle';

/** One answer for unknown e-mail, wrong password and deactivated account. */
const SIGN_IN_FAILED = 'E-mail or password is incorrect';

const signIn = { body: signInSchema };
const noBody = { body: signInSchema.pick({}).strict() };

/** POST /sign-in, POST /sign-out, GET /me under /api/auth. */
export function authRouter(deps: {
  passport: passport.Authenticator;
  auth: AuthService;
  users: UserService;
  throttle: SignInThrottle;
  cookieName: string;
}): Router {
  const router = Router();

  router.post('/sign-in', validate(signIn), async (req, res) => {
    const keys = signInKeys((req.body as { email: string }).email, req.ip);
    // An account in back-off is refused before its password is looked at, from any address:
    // guesses at one account spread over many addresses are slowed down all the same.
    const accountWait = await deps.throttle.retryAfterSeconds(keys.account);
    if (accountWait > 0) throw tooMany(res, accountWait);
    const addressWait = await deps.throttle.retryAfterSeconds(keys.address);
    const actor = await authenticate(deps.passport, req);
    if (!actor) {
      await deps.throttle.recordFailure(keys);
      // An address in back-off slows down its failing attempts only: a right password from
      // the same address (a shop behind one NAT address) still signs in.
      if (addressWait > 0) throw tooMany(res, addressWait);
      throw new AppError(401, 'unauthenticated', SIGN_IN_FAILED);
    }
    await deps.throttle.clear(keys.account);
    // req.logIn regenerates the session (passport 0.7), so a planted session id is useless.
    await new Promise<void>((resolve, reject) => req.logIn(actor, (err) => (err ? reject(err) : resolve())));
    // The absolute lifetime counts from here (session-lifetime.middleware.ts).
    req.session.signedInAt = Date.now();
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

/** 429 with Retry-After: the key that failed too often must wait `seconds`. */
function tooMany(res: Response, seconds: number): AppError {
  res.set('Retry-After', String(seconds));
  return new AppError(
    429,
    'too_many_attempts',
    `Too many failed sign-in attempts. Try again in ${seconds} second${seconds === 1 ? '' : 's'}.`,
    { retryAfterSeconds: seconds },
  );
}

function authenticate(instance: passport.Authenticator, req: Request): Promise<SessionActor | null> {
  return new Promise((resolve, reject) => {
    instance.authenticate('local', { session: false }, (err: unknown, user: SessionActor | false) => {
      if (err) reject(err);
      else resolve(user || null);
    })(req, req.res!, reject);
  });
}
