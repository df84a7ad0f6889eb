import type { RequestHandler } from 'express';
import type { Role } from '../db/models/user';
import { AppError } from './appError';

/** Refuses anonymous requests (and sessions of users since deactivated, which passport drops). */
export const requireAuth: RequestHandler = (req, _res, next) => {
  if (!req.user) throw new AppError(401, 'unauthenticated', 'Sign in to continue.');
  next();
};

/** Signed-in users whose role is one of `roles`; others get 403 'forbidden'. */
export function requireRole(...roles: Role[]): RequestHandler {
  return (req, _res, next) => {
    if (!req.user) throw new AppError(401, 'unauthenticated', 'Sign in to continue.');
    if (!roles.includes(req.user.role)) {
      throw new AppError(403, 'forbidden', 'Your role does not allow this. Ask the shop owner if you need access.');
    }
    next();
  };
}
