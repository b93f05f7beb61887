import type {} from 'passport';
import type { Request } from 'express';
import type { Role } from '../../shared/schemas/role.schema';
import { AppError } from './app-error';

/** The signed-in user as every service sees it: loaded fresh from the database per request. */
export interface SessionActor {
  id: string;
  organisationId: string;
  organisationName: string;
  email: string;
  displayName: string;
  role: Role;
}

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    // Passport types req.user as Express.User; ours is the SessionActor.
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type
    interface User extends SessionActor {}
  }
}

/** The signed-in user of `req`; 401 when there is none (routes normally check first). */
export function actorOf(req: Request): SessionActor {
  if (!req.user) throw new AppError(401, 'unauthenticated', 'Sign in to continue');
  return req.user;
}
