import { Router } from 'express';
import { z } from 'zod';
import { AcceptInviteInputSchema } from '../../../shared/auth/auth.schema.js';
import { validate } from '../../middleware/validate.js';
import type { AppLucia } from '../auth/lucia.js';
import { startSession } from '../auth/sign-in-http.js';
import type { SignInThrottle } from '../auth/sign-in-throttle.js';
import type { TeamService } from './team.service.js';

const TokenParamsSchema = z.object({
  token: z.string().min(20, { error: 'The invite link is incomplete.' }).max(200),
});

/** The invitee's side, open to anyone holding the link: see whom it is for, then accept it (which signs them in). */
export function inviteAcceptanceRouter(deps: {
  service: TeamService;
  lucia: AppLucia;
  /** The sign-in limit: accepting an invite checks a secret too. */
  throttle: SignInThrottle;
}): Router {
  const { service, lucia, throttle } = deps;
  const router = Router();

  // Public: the invite page shows whom the link is for before the password is set.
  router.get('/invites/:token', validate({ params: TokenParamsSchema }), async (req, res) => {
    const invite = await service.findOpenInvite(String(req.params.token));
    res.json({
      email: invite.email,
      role: invite.role,
      workshopName: invite.workshop?.name ?? '',
      expiresAt: invite.expiresAt.toISOString(),
    });
  });

  router.post(
    '/auth/accept-invite',
    validate({ body: AcceptInviteInputSchema }),
    async (req, res) => {
      const address = req.ip ?? 'unknown';
      const session = await throttle.attempt({ address }, () => service.acceptInvite(req.body));
      await startSession(lucia, res, session.id, 201);
    },
  );

  return router;
}
