/** What a one-time link mailed by an admin does: make an account with a role, or set a new password. */
export const ACCOUNT_LINK_KINDS = ['invitation', 'password-reset'] as const;

export type AccountLinkKind = (typeof ACCOUNT_LINK_KINDS)[number];
