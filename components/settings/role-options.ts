import { ROLES } from '../../shared/roles';

/** The roles as chips (invitation form, users list), most powerful first. */
export const ROLE_OPTIONS = ROLES.map((role) => ({ value: role, text: role }));
