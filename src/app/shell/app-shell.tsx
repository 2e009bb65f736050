import { useEffect } from 'react';
import { Navigate, Outlet, useLocation } from 'react-router-dom';
import { useMe } from '../../features/auth/api';
import { clearUserData } from '../../lib/db';
import { AppHeader } from './app-header';
import { Splash } from './splash';
import { type SessionContext } from './session';
import { signInPath } from './sign-in-path';

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

  if (me.data === null) return <Navigate to={signInPath(location.pathname + location.search)} replace />;
  if (me.data === undefined) {
    if (me.isError) throw me.error;
    return <Splash />;
  }

  const context: SessionContext = { user: me.data };
  return (
    <div className="flex min-h-dvh flex-col">
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-40 focus:bg-surface focus:p-3">
        Skip to content
      </a>
      <AppHeader user={me.data} />
      <main id="main" className="mx-auto w-full max-w-6xl flex-1 px-3 pb-bottom-bar pt-4 sm:px-5 sm:pb-10 sm:pt-6">
        <Outlet context={context} />
      </main>
    </div>
  );
}
