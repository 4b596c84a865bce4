import type { Role } from '../shared/roles';

/** Plans and schedules are shaped by maintainers and admins (the server's `requireRole` says the same). */
export function canEditPlans(role: Role): boolean {
  return role === 'maintainer' || role === 'admin';
}
