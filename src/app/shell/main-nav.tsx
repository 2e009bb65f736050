import { NavLink } from 'react-router-dom';
import type { Role } from '../../../shared/auth/auth.schema';
import { navBarClass, navIcons, navLinkClass } from '../../shell/nav-look';
import { navItemsFor } from '../../shell/nav-items';

/**
 * One navigation for every screen size: a bar along the bottom edge on phones (within reach of the
 * thumb), inline in the header from 641px up.
 */
export function MainNav({ role }: { role: Role }) {
  return (
    <nav aria-label="Main" className={navBarClass}>
      <ul className="flex sm:gap-1">
        {navItemsFor(role).map(({ label, to, icon }) => {
          const Icon = navIcons[icon];
          return (
            <li key={to} className="flex-1 sm:flex-none">
              <NavLink to={to} end className={({ isActive }) => navLinkClass(isActive)}>
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
