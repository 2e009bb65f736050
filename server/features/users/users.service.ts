import { randomUUID } from 'node:crypto';
import { In, type DataSource } from 'typeorm';
import type { InviteInput, SessionUser } from '../../../shared/auth/auth.schema.js';
import type { Clock } from '../../lib/clock.js';
import { ConflictError, ValidationError } from '../../lib/errors.js';
import { hashToken, newToken } from '../../lib/tokens.js';
import { Vessel } from '../vessels/vessel.entity.js';
import { Invite } from './invite.entity.js';
import { User } from './user.entity.js';

const INVITE_VALID_DAYS = 7;

export class UsersService {
  constructor(
    private readonly dataSource: DataSource,
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
      users: users.map((u) => ({
        id: u.id,
        email: u.email,
        name: u.name,
        role: u.role,
        createdAt: u.createdAt.toISOString(),
        archivedAt: u.archivedAt?.toISOString() ?? null,
      })),
      invites: invites.map((i) => ({
        id: i.id,
        email: i.email,
        role: i.role,
        expiresAt: i.expiresAt.toISOString(),
        acceptedAt: i.acceptedAt?.toISOString() ?? null,
      })),
    };
  }

  /** Creates an invite and returns the one-time token; only its hash is stored. */
  async createInvite(inviter: SessionUser, input: InviteInput) {
    if (await this.dataSource.getRepository(User).exists({ where: { email: input.email } })) {
      throw new ConflictError('This e-mail address already has an account.', [
        { field: 'email', message: 'This e-mail address already has an account.' },
      ]);
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
    const token = newToken();
    const invite: Invite = Object.assign(new Invite(), {
      id: randomUUID(),
      workshopId: inviter.workshopId,
      email: input.email,
      role: input.role,
      tokenHash: hashToken(token),
      vesselIds: input.role === 'skipper' ? input.vesselIds : [],
      invitedById: inviter.id,
      expiresAt: new Date(this.clock.now().getTime() + INVITE_VALID_DAYS * 86_400_000),
      acceptedAt: null,
    });
    await this.dataSource.getRepository(Invite).insert(invite);
    return { invite, token };
  }
}
