import type { Role } from './roles';

/** A user as the API shows it: never the password hash. */
export interface PublicUser {
  id: string;
  email: string;
  displayName: string;
  role: Role;
  createdAt: string;
}
