import type { Role } from './roles';

/** "an admin", "a maintainer": a role as a sentence names it. */
export function roleWithArticle(role: Role): string {
  return `${/^[aeiou]/.test(role) ? 'an' : 'a'} ${role}`;
}
