import { HullIcon, PeopleIcon, WrenchIcon } from '../components/ui/icons';
import { cx } from '../components/ui/cx';
import { DeckIcon } from '../features/deck/components/deck-icon';
import { RunsIcon } from '../features/board/components/runs-icon';
import type { NavIcon } from './nav-items';

/** How the main navigation looks, shared by the workshop app's router links and the deck's plain links. */
export const navIcons: Record<NavIcon, typeof HullIcon> = {
  vessels: HullIcon,
  workshop: WrenchIcon,
  team: PeopleIcon,
  deck: DeckIcon,
  runs: RunsIcon,
};

export const navBarClass =
  'fixed inset-x-0 bottom-0 z-20 border-t-2 border-line bg-surface safe-bottom sm:static sm:border-0 sm:bg-transparent sm:p-0';

export const navLinkClass = (isActive: boolean) =>
  cx(
    'flex min-h-touch flex-col items-center justify-center gap-0.5 border-b-4 px-1 py-1 font-semibold no-underline sm:px-4',
    'sm:flex-row sm:gap-2 sm:py-0',
    isActive ? 'border-accent text-ink' : 'border-transparent text-muted hover:text-ink',
  );
