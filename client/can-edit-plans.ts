import { PLAN_ROLES } from '../shared/plan-roles';
import type { Role } from '../shared/roles';

/** Whether this role shapes plans and schedules and starts or cancels runs (the server grants the same, from `PLAN_ROLES`). */
export function canEditPlans(role: Role): boolean {
  return (PLAN_ROLES as readonly Role[]).includes(role);
}
