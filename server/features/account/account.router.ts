import { Router, type Request } from 'express';
import { z } from 'zod';
import {
  ChangePasswordInputSchema,
  PasswordResetRequestSchema,
  ResetPasswordInputSchema,
  ResetTokenSchema,
} from '../../../shared/auth/account.schema.js';
import { currentUser, requireRole } from '../../middleware/require-role.js';
import { validate } from '../../middleware/validate.js';
import type { AppLucia } from '../auth/lucia.js';
import { startSession } from '../auth/sign-in-http.js';
import type { SignInThrottle } from '../auth/sign-in-throttle.js';
import type { AccountService } from './account.service.js';
import { RESET_VALID_MINUTES, type PasswordResetsService } from './password-resets.service.js';

export interface AccountRouterDeps {
  account: AccountService;
  resets: PasswordResetsService;
  lucia: AppLucia;
  throttle: SignInThrottle;
  publicOrigin: string | undefined;
}

const TokenParamsSchema = z.object({ token: ResetTokenSchema });

/** The same words whether or not the address has an account, so the form tells nobody who does. */
const RESET_ANSWER = {
  detail: `If this address belongs to an active account, a link to choose a new password is on its way. It works once, for ${RESET_VALID_MINUTES} minutes.`,
};

/** The person's own account (signed in), and the forgotten-password links (open to anyone). */
export function accountRouter(deps: AccountRouterDeps): Router {
  const { account, lucia, throttle } = deps;
  const router = Router();
  const address = (req: Request) => req.ip ?? 'unknown';

  router.get('/account', requireRole(), async (_req, res) => {
    res.json(await account.view(currentUser(res)));
  });

  router.post(
    '/account/password',
    requireRole(),
    validate({ body: ChangePasswordInputSchema }),
    async (req, res) => {
      const user = currentUser(res);
      await throttle.attempt({ account: user.email, address: address(req) }, () =>
        account.changePassword(user, res.locals.sessionId!, req.body),
      );
      res.json(await account.view(user));
    },
  );

  router.post('/account/sign-out-everywhere', requireRole(), async (_req, res) => {
    await account.signOutEverywhere(currentUser(res));
    res.append('Set-Cookie', lucia.createBlankSessionCookie().serialize());
    res.status(204).end();
  });

  router.use(resetRoutes(deps));
  return router;
}

/** "Forgot your password?": the link by e-mail, whom it is for, and the new password. */
function resetRoutes(deps: AccountRouterDeps): Router {
  const { resets, lucia, throttle } = deps;
  const router = Router();
  const address = (req: Request) => req.ip ?? 'unknown';

  router.post(
    '/auth/password-reset',
    validate({ body: PasswordResetRequestSchema }),
    async (req, res) => {
      const origin = deps.publicOrigin ?? `${req.protocol}://${req.get('host')}`;
      await resets.request(req.body.email, (token) => `${origin}/reset-password/${token}`);
      res.status(202).json(RESET_ANSWER);
    },
  );

  router.get(
    '/password-resets/:token',
    validate({ params: TokenParamsSchema }),
    async (req, res) => {
      const { reset, user } = await throttle.attempt({ address: address(req) }, () =>
        resets.findOpen(String(req.params.token)),
      );
      res.json({ email: user.email, expiresAt: reset.expiresAt.toISOString() });
    },
  );

  router.post(
    '/auth/reset-password',
    validate({ body: ResetPasswordInputSchema }),
    async (req, res) => {
      const session = await throttle.attempt({ address: address(req) }, () =>
        resets.reset(req.body),
      );
      await startSession(lucia, res, session.id, 200);
    },
  );

  return router;
}
