import { Router, type Response } from 'express';
import { rateLimit } from 'express-rate-limit';
import { AcceptInviteInputSchema, SignInInputSchema } from '../../../shared/auth/auth.schema.js';
import { HttpError } from '../../lib/errors.js';
import { problemFrom } from '../../middleware/error-handler.js';
import { currentUser, requireRole } from '../../middleware/require-role.js';
import { validate } from '../../middleware/validate.js';
import { toSessionUser, type AppLucia } from './lucia.js';
import type { AuthService } from './auth.service.js';

export type SignInLimit = { windowMs: number; limit: number };

export function authRouter(
  service: AuthService,
  lucia: AppLucia,
  signInLimit: SignInLimit,
): Router {
  const router = Router();
  /** Sets the cookie and answers with the user the new session belongs to. */
  const startSession = async (res: Response, sessionId: string, status: number) => {
    res.append('Set-Cookie', lucia.createSessionCookie(sessionId).serialize());
    const { user } = await lucia.validateSession(sessionId);
    res.status(status).json({ user: user && toSessionUser(user) });
  };

  const limiter = rateLimit({
    windowMs: signInLimit.windowMs,
    limit: signInLimit.limit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    // Only failures count: a crew signing in on one shared workshop tablet is not an attack.
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

  router.post('/sign-in', limiter, validate({ body: SignInInputSchema }), async (req, res) => {
    const session = await service.signIn(req.body);
    await startSession(res, session.id, 200);
  });

  router.post('/sign-out', requireRole(), async (_req, res) => {
    await service.signOut(res.locals.sessionId!);
    res.append('Set-Cookie', lucia.createBlankSessionCookie().serialize());
    res.status(204).end();
  });

  router.get('/me', requireRole(), (_req, res) => {
    res.json({ user: currentUser(res) });
  });

  router.post(
    '/accept-invite',
    limiter,
    validate({ body: AcceptInviteInputSchema }),
    async (req, res) => {
      const session = await service.acceptInvite(req.body);
      await startSession(res, session.id, 201);
    },
  );

  return router;
}
