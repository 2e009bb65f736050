import { Router, type Request, type RequestHandler } from 'express';
import { z } from 'zod';
import { AcceptInviteInputSchema, InviteInputSchema } from '../../../shared/auth/auth.schema.js';
import { currentUser, requireRole } from '../../middleware/require-role.js';
import { validate } from '../../middleware/validate.js';
import type { AppLucia } from '../auth/lucia.js';
import { startSession } from '../auth/sign-in-http.js';
import { inviteMail } from '../mail/mail-templates.js';
import type { Outbox } from '../mail/outbox.js';
import type { TeamService } from './team.service.js';

const TokenParamsSchema = z.object({
  token: z.string().min(20, { error: 'The invite link is incomplete.' }).max(200),
});

export interface TeamRouterDeps {
  service: TeamService;
  lucia: AppLucia;
  /** The sign-in limiter: accepting an invite checks a secret too. */
  limiter: RequestHandler;
  publicOrigin: string | undefined;
  outbox: Outbox;
}

/** The team list, invites, and accepting one (which signs the new person in). */
export function teamRouter({
  service,
  lucia,
  limiter,
  publicOrigin,
  outbox,
}: TeamRouterDeps): Router {
  const router = Router();
  const inviteLink = (req: Request, token: string) =>
    `${publicOrigin ?? `${req.protocol}://${req.get('host')}`}/invite/${token}`;

  router.get('/users', requireRole('manager'), async (_req, res) => {
    res.json(await service.listTeam(currentUser(res).workshopId));
  });

  router.post(
    '/invites',
    requireRole('manager'),
    validate({ body: InviteInputSchema }),
    async (req, res) => {
      const inviter = currentUser(res);
      const { invite, token } = await service.createInvite(inviter, req.body);
      const link = inviteLink(req, token);
      // The invite stands even when the e-mail cannot go: the link is in the answer to pass on by hand.
      const mail = await outbox.send(
        inviteMail({
          to: invite.email,
          workshopName: inviter.workshopName,
          inviterName: inviter.name,
          role: invite.role,
          link,
          expiresOn: invite.expiresAt.toISOString().slice(0, 10),
        }),
      );
      res.status(201).json({
        invite: {
          id: invite.id,
          email: invite.email,
          role: invite.role,
          expiresAt: invite.expiresAt.toISOString(),
        },
        link,
        mail,
      });
    },
  );

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
    limiter,
    validate({ body: AcceptInviteInputSchema }),
    async (req, res) => {
      const session = await service.acceptInvite(req.body);
      await startSession(lucia, res, session.id, 201);
    },
  );

  return router;
}
