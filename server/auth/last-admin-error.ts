import type { ApiError } from '../../shared/api-error';

/** Why a role change or deactivation is refused when it would leave no active admin. */
export const LAST_ADMIN_ERROR: ApiError = {
  kind: 'conflict',
  message: 'This is the last active admin; make someone else admin first.',
};
