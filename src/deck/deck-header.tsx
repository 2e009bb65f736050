import { useState } from 'react';
import type { Role, SessionUser } from '../../shared/auth/auth.schema';
import { signOutOnServer } from '../features/auth/session-user';
import { DeckLink } from '../features/deck/components/deck-link';
import { errorMessage } from '../lib/api-client';
import { clearUserData } from '../lib/db';
import { navBarClass, navIcons, navLinkClass } from '../shell/nav-look';
import { navItemsFor } from '../shell/nav-items';
import { SiteHeader, type SignOutControl } from '../shell/site-header';

/** Signs out on the server, forgets the user's copies on this device, then goes to sign-in. */
function useDeckSignOut(): SignOutControl {
  const [signOut, setSignOut] = useState<{ pending: boolean; error: string | null }>({
    pending: false,
    error: null,
  });
  const onSignOut = async () => {
    setSignOut({ pending: true, error: null });
    try {
      await signOutOnServer();
      await clearUserData().catch(() => undefined);
      window.location.replace('/sign-in');
    } catch (error) {
      setSignOut({ pending: false, error: errorMessage(error) });
    }
  };
  return { ...signOut, onSignOut: () => void onSignOut() };
}

/** The main navigation as plain links: the deck is the current page, the rest load the other app. */
function DeckNav({ role }: { role: Role }) {
  return (
    <nav aria-label="Main" className={navBarClass}>
      <ul className="flex sm:gap-1">
        {navItemsFor(role).map(({ label, to, icon }) => {
          const Icon = navIcons[icon];
          const here = to === '/deck';
          return (
            <li key={to} className="flex-1 sm:flex-none">
              <DeckLink
                to={to}
                className={navLinkClass(here)}
                aria-current={here ? 'page' : undefined}
              >
                <Icon />
                <span>{label}</span>
              </DeckLink>
            </li>
          );
        })}
      </ul>
    </nav>
  );
}

/** The same header and navigation as the workshop app; links outside the deck load that app. */
export function DeckHeader({ user }: { user: SessionUser }) {
  const signOut = useDeckSignOut();
  return (
    <SiteHeader
      user={user}
      home={(className, content) => (
        <a href="/" className={className}>
          {content}
        </a>
      )}
      account={(className, content) => (
        <a href="/account" className={className}>
          {content}
        </a>
      )}
      nav={<DeckNav role={user.role} />}
      signOut={signOut}
    />
  );
}
