/** At most this many regressions are listed in one mail (branch ones first); the rest are counted and linked. */
export const REGRESSION_MAIL_ROWS = 50;
