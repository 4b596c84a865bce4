/** The longest password the sign-in form and a new password take (bcrypt reads only 72 bytes; the rest is accepted and ignored). */
export const PASSWORD_MAX_LENGTH = 200;
