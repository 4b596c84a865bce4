import type { Convention } from '../../shared/schemas/convention-schema';

/**
 * What a target's stated convention means for its checks, in a line for the library screens: a
 * suite of the other convention does not hold it to that convention where the two differ.
 */
export const STATED_CONVENTION_WORDS: Record<Convention, string> = {
  'signed-zero':
    'States signed zeros on its cuts (ISO C Annex G): counter-clockwise suites skip the points where the two conventions differ.',
  'counter-clockwise':
    'States counter-clockwise continuity on its cuts: signed-zero suites skip the points where the two conventions differ.',
};
