import type { RequestHandler } from 'express';
import type { Role, User } from '@photon-ledger/shared';
import { AppError } from '../errors/app-error';
import { userFromSession } from '../services/auth-service';

/** Name of the httpOnly session cookie. */
export const SESSION_COOKIE = 'pl_session';

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace -- how Express types are augmented
  namespace Express {
    interface Locals {
      user?: User;
    }
  }
}

/** Requires a valid session cookie and puts the user on `res.locals.user`. */
export function requireUser(secret: string): RequestHandler {
  return async (req, res, next) => {
    const token: unknown = req.cookies?.[SESSION_COOKIE];
    if (typeof token !== 'string' || token === '') {
      throw new AppError('unauthenticated', 'sign in first');
    }
    res.locals.user = await userFromSession(token, secret);
    next();
  };
}

/** Allows only the given roles; others get 403. Use after `requireUser`. */
export function requireRole(...roles: Role[]): RequestHandler {
  return (_req, res, next) => {
    const user = res.locals.user;
    if (!user) throw new AppError('unauthenticated', 'sign in first');
    if (!roles.includes(user.role)) {
      throw new AppError('forbidden', `this action needs the role ${roles.join(' or ')}; you are ${user.role}`);
    }
    next();
  };
}

/** The signed-in user of a request that passed `requireUser`. */
export function currentUser(res: { locals: { user?: User } }): User {
  const user = res.locals.user;
  if (!user) throw new AppError('unauthenticated', 'sign in first');
  return user;
}

