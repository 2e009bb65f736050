import type { ReactNode } from 'react';
import type { SessionUser } from '../../shared/auth/auth.schema';
import { Button } from '../components/ui/button';
import { ExitIcon, RingMark } from '../components/ui/icons';
import { SyncPill } from '../features/sync/components/sync-pill';
import { SyncRunner } from '../features/sync/components/sync-runner';
import { DisplayModeMenu } from './display-mode-menu';

const roleWord = { skipper: 'Skipper', technician: 'Technician', manager: 'Manager' } as const;

export interface SignOutControl {
  pending: boolean;
  /** Why the last attempt failed, in words; null when it did not. */
  error: string | null;
  onSignOut: () => void;
}

interface SiteHeaderProps {
  user: SessionUser;
  /** The link home around the mark, made by the app that renders the header. */
  home: (className: string, content: ReactNode) => ReactNode;
  /** The link to the person's own account page (/account), made the same way. */
  account: (className: string, content: ReactNode) => ReactNode;
  nav: ReactNode;
  signOut: SignOutControl;
}

/**
 * The header both apps share, the workshop app and the deck app (src/deck): it knows no router
 * and no server-state library, so the deck can carry it without them.
 */
export function SiteHeader({ user, home, account, nav, signOut }: SiteHeaderProps) {
  return (
    <header className="border-b-2 border-line bg-surface">
      <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-4 gap-y-1 px-3 py-2 sm:px-5">
        {home(
          'flex min-h-touch items-center gap-2 text-xl font-bold no-underline',
          <>
            <RingMark />
            <span>Ringseat</span>
          </>,
        )}
        <div className="order-last w-full min-w-0 leading-tight sm:order-none sm:w-auto sm:border-l-2 sm:border-line sm:pl-4">
          {account(
            'flex min-h-touch flex-col justify-center no-underline',
            <>
              <span className="truncate font-semibold">{user.workshopName}</span>
              <span className="truncate text-sm text-muted underline underline-offset-4">
                {user.name} · {roleWord[user.role]}
                <span className="sr-only"> (your account)</span>
              </span>
            </>,
          )}
        </div>
        {nav}
        <div className="ml-auto flex items-center gap-2">
          <SyncRunner />
          <SyncPill />
          <DisplayModeMenu />
          <Button
            variant="secondary"
            className="px-3"
            pending={signOut.pending}
            title={signOut.error ?? undefined}
            onClick={signOut.onSignOut}
          >
            <ExitIcon />
            <span>Sign out</span>
          </Button>
        </div>
      </div>
      {signOut.error && (
        <p role="alert" className="mx-auto max-w-6xl px-3 pb-2 font-semibold text-danger sm:px-5">
          Could not sign out: {signOut.error}
        </p>
      )}
    </header>
  );
}
