import { Router } from 'express';
import { SignInInputSchema } from '../../../shared/auth/auth.schema.js';
import { currentUser, requireRole } from '../../middleware/require-role.js';
import { validate } from '../../middleware/validate.js';
import type { AppLucia } from './lucia.js';
import type { AuthService } from './auth.service.js';
import { startSession } from './sign-in-http.js';
import type { SignInThrottle } from './sign-in-throttle.js';

/** Sign-in, sign-out and who is signed in (mounted at /api/auth). */
export function authRouter(
  service: AuthService,
  lucia: AppLucia,
  throttle: SignInThrottle,
): Router {
  const router = Router();

  router.post('/sign-in', validate({ body: SignInInputSchema }), async (req, res) => {
    const keys = { account: req.body.email as string, address: req.ip ?? 'unknown' };
    const session = await throttle.attempt(keys, () => service.signIn(req.body));
    await startSession(lucia, res, session.id, 200);
  });

  router.post('/sign-out', requireRole(), async (_req, res) => {
    await service.signOut(res.locals.sessionId!);
    res.append('Set-Cookie', lucia.createBlankSessionCookie().serialize());
    res.status(204).end();
  });

  router.get('/me', requireRole(), (_req, res) => {
    res.json({ user: currentUser(res) });
  });

  return router;
}
