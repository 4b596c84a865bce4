import { CATALOGUE_ENTRIES } from '../catalogue/catalogue-entries';
import type { FunctionRule } from './function-rule';

/**
 * The rule table behind every finding's `rule`, computed from each catalogue entry's `rule`
 * (harness/catalogue/entries). Clause numbers are those of ISO/IEC 9899:2011
 * Annex G (G.6.1.1 cacos, G.6.2.1–3 cacosh/casinh/catanh, G.6.3.1–2 cexp/clog, G.6.4.1–2
 * cpow/csqrt; casin and catan through the identities of G.6 paragraph 7) and of the DLMF
 * equations the reference engine implements (harness/reference/functions); the side rules are
 * Kahan's (1987) as each reference function states them. docs/sources.md lists which clause
 * and equation was checked against which published text; a rule whose equation number could
 * not be checked says so in its own text.
 */
export const FUNCTION_RULES: Readonly<Record<string, FunctionRule>> = Object.fromEntries(
  CATALOGUE_ENTRIES.map((entry) => [entry.name, entry.rule]),
);

/** ISO/IEC 9899:2011 7.3.3 (branch cuts): how the two conventions treat cuts in general. */
export const CUT_CONVENTION_RULE = {
  'signed-zero': 'ISO/IEC 9899:2011 7.3.3 and Annex G: the sign of a zero part distinguishes the sides of a cut',
  'counter-clockwise':
    'ISO/IEC 9899:2011 7.3.3 for implementations without signed zeros (Kahan 1987): a cut is continuous with the side reached turning counter-clockwise about its finite end',
} as const;
