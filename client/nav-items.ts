import type { Role } from '../shared/roles';
import { ROLES } from '../shared/roles';

export interface NavItem {
  href: '/' | '/users';
  label: string;
  /** A glyph beside the label, so the bar reads at a glance without relying on colour. */
  glyph: string;
  roles: readonly Role[];
}

/** Every destination in the navigation, with the roles that may see it (the server enforces the same). */
export const NAV_ITEMS: NavItem[] = [
  { href: '/', label: 'Home', glyph: '⌂', roles: ROLES },
  { href: '/users', label: 'Users', glyph: '◎', roles: ['admin'] },
];
