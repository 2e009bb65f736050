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
    const sessionId = sessionCookieOf(req.headers.cookie ?? '', lucia.sessionCookieName);
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

/**
 * The session cookie's value, read without decoding any other cookie: a browser may carry
 * cookies of other apps on the same host, and one with a malformed percent-escape
 * (`theme=%zz`) must not turn every request into an error. A malformed session cookie counts
 * as none.
 */
export function sessionCookieOf(header: string, name: string): string | null {
  for (const part of header.split(';')) {
    const at = part.indexOf('=');
    if (at < 0 || part.slice(0, at).trim() !== name) continue;
    try {
      return decodeURIComponent(part.slice(at + 1).trim()) || null;
    } catch {
      return null;
    }
  }
  return null;
}
