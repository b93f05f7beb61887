import type { RequestHandler } from 'express';
import type { Role } from '../../shared/schemas/role.schema';
import { AppError, forbidden } from './app-error';
import type {} from './session-actor';

/** 401 unless someone is signed in. */
export const requireAuth: RequestHandler = (req, _res, next) => {
  if (!req.user) return next(new AppError(401, 'unauthenticated', 'Sign in to continue'));
  next();
};

/** 401 unless signed in, 403 unless the user's role is one of `roles`. */
export function requireRole(...roles: Role[]): RequestHandler {
  return (req, _res, next) => {
    if (!req.user) return next(new AppError(401, 'unauthenticated', 'Sign in to continue'));
    if (!roles.includes(req.user.role)) {
      return next(forbidden(`This needs one of the roles: ${roles.join(', ')}`, { required: roles }));
    }
    next();
  };
}

/** Every role: read routes, spelled out so the role table in each router is complete. */
export const ANY_ROLE: Role[] = ['admin', 'detailer', 'fabricator', 'inspector', 'viewer'];
