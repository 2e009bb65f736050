import type { RequestHandler, Response } from 'express';
import { rateLimit } from 'express-rate-limit';
import { HttpError } from '../../lib/errors.js';
import { problemFrom } from '../../middleware/error-handler.js';
import { toSessionUser, type AppLucia } from './lucia.js';

export type SignInLimit = { windowMs: number; limit: number };

/**
 * One limiter for every route that checks a secret (sign-in, accepting an invite), so they
 * share one count per address. Only failures count: a crew signing in on one shared workshop
 * tablet is not an attack.
 */
export function signInLimiter(signInLimit: SignInLimit): RequestHandler {
  return rateLimit({
    windowMs: signInLimit.windowMs,
    limit: signInLimit.limit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    skipSuccessfulRequests: true,
    handler: (req, res) => {
      const minutes = Math.ceil(signInLimit.windowMs / 60_000);
      const error = new HttpError(
        429,
        'too-many-sign-ins',
        'Too many sign-in attempts',
        `Too many attempts from this device. Wait ${minutes} minutes and try again.`,
      );
      res.status(429).type('application/problem+json').json(problemFrom(error, req.originalUrl));
    },
  });
}

/** Sets the session cookie and answers with the user the new session belongs to. */
export async function startSession(
  lucia: AppLucia,
  res: Response,
  sessionId: string,
  status: number,
): Promise<void> {
  res.append('Set-Cookie', lucia.createSessionCookie(sessionId).serialize());
  const { user } = await lucia.validateSession(sessionId);
  res.status(status).json({ user: user && toSessionUser(user) });
}
