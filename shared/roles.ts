/** The four roles, from most to least powerful. Stored as text in `users.role`. */
export const ROLES = ['admin', 'maintainer', 'reviewer', 'contributor'] as const;

export type Role = (typeof ROLES)[number];
