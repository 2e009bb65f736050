import type { Router } from 'express';
import type { DataSource } from 'typeorm';
import { accountRouter } from './features/account/account.router.js';
import { AccountService } from './features/account/account.service.js';
import { PasswordResetsService } from './features/account/password-resets.service.js';
import { authRouter } from './features/auth/auth.router.js';
import { AuthService } from './features/auth/auth.service.js';
import type { AppLucia } from './features/auth/lucia.js';
import type { SignInThrottle } from './features/auth/sign-in-throttle.js';
import type { Outbox } from './features/mail/outbox.js';
import { outgoingMailRouter } from './features/mail/outgoing-mail.router.js';
import { inviteAcceptanceRouter } from './features/team/invite-acceptance.router.js';
import { PeopleService } from './features/team/people.service.js';
import { teamRouter } from './features/team/team.router.js';
import { TeamService } from './features/team/team.service.js';
import type { Clock } from './lib/clock.js';

export interface PeopleRouteDeps {
  db: DataSource;
  lucia: AppLucia;
  throttle: SignInThrottle;
  outbox: Outbox;
  clock: Clock;
  publicOrigin: string | undefined;
}

/** Sign-in, accounts, the team and its invites, and the outgoing e-mail list, on the API router. */
export function mountPeopleRoutes(api: Router, deps: PeopleRouteDeps): void {
  const { db, lucia, throttle, outbox, clock, publicOrigin } = deps;
  api.use('/auth', authRouter(new AuthService(db, lucia), lucia, throttle));
  const team = new TeamService(db, lucia, clock);
  const people = new PeopleService(db, clock);
  api.use(teamRouter({ service: team, people, publicOrigin, outbox }));
  api.use(outgoingMailRouter(db, outbox, clock));
  api.use(inviteAcceptanceRouter({ service: team, lucia, throttle }));
  api.use(
    accountRouter({
      account: new AccountService(db, clock, outbox),
      resets: new PasswordResetsService(db, lucia, clock, outbox),
      lucia,
      throttle,
      publicOrigin,
    }),
  );
}
