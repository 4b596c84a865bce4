import type { Href } from 'expo-router';
import type { Role } from '../shared/roles';
import { ROLES } from '../shared/roles';

export interface NavItem {
  /** A route of the app as a plain path (typed routes check it), so the frame can compare it with the current path. */
  href: Extract<Href, string>;
  label: string;
  roles: readonly Role[];
  /** On a phone, primary items sit in the tab bar; the rest are one tap away under "More". */
  primary: boolean;
}

/** Every destination in the navigation, with the roles that may see it (the server enforces the same). */
export const NAV_ITEMS: NavItem[] = [
  { href: '/', label: 'Overview', roles: ROLES, primary: true },
  { href: '/runs', label: 'Runs', roles: ROLES, primary: true },
  { href: '/failures', label: 'Failures', roles: ROLES, primary: true },
  { href: '/suites', label: 'Suites', roles: ROLES, primary: true },
  { href: '/decisions', label: 'Decisions', roles: ROLES, primary: false },
  { href: '/review', label: 'Review', roles: ['reviewer', 'admin'], primary: false },
  { href: '/libraries', label: 'Libraries', roles: ROLES, primary: false },
  { href: '/plans', label: 'Plans', roles: ROLES, primary: false },
  { href: '/settings', label: 'Settings', roles: ROLES, primary: false },
  { href: '/users', label: 'Users', roles: ['admin'], primary: false },
  { href: '/outbox', label: 'Outbox', roles: ['admin'], primary: false },
];

/** The phone's last tab: every destination that is not primary. */
export const MORE_ITEM: NavItem = { href: '/more', label: 'More', roles: ROLES, primary: true };
