/**
 * The shortest new password (an invitation's or a reset's). NIST SP 800-63B §3.1.1.2 asks at
 * least 8 of a password chosen by its user, 15 where it is the only factor; 12 keeps every demo
 * password (15–16 characters) valid while refusing the short ones people guess first.
 */
export const PASSWORD_MIN_LENGTH = 12;
