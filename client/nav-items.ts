import type { Role } from '../shared/roles';
import { ROLES } from '../shared/roles';

export interface NavItem {
  href: string;
  label: string;
  /** A glyph beside the label, so the bar reads at a glance without relying on colour; each one exists in IBM Plex Sans (checked with fc-query). */
  glyph: string;
  roles: readonly Role[];
  /** On a phone, primary items sit in the tab bar; the rest are one tap away under "More". */
  primary: boolean;
}

/** Every destination in the navigation, with the roles that may see it (the server enforces the same). */
export const NAV_ITEMS: NavItem[] = [
  { href: '/', label: 'Overview', glyph: '∑', roles: ROLES, primary: true },
  { href: '/runs', label: 'Runs', glyph: '↻', roles: ROLES, primary: true },
  { href: '/failures', label: 'Failures', glyph: '≠', roles: ROLES, primary: true },
  { href: '/suites', label: 'Suites', glyph: '∫', roles: ROLES, primary: true },
  { href: '/decisions', label: 'Decisions', glyph: '§', roles: ROLES, primary: false },
  { href: '/review', label: 'Review', glyph: '✓', roles: ['reviewer', 'admin'], primary: false },
  { href: '/libraries', label: 'Libraries', glyph: '∂', roles: ROLES, primary: false },
  { href: '/plans', label: 'Plans', glyph: '⇄', roles: ROLES, primary: false },
  { href: '/settings', label: 'Settings', glyph: '∆', roles: ROLES, primary: false },
  { href: '/users', label: 'Users', glyph: '∏', roles: ['admin'], primary: false },
  { href: '/outbox', label: 'Outbox', glyph: '↩', roles: ['admin'], primary: false },
];

/** The phone's last tab: every destination that is not primary. */
export const MORE_ITEM: NavItem = { href: '/more', label: 'More', glyph: '…', roles: ROLES, primary: true };
