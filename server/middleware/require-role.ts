import type { RequestHandler, Response } from 'express';
import type { Role, SessionUser } from '../../shared/auth/auth.schema.js';
import { ForbiddenError, UnauthenticatedError } from '../lib/errors.js';

/**
 * The one place roles are enforced. `requireRole()` needs any signed-in user;
 * `requireRole('technician', 'manager')` needs one of those roles.
 */
export function requireRole(...roles: Role[]): RequestHandler {
  return (_req, res, next) => {
    const user = res.locals.user;
    if (!user) throw new UnauthenticatedError();
    if (roles.length > 0 && !roles.includes(user.role)) {
      throw new ForbiddenError(
        `This needs the ${roles.join(' or ')} role; you are signed in as ${user.role}.`,
      );
    }
    next();
  };
}

/** The signed-in user inside a handler guarded by requireRole. */
export function currentUser(res: Response): SessionUser {
  const user = res.locals.user;
  if (!user) throw new UnauthenticatedError();
  return user;
}
