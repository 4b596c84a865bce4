import type { Role } from '../../shared/roles';

export interface DemoUser {
  email: string;
  displayName: string;
  role: Role;
  password: string;
}

/**
 * The demo team (invented): a small group that keeps two JavaScript complex-math
 * libraries and a Python binding honest before each release.
 */
export const DEMO_USERS: DemoUser[] = [
  { email: 'odile@sheetkeeper.test', displayName: 'Odile Marchetti', role: 'admin', password: 'odile-demo-2026' },
  { email: 'kwame@sheetkeeper.test', displayName: 'Kwame Asante', role: 'maintainer', password: 'kwame-demo-2026' },
  { email: 'hanne@sheetkeeper.test', displayName: 'Hanne Lindqvist', role: 'reviewer', password: 'hanne-demo-2026' },
  { email: 'ravi@sheetkeeper.test', displayName: 'Ravi Dutta', role: 'contributor', password: 'ravi-demo-2026' },
  { email: 'mei@sheetkeeper.test', displayName: 'Mei Okonkwo', role: 'contributor', password: 'mei-demo-2026' },
];
