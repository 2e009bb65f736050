import { Link, useNavigate } from 'react-router-dom';
import type { SessionUser } from '../../../shared/auth/auth.schema';
import { useSignOut } from '../../features/auth/api';
import { errorMessage } from '../../lib/api-client';
import { MainNav } from './main-nav';
import { SiteHeader } from '../../shell/site-header';

/** The workshop app's header: router links and the sign-out mutation around the shared header. */
export function AppHeader({ user }: { user: SessionUser }) {
  const signOut = useSignOut();
  const navigate = useNavigate();
  return (
    <SiteHeader
      user={user}
      home={(className, content) => (
        <Link to="/" className={className}>
          {content}
        </Link>
      )}
      account={(className, content) => (
        <Link to="/account" className={className}>
          {content}
        </Link>
      )}
      nav={<MainNav role={user.role} />}
      signOut={{
        pending: signOut.isPending,
        error: signOut.isError ? errorMessage(signOut.error) : null,
        onSignOut: () =>
          signOut.mutate(undefined, { onSuccess: () => navigate('/sign-in', { replace: true }) }),
      }}
    />
  );
}
