import type { Role } from './roles';

/**
 * The roles that shape plans and schedules and start or cancel their runs. The server's routes
 * (plans, schedules, runs) grant access with this list and the app shows its buttons by it, so
 * the two cannot drift apart.
 */
export const PLAN_ROLES = ['maintainer', 'admin'] as const satisfies readonly Role[];
