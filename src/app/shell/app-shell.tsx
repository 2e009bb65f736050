import { useEffect } from 'react';
import { Navigate, Outlet, useLocation } from 'react-router-dom';
import { useMe } from '../../features/auth/api';
import { clearUserData } from '../../lib/db';
import { AppHeader } from './app-header';
import { PageFrame } from '../../shell/page-frame';
import { Splash } from '../../shell/splash';
import { type SessionContext } from './session';
import { signInPath } from '../../shell/sign-in-path';

/**
 * The signed-in frame: header, navigation and the page. The route loader checks the session on
 * arrival; this guard keeps checking, so an expired session or a sign-out leads to the sign-in page.
 */
export function AppShell() {
  const me = useMe();
  const location = useLocation();
  // Any 401 means the session is gone: the user's copies leave the device (unsent readings stay).
  useEffect(() => {
    if (me.data === null) void clearUserData().catch(() => undefined);
  }, [me.data]);

  if (me.data === null)
    return <Navigate to={signInPath(location.pathname + location.search)} replace />;
  if (me.data === undefined) {
    if (me.isError) throw me.error;
    return <Splash />;
  }

  const context: SessionContext = { user: me.data };
  return (
    <PageFrame header={<AppHeader user={me.data} />}>
      <Outlet context={context} />
    </PageFrame>
  );
}
