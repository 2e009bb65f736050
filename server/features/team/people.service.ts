import { In, IsNull, type DataSource, type EntityManager } from 'typeorm';
import type { AccountChange } from '../../../shared/auth/account.schema.js';
import type { Role, SessionUser } from '../../../shared/auth/auth.schema.js';
import type { Clock } from '../../lib/clock.js';
import { ConflictError, HttpError, NotFoundError } from '../../lib/errors.js';
import { hashToken, newToken } from '../../lib/tokens.js';
import { AuditEntry } from '../audit/audit-entry.entity.js';
import { recordAudit, type AccountAction } from '../audit/audit.service.js';
import { Session } from '../auth/session.entity.js';
import { User } from '../users/user.entity.js';
import { Invite } from './invite.entity.js';
import { INVITE_VALID_DAYS } from './new-invite.js';

const roleWord: Record<Role, string> = {
  skipper: 'skipper',
  technician: 'technician',
  manager: 'manager',
};

/**
 * A manager's changes to the workshop's people: role, deactivation (every session ends in the
 * same transaction), reactivation, and invites withdrawn or sent again. A manager never
 * changes their own role or account here, so a workshop always keeps at least one manager.
 */
export class PeopleService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly clock: Clock,
  ) {}

  async changeRole(actor: SessionUser, userId: string, role: Role) {
    return this.changePerson(actor, userId, async (manager, person) => {
      if (person.role === role) return;
      await manager.getRepository(User).update({ id: person.id }, { role });
      await this.audit(
        manager,
        actor,
        'role-changed',
        { type: 'user', id: person.id },
        `${person.name} (${person.email}): ${roleWord[person.role]} → ${roleWord[role]}.`,
      );
    });
  }

  async deactivate(actor: SessionUser, userId: string) {
    return this.changePerson(actor, userId, async (manager, person) => {
      if (person.archivedAt) return;
      await manager.getRepository(User).update({ id: person.id }, { archivedAt: this.clock.now() });
      const { affected } = await manager.getRepository(Session).delete({ userId: person.id });
      await this.audit(
        manager,
        actor,
        'account-deactivated',
        { type: 'user', id: person.id },
        `${person.name} (${person.email}) can no longer sign in; ${affected ?? 0} sessions ended.`,
      );
    });
  }

  async reactivate(actor: SessionUser, userId: string) {
    return this.changePerson(actor, userId, async (manager, person) => {
      if (!person.archivedAt) return;
      await manager.getRepository(User).update({ id: person.id }, { archivedAt: null });
      await this.audit(
        manager,
        actor,
        'account-reactivated',
        { type: 'user', id: person.id },
        `${person.name} (${person.email}) can sign in again with their password.`,
      );
    });
  }

  /** One change to someone else's account, read and written in one transaction. */
  private async changePerson(
    actor: SessionUser,
    userId: string,
    change: (manager: EntityManager, person: User) => Promise<void>,
  ) {
    if (userId === actor.id)
      throw new HttpError(
        409,
        'own-account',
        'Not on your own account',
        'You cannot change your own role or deactivate yourself. Ask another manager of the workshop.',
      );
    return this.dataSource.transaction(async (manager) => {
      const person = await manager
        .getRepository(User)
        .findOneBy({ id: userId, workshopId: actor.workshopId });
      if (!person) throw new NotFoundError('person');
      await change(manager, person);
      return manager.getRepository(User).findOneByOrFail({ id: userId });
    });
  }

  /** Withdraws an invite that is still waiting; its link stops working at once. */
  async revokeInvite(actor: SessionUser, inviteId: string): Promise<Invite> {
    return this.changeInvite(actor, inviteId, async (manager, invite) => {
      if (invite.revokedAt) return invite;
      const revokedAt = this.clock.now();
      await manager.getRepository(Invite).update({ id: invite.id }, { revokedAt });
      await this.audit(
        manager,
        actor,
        'invite-revoked',
        { type: 'invite', id: invite.id },
        `The invite of ${invite.email} as ${roleWord[invite.role]} was withdrawn.`,
      );
      return { ...invite, revokedAt };
    });
  }

  /** A new link for a waiting (or expired, or withdrawn) invite; the old link stops working. */
  async renewInvite(
    actor: SessionUser,
    inviteId: string,
  ): Promise<{ invite: Invite; token: string }> {
    const token = newToken();
    const invite = await this.changeInvite(actor, inviteId, async (manager, invite) => {
      if (await manager.getRepository(User).exists({ where: { email: invite.email } }))
        throw new ConflictError('This e-mail address already has an account.');
      const fields = {
        tokenHash: hashToken(token),
        expiresAt: new Date(this.clock.now().getTime() + INVITE_VALID_DAYS * 86_400_000),
        revokedAt: null,
      };
      await manager.getRepository(Invite).update({ id: invite.id }, fields);
      await this.audit(
        manager,
        actor,
        'invite-resent',
        { type: 'invite', id: invite.id },
        `A new invite link was sent to ${invite.email}; the earlier link no longer works.`,
      );
      return { ...invite, ...fields };
    });
    return { invite, token };
  }

  private async changeInvite(
    actor: SessionUser,
    inviteId: string,
    change: (manager: EntityManager, invite: Invite) => Promise<Invite>,
  ): Promise<Invite> {
    return this.dataSource.transaction(async (manager) => {
      const invite = await manager
        .getRepository(Invite)
        .findOneBy({ id: inviteId, workshopId: actor.workshopId, acceptedAt: IsNull() });
      if (!invite) throw new NotFoundError('waiting invite');
      return change(manager, invite);
    });
  }

  /** The workshop's account history, newest first: every change, and each invite e-mail's fate. */
  async history(workshopId: string, take = 100): Promise<AccountChange[]> {
    const rows = await this.dataSource.getRepository(AuditEntry).find({
      where: { workshopId, recordType: In(['user', 'invite']) },
      order: { at: 'DESC', id: 'ASC' },
      take,
    });
    return rows.map((r) => ({
      id: r.id,
      at: r.at.toISOString(),
      action: r.action,
      actorName: r.actorName,
      detail: r.detail,
    }));
  }

  private audit(
    manager: EntityManager,
    actor: SessionUser,
    action: AccountAction,
    record: { type: 'user' | 'invite'; id: string },
    detail: string,
  ) {
    return recordAudit(manager, {
      workshopId: actor.workshopId,
      recordType: record.type,
      recordId: record.id,
      action,
      actor: { id: actor.id, name: actor.name },
      at: this.clock.now(),
      detail,
    });
  }
}
