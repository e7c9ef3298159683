import type { RequestHandler } from 'express';
import type { Role } from '../../shared/schemas/user.schema.js';
import type { User } from '../db/entities/user.entity.js';
import { ForbiddenError, UnauthenticatedError } from '../errors.js';

declare global {
  // passport types req.user as Express.User; ours is the User entity.
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type
    interface User extends Omit<import('../db/entities/user.entity.js').User, never> {}
  }
}

export const requireAuth: RequestHandler = (req, _res, next) => {
  next(req.user ? undefined : new UnauthenticatedError());
};

/** Signed in with one of the given roles (admin is not implied: list it). */
export function requireRole(...roles: Role[]): RequestHandler {
  return (req, _res, next) => {
    if (!req.user) return next(new UnauthenticatedError());
    next(roles.includes(req.user.role) ? undefined : new ForbiddenError());
  };
}

/** The signed-in user, for handlers behind requireAuth. */
export function currentUser(req: { user?: Express.User }): User {
  if (!req.user) throw new UnauthenticatedError();
  return req.user;
}
