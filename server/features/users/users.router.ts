import { Router, type Request } from 'express';
import { z } from 'zod';
import { InviteInputSchema } from '../../../shared/auth/auth.schema.js';
import { currentUser, requireRole } from '../../middleware/require-role.js';
import { validate } from '../../middleware/validate.js';
import type { AuthService } from '../auth/auth.service.js';
import type { UsersService } from './users.service.js';

const TokenParamsSchema = z.object({ token: z.string().min(20, { error: 'The invite link is incomplete.' }).max(200) });

export function usersRouter(service: UsersService, auth: AuthService, publicOrigin?: string): Router {
  const router = Router();
  const inviteLink = (req: Request, token: string) => `${publicOrigin ?? `${req.protocol}://${req.get('host')}`}/invite/${token}`;

  router.get('/users', requireRole('manager'), async (_req, res) => {
    res.json(await service.listTeam(currentUser(res).workshopId));
  });

  router.post('/invites', requireRole('manager'), validate({ body: InviteInputSchema }), async (req, res) => {
    const { invite, token } = await service.createInvite(currentUser(res), req.body);
    res.status(201).json({
      invite: { id: invite.id, email: invite.email, role: invite.role, expiresAt: invite.expiresAt.toISOString() },
      link: inviteLink(req, token),
    });
  });

  // Public: the invite page shows whom the link is for before the password is set.
  router.get('/invites/:token', validate({ params: TokenParamsSchema }), async (req, res) => {
    const invite = await auth.findOpenInvite(String(req.params.token));
    res.json({ email: invite.email, role: invite.role, workshopName: invite.workshop?.name ?? '', expiresAt: invite.expiresAt.toISOString() });
  });

  return router;
}
