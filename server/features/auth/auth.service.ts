import { randomUUID } from 'node:crypto';
import { IsNull, type DataSource } from 'typeorm';
import type { AcceptInviteInput, SignInInput } from '../../../shared/auth/auth.schema.js';
import type { Clock } from '../../lib/clock.js';
import { ConflictError, GoneError, HttpError, NotFoundError } from '../../lib/errors.js';
import { hashPassword, verifyPassword } from '../../lib/passwords.js';
import { hashToken } from '../../lib/tokens.js';
import { Invite } from '../users/invite.entity.js';
import { User } from '../users/user.entity.js';
import { VesselSkipper } from '../vessels/vessel-skipper.entity.js';
import type { AppLucia } from './lucia.js';

const WRONG_CREDENTIALS = 'The e-mail address or the password is not right.';

export class AuthService {
  /** Verified against when the e-mail is unknown, so both failures take the same time. */
  private decoyHash: Promise<string> | null = null;

  constructor(
    private readonly dataSource: DataSource,
    private readonly lucia: AppLucia,
    private readonly clock: Clock,
  ) {}

  async signIn(input: SignInInput) {
    const user = await this.dataSource
      .getRepository(User)
      .findOne({ where: { email: input.email, archivedAt: IsNull() } });
    if (!user) {
      this.decoyHash ??= hashPassword('decoy password for timing');
      await verifyPassword(await this.decoyHash, input.password);
      throw new HttpError(401, 'wrong-credentials', 'Sign-in failed', WRONG_CREDENTIALS);
    }
    if (!(await verifyPassword(user.passwordHash, input.password))) {
      throw new HttpError(401, 'wrong-credentials', 'Sign-in failed', WRONG_CREDENTIALS);
    }
    return this.lucia.createSession(user.id, {});
  }

  signOut(sessionId: string) {
    return this.lucia.invalidateSession(sessionId);
  }

  /** Finds a usable invite or says plainly why the link does not work. */
  async findOpenInvite(token: string): Promise<Invite> {
    const invite = await this.dataSource
      .getRepository(Invite)
      .findOne({ where: { tokenHash: hashToken(token) }, relations: { workshop: true } });
    if (!invite) throw new NotFoundError('invite');
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
      await manager
        .getRepository(Invite)
        .update({ id: invite.id }, { acceptedAt: this.clock.now() });
    });
    return this.lucia.createSession(userId, {});
  }
}
