import { IsNull, Not, type DataSource, type EntityManager } from 'typeorm';
import type { AccountView, ChangePasswordInput } from '../../../shared/auth/account.schema.js';
import type { SessionUser } from '../../../shared/auth/auth.schema.js';
import type { Clock } from '../../lib/clock.js';
import { HttpError } from '../../lib/errors.js';
import { assertStrongPassword } from '../../lib/password-strength.js';
import { hashPassword, verifyPassword } from '../../lib/passwords.js';
import { recordAudit, type AccountAction } from '../audit/audit.service.js';
import { passwordChangedMail } from '../mail/account-mail.js';
import type { Outbox } from '../mail/outbox.js';
import { Session } from '../auth/session.entity.js';
import { User } from '../users/user.entity.js';
import { PasswordReset } from './password-reset.entity.js';

/** A wrong current password counts as a wrong guess at the sign-in limit, like a sign-in. */
export const wrongCurrentPassword = () =>
  new HttpError(400, 'wrong-password', 'Wrong password', 'The current password is not right.', [
    { field: 'currentPassword', message: 'This is not your current password.' },
  ]);

/** What a person can do to their own account once signed in. */
export class AccountService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly clock: Clock,
    private readonly outbox: Outbox,
  ) {}

  async view(user: SessionUser): Promise<AccountView> {
    const row = await this.dataSource.getRepository(User).findOneByOrFail({ id: user.id });
    const sessions = await this.dataSource
      .getRepository(Session)
      .createQueryBuilder('s')
      .where('s.userId = :id AND s.expiresAt > :now', {
        id: user.id,
        now: this.clock.now().getTime(),
      })
      .getCount();
    return {
      email: row.email,
      name: row.name,
      sessions,
      passwordChangedAt: row.passwordChangedAt?.toISOString() ?? null,
    };
  }

  /** Sets a new password; every other session of the person ends, this one stays. */
  async changePassword(user: SessionUser, sessionId: string, input: ChangePasswordInput) {
    const row = await this.dataSource.getRepository(User).findOneByOrFail({ id: user.id });
    if (!(await verifyPassword(row.passwordHash, input.currentPassword)))
      throw wrongCurrentPassword();
    await assertStrongPassword(input.newPassword, 'newPassword', personalWords(user));
    const passwordHash = await hashPassword(input.newPassword);
    const mailId = await this.dataSource.transaction(async (manager) => {
      await setPassword(manager, user.id, passwordHash, this.clock.now());
      await manager.getRepository(Session).delete({ userId: user.id, id: Not(sessionId) });
      await this.audit(manager, user, 'password-changed', 'Other devices were signed out.');
      return this.outbox.enqueue(
        manager,
        user.workshopId,
        passwordChangedMail({ ...mailFor(user), how: 'changed' }),
      );
    });
    await this.outbox.deliver([mailId]);
  }

  /** Ends every session of the person, on every device, this one included. */
  async signOutEverywhere(user: SessionUser): Promise<number> {
    return this.dataSource.transaction(async (manager) => {
      const { affected } = await manager.getRepository(Session).delete({ userId: user.id });
      await this.audit(manager, user, 'signed-out-everywhere', `${affected ?? 0} sessions ended.`);
      return affected ?? 0;
    });
  }

  private audit(manager: EntityManager, user: SessionUser, action: AccountAction, detail: string) {
    return recordAudit(manager, {
      workshopId: user.workshopId,
      recordType: 'user',
      recordId: user.id,
      action,
      actor: { id: user.id, name: user.name },
      at: this.clock.now(),
      detail: `${user.name} (${user.email}): ${detail}`,
    });
  }
}

/** The words a password must not be built from: the person's address, name and workshop. */
export const personalWords = (user: { email: string; name: string; workshopName?: string }) =>
  [user.email, user.name, user.workshopName ?? ''].filter(Boolean);

export const mailFor = (user: { email: string; name: string; workshopName: string }) => ({
  to: user.email,
  name: user.name,
  workshopName: user.workshopName,
});

/** The new hash, and every reset link still open for the person made useless. */
export async function setPassword(
  manager: EntityManager,
  userId: string,
  passwordHash: string,
  now: Date,
): Promise<void> {
  await manager
    .getRepository(User)
    .update({ id: userId }, { passwordHash, passwordChangedAt: now });
  await manager.getRepository(PasswordReset).update({ userId, usedAt: IsNull() }, { usedAt: now });
}
