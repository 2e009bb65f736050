import { Link, useNavigate } from 'react-router-dom';
import type { SessionUser } from '../../../shared/auth/auth.schema';
import { useSignOut } from '../../features/auth/api';
import { Button } from '../../components/ui/button';
import { ExitIcon, RingMark } from '../../components/ui/icons';
import { errorMessage } from '../../lib/api-client';
import { SyncPill } from '../../features/sync/components/sync-pill';
import { SyncRunner } from '../../features/sync/components/sync-runner';
import { DisplayModeMenu } from './display-mode-menu';
import { MainNav } from './main-nav';

const roleWord = { skipper: 'Skipper', technician: 'Technician', manager: 'Manager' } as const;

export function AppHeader({ user }: { user: SessionUser }) {
  const signOut = useSignOut();
  const navigate = useNavigate();

  return (
    <header className="border-b-2 border-line bg-surface">
      <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-4 gap-y-1 px-3 py-2 sm:flex-nowrap sm:px-5">
        <Link to="/" className="flex min-h-touch items-center gap-2 text-xl font-bold no-underline">
          <RingMark />
          <span>Ringseat</span>
        </Link>
        <div className="order-last w-full min-w-0 leading-tight sm:order-none sm:w-auto sm:border-l-2 sm:border-line sm:pl-4">
          <p className="truncate font-semibold">{user.workshopName}</p>
          <p className="truncate text-sm text-muted">
            {user.name} · {roleWord[user.role]}
          </p>
        </div>
        <MainNav role={user.role} />
        <div className="ml-auto flex items-center gap-2">
          <SyncRunner />
          <SyncPill />
          <DisplayModeMenu />
          <Button variant="secondary" className="px-3" pending={signOut.isPending}
            title={signOut.isError ? errorMessage(signOut.error) : undefined}
            onClick={() => signOut.mutate(undefined, { onSuccess: () => navigate('/sign-in', { replace: true }) })}>
            <ExitIcon />
            <span>Sign out</span>
          </Button>
        </div>
      </div>
      {signOut.isError && (
        <p role="alert" className="mx-auto max-w-6xl px-3 pb-2 font-semibold text-danger sm:px-5">
          Could not sign out: {errorMessage(signOut.error)}
        </p>
      )}
    </header>
  );
}
