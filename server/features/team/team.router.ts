import { Router, type Request, type Response } from 'express';
import { InviteInputSchema } from '../../../shared/auth/auth.schema.js';
import { currentUser, requireRole } from '../../middleware/require-role.js';
import { validate } from '../../middleware/validate.js';
import { inviteMail } from '../mail/mail-templates.js';
import type { Outbox } from '../mail/outbox.js';
import type { TeamService } from './team.service.js';

export interface TeamRouterDeps {
  service: TeamService;
  publicOrigin: string | undefined;
  outbox: Outbox;
}

/** The manager's side: the team list and new invites. */
export function teamRouter(deps: TeamRouterDeps): Router {
  const router = Router();

  router.get('/users', requireRole('manager'), async (_req, res) => {
    res.json(await deps.service.listTeam(currentUser(res).workshopId));
  });

  router.post(
    '/invites',
    requireRole('manager'),
    validate({ body: InviteInputSchema }),
    async (req, res) => {
      res.status(201).json(await invite(deps, req, res));
    },
  );

  return router;
}

/** Makes the invite and e-mails its link; the answer carries the link as well. */
async function invite(
  { service, publicOrigin, outbox }: TeamRouterDeps,
  req: Request,
  res: Response,
) {
  const inviter = currentUser(res);
  const { invite, token } = await service.createInvite(inviter, req.body);
  const link = `${publicOrigin ?? `${req.protocol}://${req.get('host')}`}/invite/${token}`;
  // The invite stands even when the e-mail cannot go: the link is in the answer to pass on by hand.
  const mail = await outbox.send(
    inviter.workshopId,
    inviteMail({
      to: invite.email,
      workshopName: inviter.workshopName,
      inviterName: inviter.name,
      role: invite.role,
      link,
      expiresOn: invite.expiresAt.toISOString().slice(0, 10),
      vessels: await service.invitedVessels(invite),
    }),
  );
  return {
    invite: {
      id: invite.id,
      email: invite.email,
      role: invite.role,
      expiresAt: invite.expiresAt.toISOString(),
    },
    link,
    mail,
  };
}
