import { Router, type Request, type Response } from 'express';
import { z } from 'zod';
import { ChangeRoleInputSchema } from '../../../shared/auth/account.schema.js';
import { InviteInputSchema } from '../../../shared/auth/auth.schema.js';
import { currentUser, requireRole } from '../../middleware/require-role.js';
import { validate } from '../../middleware/validate.js';
import { inviteMail } from '../mail/mail-templates.js';
import type { Outbox } from '../mail/outbox.js';
import type { Invite } from './invite.entity.js';
import type { PeopleService } from './people.service.js';
import { personView } from './person-view.js';
import type { TeamService } from './team.service.js';

export interface TeamRouterDeps {
  service: TeamService;
  people: PeopleService;
  publicOrigin: string | undefined;
  outbox: Outbox;
}

const IdParamsSchema = z.object({ id: z.uuid({ error: 'The id in the address is not valid.' }) });

/** The manager's side: the team list, invites, and changes to people's accounts. */
export function teamRouter(deps: TeamRouterDeps): Router {
  const { people } = deps;
  const router = Router();
  const manager = requireRole('manager');
  const withId = validate({ params: IdParamsSchema });
  const id = (req: Request) => String(req.params.id);

  router.get('/users', manager, async (_req, res) => {
    res.json(await deps.service.listTeam(currentUser(res).workshopId));
  });

  router.get('/team/history', manager, async (_req, res) => {
    res.json({ changes: await people.history(currentUser(res).workshopId) });
  });

  router.patch(
    '/users/:id',
    manager,
    withId,
    validate({ body: ChangeRoleInputSchema }),
    async (req, res) => {
      res.json(personView(await people.changeRole(currentUser(res), id(req), req.body.role)));
    },
  );

  router.post('/users/:id/deactivate', manager, withId, async (req, res) => {
    res.json(personView(await people.deactivate(currentUser(res), id(req))));
  });

  router.post('/users/:id/reactivate', manager, withId, async (req, res) => {
    res.json(personView(await people.reactivate(currentUser(res), id(req))));
  });

  router.post('/invites', manager, validate({ body: InviteInputSchema }), async (req, res) => {
    const { invite, token } = await deps.service.createInvite(currentUser(res), req.body);
    res.status(201).json(await mailInvite(deps, req, res, invite, token));
  });

  router.post('/invites/:id/resend', manager, withId, async (req, res) => {
    const { invite, token } = await people.renewInvite(currentUser(res), id(req));
    res.json(await mailInvite(deps, req, res, invite, token));
  });

  router.post('/invites/:id/revoke', manager, withId, async (req, res) => {
    const invite = await people.revokeInvite(currentUser(res), id(req));
    res.json({ invite: { id: invite.id, revokedAt: invite.revokedAt?.toISOString() ?? null } });
  });

  return router;
}

/** E-mails the invite's link; the answer carries the link as well, to pass on by hand. */
async function mailInvite(
  { service, publicOrigin, outbox }: TeamRouterDeps,
  req: Request,
  res: Response,
  invite: Invite,
  token: string,
) {
  const inviter = currentUser(res);
  const link = `${publicOrigin ?? `${req.protocol}://${req.get('host')}`}/invite/${token}`;
  // The invite stands even when the e-mail cannot go: the link is in the answer.
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
    { recordType: 'invite', recordId: invite.id, what: 'Invite e-mail' },
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
