import { randomUUID } from 'node:crypto';
import { IsNull, MoreThan, type DataSource } from 'typeorm';
import type { ResetPasswordInput } from '../../../shared/auth/account.schema.js';
import type { Clock } from '../../lib/clock.js';
import { GoneError, NotFoundError } from '../../lib/errors.js';
import { assertStrongPassword } from '../../lib/password-strength.js';
import { hashPassword } from '../../lib/passwords.js';
import { hashToken, newToken } from '../../lib/tokens.js';
import { recordAudit } from '../audit/audit.service.js';
import type { AppLucia } from '../auth/lucia.js';
import { Session } from '../auth/session.entity.js';
import { passwordChangedMail, passwordResetMail } from '../mail/account-mail.js';
import type { Outbox } from '../mail/outbox.js';
import { User } from '../users/user.entity.js';
import { mailFor, personalWords, setPassword } from './account.service.js';
import { PasswordReset } from './password-reset.entity.js';

/** A reset link works once, for 30 minutes (common practice for e-mailed reset links). */
export const RESET_VALID_MINUTES = 30;
/** At most three reset e-mails per account an hour, so nobody can flood someone's inbox. */
export const RESETS_PER_HOUR = 3;

/** "Forgot your password?": a single-use link by e-mail, then a new password and a fresh session. */
export class PasswordResetsService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly lucia: AppLucia,
    private readonly clock: Clock,
    private readonly outbox: Outbox,
  ) {}

  /**
   * E-mails a reset link when the address belongs to an active account. The caller answers the
   * same whatever happens here, so the form never tells who has an account.
   */
  async request(email: string, linkFor: (token: string) => string): Promise<void> {
    const user = await this.dataSource.getRepository(User).findOne({
      where: { email, archivedAt: IsNull() },
      relations: { workshop: true },
    });
    if (!user) return;
    const now = this.clock.now();
    const recent = await this.dataSource.getRepository(PasswordReset).countBy({
      userId: user.id,
      createdAt: MoreThan(new Date(now.getTime() - 3_600_000)),
    });
    if (recent >= RESETS_PER_HOUR) return;
    const token = newToken();
    const workshopName = user.workshop?.name ?? '';
    const mailId = await this.dataSource.transaction(async (manager) => {
      await manager.getRepository(PasswordReset).insert({
        id: randomUUID(),
        userId: user.id,
        tokenHash: hashToken(token),
        expiresAt: new Date(now.getTime() + RESET_VALID_MINUTES * 60_000),
        usedAt: null,
        createdAt: now,
      });
      await recordAudit(manager, {
        workshopId: user.workshopId,
        recordType: 'user',
        recordId: user.id,
        action: 'password-reset-requested',
        actor: null,
        at: now,
        detail: `A reset link was e-mailed to ${user.email}.`,
      });
      return this.outbox.enqueue(
        manager,
        user.workshopId,
        passwordResetMail({
          ...mailFor({ ...user, workshopName }),
          link: linkFor(token),
          validMinutes: RESET_VALID_MINUTES,
        }),
      );
    });
    await this.outbox.deliver([mailId]);
  }

  /** The open reset of a token, with its account, or why the link does not work. */
  async findOpen(token: string) {
    const reset = await this.dataSource
      .getRepository(PasswordReset)
      .findOneBy({ tokenHash: hashToken(token) });
    const user =
      reset &&
      (await this.dataSource.getRepository(User).findOne({
        where: { id: reset.userId, archivedAt: IsNull() },
        relations: { workshop: true },
      }));
    if (!reset || !user) throw new NotFoundError('reset link');
    if (reset.usedAt)
      throw new GoneError('This reset link has been used. Ask for a new one on the sign-in page.');
    if (reset.expiresAt.getTime() <= this.clock.now().getTime())
      throw new GoneError('This reset link has expired. Ask for a new one on the sign-in page.');
    return { reset, user };
  }

  /** Sets the new password, ends every session, uses up the link, and signs this browser in. */
  async reset(input: ResetPasswordInput) {
    const { reset, user } = await this.findOpen(input.token);
    const workshopName = user.workshop?.name ?? '';
    await assertStrongPassword(
      input.password,
      'password',
      personalWords({ ...user, workshopName }),
    );
    const passwordHash = await hashPassword(input.password);
    const now = this.clock.now();
    const mailId = await this.dataSource.transaction(async (manager) => {
      // Taking the link first makes it single-use even when two tabs send it at once.
      const { affected } = await manager
        .getRepository(PasswordReset)
        .update({ id: reset.id, usedAt: IsNull() }, { usedAt: now });
      if (affected !== 1) throw new GoneError('This reset link has been used.');
      await setPassword(manager, user.id, passwordHash, now);
      await manager.getRepository(Session).delete({ userId: user.id });
      await recordAudit(manager, {
        workshopId: user.workshopId,
        recordType: 'user',
        recordId: user.id,
        action: 'password-reset',
        actor: { id: user.id, name: user.name },
        at: now,
        detail: `${user.name} (${user.email}) chose a new password through a reset link; every device was signed out.`,
      });
      const mail = passwordChangedMail({ ...mailFor({ ...user, workshopName }), how: 'reset' });
      return this.outbox.enqueue(manager, user.workshopId, mail);
    });
    await this.outbox.deliver([mailId]);
    return this.lucia.createSession(user.id, {});
  }
}
