import { NavLink } from 'react-router-dom';
import type { Role } from '../../../shared/auth/auth.schema';
import { HullIcon, PeopleIcon, WrenchIcon } from '../../components/ui/icons';
import { cx } from '../../components/ui/cx';
import { DeckIcon } from '../../features/deck/components/deck-icon';
import { RunsIcon } from '../../features/board/components/runs-icon';
import { navItemsFor, type NavIcon } from './nav-items';

const icons: Record<NavIcon, typeof HullIcon> = { vessels: HullIcon, workshop: WrenchIcon, team: PeopleIcon, deck: DeckIcon, runs: RunsIcon };

/**
 * One navigation for every screen size: a bar along the bottom edge on phones (within reach of the
 * thumb), inline in the header from 641px up.
 */
export function MainNav({ role }: { role: Role }) {
  return (
    <nav aria-label="Main"
      className="fixed inset-x-0 bottom-0 z-20 border-t-2 border-line bg-surface safe-bottom sm:static sm:border-0 sm:bg-transparent sm:p-0">
      <ul className="flex sm:gap-1">
        {navItemsFor(role).map(({ label, to, icon }) => {
          const Icon = icons[icon];
          return (
            <li key={to} className="flex-1 sm:flex-none">
              <NavLink to={to} end
                className={({ isActive }) => cx(
                  'flex min-h-touch flex-col items-center justify-center gap-0.5 border-b-4 px-1 py-1 font-semibold no-underline sm:px-4',
                  'sm:flex-row sm:gap-2 sm:py-0',
                  isActive ? 'border-accent text-ink' : 'border-transparent text-muted hover:text-ink',
                )}>
                <Icon />
                <span>{label}</span>
              </NavLink>
            </li>
          );
        })}
      </ul>
    </nav>
  );
}
