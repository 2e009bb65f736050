import type { RequestHandler } from 'express';
import type { SessionUser } from '../../../shared/auth/auth.schema.js';
import { toSessionUser, type AppLucia } from './lucia.js';

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface Locals {
      user: SessionUser | null;
      sessionId: string | null;
      query: unknown;
    }
  }
}

/**
 * Reads the session cookie on every request. A valid session sets `res.locals.user`; a session
 * near expiry gets a renewed cookie; an unknown, forged or expired one gets a blank cookie.
 */
export function loadSession(lucia: AppLucia): RequestHandler {
  return async (req, res, next) => {
    res.locals.user = null;
    res.locals.sessionId = null;
    const sessionId = lucia.readSessionCookie(req.headers.cookie ?? '');
    if (!sessionId) return next();
    const { session, user } = await lucia.validateSession(sessionId);
    if (!session) {
      res.append('Set-Cookie', lucia.createBlankSessionCookie().serialize());
      return next();
    }
    if (session.fresh) res.append('Set-Cookie', lucia.createSessionCookie(session.id).serialize());
    res.locals.sessionId = session.id;
    res.locals.user = toSessionUser(user);
    next();
  };
}
