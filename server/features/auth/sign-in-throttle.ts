import type { DataSource } from 'typeorm';
import type { Clock } from '../../lib/clock.js';
import { HttpError } from '../../lib/errors.js';
import { SignInFailure } from './sign-in-failure.entity.js';

/*
 * Limits guesses at a secret (a password at sign-in, an invite token) per account and per
 * address, counted in the database. Only failures count. An account past its limit refuses
 * even the right password until the window ends: otherwise guessing would simply go on. The
 * per-address limit is ten times higher, so one person's wrong tries never lock out a whole
 * workshop behind one address; only a flood from that address does.
 */

export type SignInLimit = { windowMs: number; perAccount: number; perAddress: number };

/** 10 wrong passwords per account and 100 per address in 15 minutes (common practice). */
export const DEFAULT_SIGN_IN_LIMIT: SignInLimit = {
  windowMs: 15 * 60_000,
  perAccount: 10,
  perAddress: 100,
};

export type AttemptKeys = { account?: string; address: string };

const COUNT_FAILURE = `INSERT INTO "sign_in_failure" ("key", "failures", "windowStartedAt") VALUES (?, 1, ?)
  ON CONFLICT ("key") DO UPDATE SET
    "failures" = CASE WHEN "windowStartedAt" <= ? THEN 1 ELSE "failures" + 1 END,
    "windowStartedAt" = CASE WHEN "windowStartedAt" <= ? THEN excluded."windowStartedAt" ELSE "windowStartedAt" END`;

/**
 * Failures that mean a wrong guess: a wrong password at sign-in (401) or on the account page
 * (slug wrong-password), or a token that matches nothing (404).
 */
const isWrongGuess = (error: unknown) =>
  error instanceof HttpError &&
  (error.status === 401 || error.status === 404 || error.slug === 'wrong-password');

export class SignInThrottle {
  constructor(
    private readonly dataSource: DataSource,
    private readonly limit: SignInLimit,
    private readonly clock: Clock,
  ) {}

  /** Runs one attempt unless a limit is spent; counts it when it was a wrong guess. */
  async attempt<T>(keys: AttemptKeys, run: () => Promise<T>): Promise<T> {
    await this.refuseWhenSpent(keys);
    try {
      const result = await run();
      if (keys.account)
        await this.dataSource
          .getRepository(SignInFailure)
          .delete({ key: `account:${keys.account}` });
      return result;
    } catch (error) {
      if (isWrongGuess(error)) await this.countFailure(keys);
      throw error;
    }
  }

  private async refuseWhenSpent(keys: AttemptKeys): Promise<void> {
    const now = this.clock.now().getTime();
    const checks = [
      { key: `address:${keys.address}`, max: this.limit.perAddress, who: 'from this network' },
      ...(keys.account
        ? [{ key: `account:${keys.account}`, max: this.limit.perAccount, who: 'for this account' }]
        : []),
    ];
    for (const { key, max, who } of checks) {
      const row = await this.dataSource.getRepository(SignInFailure).findOneBy({ key });
      if (!row || row.failures < max || row.windowStartedAt <= now - this.limit.windowMs) continue;
      const minutes = Math.max(
        1,
        Math.ceil((row.windowStartedAt + this.limit.windowMs - now) / 60_000),
      );
      throw new HttpError(
        429,
        'too-many-sign-ins',
        'Too many sign-in attempts',
        `Too many wrong attempts ${who}. Wait ${minutes} minute${minutes === 1 ? '' : 's'} and try again, or ask your workshop's manager to check your account.`,
      );
    }
  }

  private async countFailure(keys: AttemptKeys): Promise<void> {
    const now = this.clock.now().getTime();
    const stale = now - this.limit.windowMs;
    await this.dataSource.transaction(async (manager) => {
      for (const key of [
        `address:${keys.address}`,
        ...(keys.account ? [`account:${keys.account}`] : []),
      ])
        await manager.query(COUNT_FAILURE, [key, now, stale, stale]);
    });
  }
}
