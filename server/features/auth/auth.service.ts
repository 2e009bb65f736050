import { IsNull, type DataSource } from 'typeorm';
import type { SignInInput } from '../../../shared/auth/auth.schema.js';
import { HttpError } from '../../lib/errors.js';
import { hashPassword, verifyPassword } from '../../lib/passwords.js';
import { User } from '../users/user.entity.js';
import type { AppLucia } from './lucia.js';

const WRONG_CREDENTIALS = 'The e-mail address or the password is not right.';

export class AuthService {
  /** Verified against when the e-mail is unknown, so both failures take the same time. */
  private decoyHash: Promise<string> | null = null;

  constructor(
    private readonly dataSource: DataSource,
    private readonly lucia: AppLucia,
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
}
