import { randomUUID } from 'node:crypto';
import { In, IsNull, type DataSource } from 'typeorm';
import type {
  AcceptInviteInput,
  InviteInput,
  SessionUser,
} from '../../../shared/auth/auth.schema.js';
import type { Clock } from '../../lib/clock.js';
import { ConflictError, GoneError, NotFoundError, ValidationError } from '../../lib/errors.js';
import { assertStrongPassword } from '../../lib/password-strength.js';
import { hashPassword } from '../../lib/passwords.js';
import { hashToken } from '../../lib/tokens.js';
import { recordAudit } from '../audit/audit.service.js';
import type { AppLucia } from '../auth/lucia.js';
import { User } from '../users/user.entity.js';
import { VesselSkipper } from '../vessels/vessel-skipper.entity.js';
import { Vessel } from '../vessels/vessel.entity.js';
import { Invite } from './invite.entity.js';
import { newInvite } from './new-invite.js';
import { personView } from './person-view.js';

/** The workshop's people: the team list, and invites from the e-mail to the first sign-in. */
export class TeamService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly lucia: AppLucia,
    private readonly clock: Clock,
  ) {}

  async listTeam(workshopId: string) {
    const users = await this.dataSource
      .getRepository(User)
      .find({ where: { workshopId }, order: { role: 'ASC', name: 'ASC' } });
    const invites = await this.dataSource
      .getRepository(Invite)
      .find({ where: { workshopId }, order: { createdAt: 'DESC' } });
    return {
      users: users.map(personView),
      invites: invites.map((i) => ({
        id: i.id,
        email: i.email,
        role: i.role,
        expiresAt: i.expiresAt.toISOString(),
        acceptedAt: i.acceptedAt?.toISOString() ?? null,
        revokedAt: i.revokedAt?.toISOString() ?? null,
      })),
    };
  }

  /** Creates an invite and returns the one-time token; only its hash is stored. */
  async createInvite(inviter: SessionUser, input: InviteInput) {
    const existing = await this.dataSource.getRepository(User).findOneBy({ email: input.email });
    if (existing) {
      const message = existing.archivedAt
        ? 'This address belongs to a deactivated account; reactivate it in the People list instead.'
        : 'This e-mail address already has an account.';
      throw new ConflictError(message, [{ field: 'email', message }]);
    }
    if (input.vesselIds.length > 0) {
      const found = await this.dataSource
        .getRepository(Vessel)
        .count({ where: { id: In(input.vesselIds), workshopId: inviter.workshopId } });
      if (found !== new Set(input.vesselIds).size) {
        throw new ValidationError([
          { field: 'vesselIds', message: 'One of the chosen vessels is not in your workshop.' },
        ]);
      }
    }
    const { invite, token } = newInvite(
      {
        workshopId: inviter.workshopId,
        email: input.email,
        role: input.role,
        vesselIds: input.vesselIds,
        invitedById: inviter.id,
      },
      this.clock.now(),
    );
    await this.dataSource.transaction(async (manager) => {
      await manager.getRepository(Invite).insert(invite);
      await recordAudit(manager, {
        workshopId: inviter.workshopId,
        recordType: 'invite',
        recordId: invite.id,
        action: 'invite-sent',
        actor: { id: inviter.id, name: inviter.name },
        at: this.clock.now(),
        detail: `${invite.email} was invited as ${invite.role}.`,
      });
    });
    return { invite, token };
  }

  /** The invited skipper's vessels with their engines in use, for the invite e-mail to name. */
  async invitedVessels(invite: Invite) {
    if (invite.vesselIds.length === 0) return [];
    const vessels = await this.dataSource.getRepository(Vessel).find({
      where: { id: In(invite.vesselIds), workshopId: invite.workshopId },
      relations: { engines: true },
      order: { name: 'ASC' },
    });
    return vessels.map((v) => ({
      name: v.name,
      engines: (v.engines ?? []).filter((e) => !e.archivedAt),
    }));
  }

  /** Finds a usable invite or says plainly why the link does not work. */
  async findOpenInvite(token: string): Promise<Invite> {
    const invite = await this.dataSource
      .getRepository(Invite)
      .findOne({ where: { tokenHash: hashToken(token) }, relations: { workshop: true } });
    if (!invite) throw new NotFoundError('invite');
    if (invite.revokedAt)
      throw new GoneError('This invite was withdrawn by the workshop. Ask them for a new one.');
    if (invite.acceptedAt)
      throw new GoneError('This invite has already been used. Sign in with the password you set.');
    if (invite.expiresAt.getTime() < this.clock.now().getTime()) {
      throw new GoneError('This invite has expired. Ask your workshop to send a new one.');
    }
    return invite;
  }

  /** Creates the account, links the invited skipper's vessels and uses up the invite, all or nothing. */
  async acceptInvite(input: AcceptInviteInput) {
    const invite = await this.findOpenInvite(input.token);
    await assertStrongPassword(input.password, 'password', [
      invite.email,
      input.name,
      invite.workshop?.name ?? '',
    ]);
    const passwordHash = await hashPassword(input.password);
    const userId = randomUUID();
    await this.dataSource.transaction(async (manager) => {
      if (await manager.getRepository(User).exists({ where: { email: invite.email } })) {
        throw new ConflictError(
          'An account with this e-mail address already exists. Sign in instead.',
          [{ field: 'token', message: 'This e-mail address already has an account.' }],
        );
      }
      await manager.getRepository(User).insert({
        id: userId,
        workshopId: invite.workshopId,
        email: invite.email,
        name: input.name,
        role: invite.role,
        passwordHash,
        archivedAt: null,
      });
      if (invite.role === 'skipper' && invite.vesselIds.length > 0) {
        await manager
          .getRepository(VesselSkipper)
          .insert(invite.vesselIds.map((vesselId) => ({ vesselId, userId })));
      }
      // Taken only while still open: two tabs sending the same link make one account.
      const { affected } = await manager
        .getRepository(Invite)
        .update(
          { id: invite.id, acceptedAt: IsNull(), revokedAt: IsNull() },
          { acceptedAt: this.clock.now() },
        );
      if (affected !== 1) throw new GoneError('This invite has already been used.');
      await recordAudit(manager, {
        workshopId: invite.workshopId,
        recordType: 'invite',
        recordId: invite.id,
        action: 'invite-accepted',
        actor: { id: userId, name: input.name },
        at: this.clock.now(),
        detail: `${input.name} (${invite.email}) joined as ${invite.role}.`,
      });
    });
    return this.lucia.createSession(userId, {});
  }
}
