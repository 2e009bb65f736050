import { Component, useEffect, useState, type ReactNode } from 'react';
import type { SessionUser } from '../../shared/auth/auth.schema';
import { describeError } from '../shell/error-words';
import { signInPath } from '../shell/sign-in-path';
import { PageFrame, ProblemPanel } from '../shell/page-frame';
import { ReloadPage, Splash } from '../shell/splash';
import { buttonClass } from '../components/ui/button';
import { fetchSessionUser } from '../features/auth/session-user';
import { usePathname } from '../features/deck/deck-navigation';
import { DeckHeader } from './deck-header';
import { DeckHome, deckPageFor, DeckVesselPage } from './deck-pages';

type Session =
  | { state: 'checking' }
  | { state: 'signed-in'; user: SessionUser }
  | { state: 'failed'; error: unknown };

/**
 * Who is signed in: the server's answer, or with no network the user it last confirmed on this
 * device (fetchSessionUser). Nobody signed in means the sign-in page, coming back here after.
 */
function useDeckSession(): Session {
  const [session, setSession] = useState<Session>({ state: 'checking' });
  useEffect(() => {
    const controller = new AbortController();
    fetchSessionUser(controller.signal).then(
      (user) => {
        if (user) setSession({ state: 'signed-in', user });
        else window.location.replace(signInPath(window.location.pathname + window.location.search));
      },
      (error: unknown) => !controller.signal.aborted && setSession({ state: 'failed', error }),
    );
    return () => controller.abort();
  }, []);
  return session;
}

function Problem({ error }: { error: unknown }) {
  const { title, detail } = describeError(error);
  return (
    <ProblemPanel
      title={title}
      detail={detail}
      back={
        <a href="/" className={buttonClass('secondary')}>
          Back to the start
        </a>
      }
    />
  );
}

/** A page that throws shows what happened instead of a blank screen. */
class PageBoundary extends Component<
  { children: ReactNode; resetKey: string },
  { error: unknown }
> {
  state: { error: unknown } = { error: null };

  static getDerivedStateFromError(error: unknown) {
    return { error };
  }

  componentDidUpdate(previous: { resetKey: string }) {
    if (previous.resetKey !== this.props.resetKey && this.state.error !== null)
      this.setState({ error: null });
  }

  render() {
    return this.state.error !== null ? <Problem error={this.state.error} /> : this.props.children;
  }
}

/**
 * The deck app: what a phone opens at sea, from the home screen, often with no signal. It is
 * loaded instead of the workshop app for /deck addresses (src/main.tsx) and carries only what the
 * deck needs: no router, no server-state library, no workshop screens (DEVELOPERS.md).
 */
export function DeckApp() {
  const session = useDeckSession();
  const pathname = usePathname();
  if (session.state === 'checking') return <Splash />;
  if (session.state === 'failed') return <Problem error={session.error} />;
  const page = deckPageFor(pathname);
  // An address the deck does not have belongs to the workshop app.
  if (!page) return <ReloadPage />;
  return (
    <PageFrame header={<DeckHeader user={session.user} />}>
      <PageBoundary resetKey={pathname}>
        {page.page === 'home' ? (
          <DeckHome user={session.user} />
        ) : (
          <DeckVesselPage vesselId={page.vesselId} user={session.user} />
        )}
      </PageBoundary>
    </PageFrame>
  );
}
