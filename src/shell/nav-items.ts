import type { Role } from '../../shared/auth/auth.schema';

export type NavIcon = 'vessels' | 'workshop' | 'team' | 'deck' | 'runs';

export interface NavItem {
  label: string;
  to: string;
  icon: NavIcon;
}

/** Main navigation per role. Skippers see their own boats; staff see the workshop. */
export function navItemsFor(role: Role): NavItem[] {
  if (role === 'skipper')
    return [
      { label: 'Vessels', to: '/', icon: 'vessels' },
      { label: 'Deck', to: '/deck', icon: 'deck' },
    ];
  const items: NavItem[] = [
    { label: 'Workshop', to: '/', icon: 'workshop' },
    { label: 'Vessels', to: '/vessels', icon: 'vessels' },
    { label: 'Runs', to: '/runs', icon: 'runs' },
    { label: 'Programs', to: '/programs', icon: 'workshop' },
    { label: 'Deck', to: '/deck', icon: 'deck' },
  ];
  if (role === 'manager') items.push({ label: 'Team', to: '/team', icon: 'team' });
  return items;
}
