/** What fixes a principal value of one catalogue function: its definition, Annex G clause, and Kahan's side of each cut. */
export interface FunctionRule {
  /** The definition of the principal branch. */
  definition: string;
  /** The ISO C Annex G clause that fixes values on the cut and special values under signed zeros. */
  annexG: string;
  /** Which side each cut belongs to under counter-clockwise continuity. */
  counterClockwise: string;
}

/**
 * The rule table behind every finding's `rule`. Clause numbers are those of ISO/IEC 9899:2011
 * Annex G (G.6.1.1 cacos, G.6.2.1–3 cacosh/casinh/catanh, G.6.3.1–2 cexp/clog, G.6.4.1–2
 * cpow/csqrt; casin and catan through the identities of G.6 paragraph 7) and of the DLMF
 * equations the reference engine implements (harness/reference/functions); the side rules are
 * Kahan's (1987) as each reference function states them. docs/sources.md lists which clause
 * and equation was checked against which published text; a rule whose equation number could
 * not be checked says so in its own text.
 */
export const FUNCTION_RULES: Readonly<Record<string, FunctionRule>> = {
  sqrt: {
    definition: 'DLMF §4.2(iv) with 4.2.7: √z = exp(½ Log z), Re √z ≥ 0',
    annexG:
      'ISO/IEC 9899:2011 G.6.4.2 (csqrt): on (−∞, 0] the sign of the zero imaginary part picks the side, csqrt(conj z) = conj csqrt(z)',
    counterClockwise: 'Kahan 1987: the cut (−∞, 0] belongs to the upper side, √(−4) = 2i',
  },
  cbrt: {
    definition:
      'DLMF 4.2.26 with w = 1/3: ∛z = exp(⅓ Log z), |arg| ≤ π/3 (equation number not checked against the DLMF text)',
    annexG:
      'ISO/IEC 9899:2011 G.6.4.1 (cpow, through clog G.6.3.2): on (−∞, 0] the sign of the zero imaginary part picks the side',
    counterClockwise: 'Kahan 1987: the cut (−∞, 0] belongs to the upper side',
  },
  nthroot: {
    definition:
      'DLMF 4.2.26 with w = 1/n: z^(1/n) = exp(Log z / n) (equation number not checked against the DLMF text)',
    annexG:
      'ISO/IEC 9899:2011 G.6.4.1 (cpow, through clog G.6.3.2): on (−∞, 0] the sign of the zero imaginary part picks the side',
    counterClockwise: 'Kahan 1987: the cut (−∞, 0] belongs to the upper side',
  },
  pow: {
    definition: 'DLMF 4.2.26: z^w = exp(w Log z) (equation number not checked against the DLMF text)',
    annexG:
      'ISO/IEC 9899:2011 G.6.4.1 (cpow ≈ cexp(w·clog z)): on (−∞, 0] the sign of the zero imaginary part picks the side',
    counterClockwise: 'Kahan 1987: the cut (−∞, 0] belongs to the upper side',
  },
  exp: {
    definition: 'DLMF §4.2(iii): e^z = e^x (cos y + i sin y), single-valued',
    annexG: 'ISO/IEC 9899:2011 G.6.3.1 (cexp): special values and the sign of a zero imaginary part',
    counterClockwise: 'no cut',
  },
  log: {
    definition: 'DLMF 4.2.5, with 4.2.7 on the cut: Log z = ln|z| + i Arg z, −π < Arg ≤ π',
    annexG: 'ISO/IEC 9899:2011 G.6.3.2 (clog): Log(x ± 0i) = ln|x| ± iπ for x < 0, clog(conj z) = conj clog(z)',
    counterClockwise: 'Kahan 1987: the cut (−∞, 0] belongs to the upper side, Log(−1) = iπ',
  },
  asin: {
    definition: 'DLMF 4.23.19: asin z = −i ln(iz + √(1 − z²)), |Re| ≤ π/2',
    annexG:
      'ISO/IEC 9899:2011 G.6 paragraph 7 (casin z = −i casinh(iz)) with G.6.2.2: on (−∞, −1] and [1, ∞) the sign of Im z picks the side',
    counterClockwise: 'Kahan 1987: (−∞, −1] belongs to the upper side, [1, ∞) to the lower',
  },
  acos: {
    definition: 'DLMF 4.23.22: acos z = π/2 + i ln((1 − z²)^½ + iz) = π/2 − asin z, 0 ≤ Re ≤ π',
    annexG: 'ISO/IEC 9899:2011 G.6.1.1 (cacos): on (−∞, −1] and [1, ∞) the sign of Im z picks the side',
    counterClockwise: 'Kahan 1987: (−∞, −1] belongs to the upper side, [1, ∞) to the lower',
  },
  atan: {
    definition: 'DLMF 4.23.26: atan z = (i/2) ln((i + z)/(i − z)), |Re| ≤ π/2',
    annexG:
      'ISO/IEC 9899:2011 G.6 paragraph 7 (catan z = −i catanh(iz)) with G.6.2.3: on [i, i∞) and (−i∞, −i] the sign of Re z picks the side',
    counterClockwise: 'Kahan 1987: [i, i∞) belongs to the right side, (−i∞, −i] to the left',
  },
  asinh: {
    definition:
      'DLMF 4.37.16: asinh z = ln(z + √(1 + z²)), |Im| ≤ π/2 (equation number not checked against the DLMF text)',
    annexG: 'ISO/IEC 9899:2011 G.6.2.2 (casinh): on [i, i∞) and (−i∞, −i] the sign of Re z picks the side',
    counterClockwise: 'Kahan 1987: [i, i∞) belongs to the right side, (−i∞, −i] to the left',
  },
  acosh: {
    definition:
      'DLMF 4.37.17: acosh z = ln(z + (z + 1)√((z − 1)/(z + 1))), Re ≥ 0 (equation number not checked against the DLMF text)',
    annexG: 'ISO/IEC 9899:2011 G.6.2.1 (cacosh): on (−∞, 1] the sign of Im z picks the side',
    counterClockwise: 'Kahan 1987: the cut (−∞, 1] belongs to the upper side',
  },
  atanh: {
    definition:
      'DLMF 4.37.24: atanh z = ½ ln((1 + z)/(1 − z)), |Im| ≤ π/2 (equation number not checked against the DLMF text)',
    annexG: 'ISO/IEC 9899:2011 G.6.2.3 (catanh): on (−∞, −1] and [1, ∞) the sign of Im z picks the side',
    counterClockwise: 'Kahan 1987: (−∞, −1] belongs to the upper side, [1, ∞) to the lower',
  },
  acot: {
    definition: 'DLMF 4.23.9: acot z = atan(1/z)',
    annexG:
      'through catan at 1/z (ISO/IEC 9899:2011 G.6): on [−i, 0) and (0, i] the sign of Re z picks the side, as for atan',
    counterClockwise: 'inherited from atan at 1/z (Kahan 1987): (0, i] left, [−i, 0) right',
  },
  asec: {
    definition: 'DLMF 4.23.8: asec z = acos(1/z)',
    annexG:
      'through cacos at 1/z (ISO/IEC 9899:2011 G.6.1.1): on [−1, 0) and (0, 1] the sign of Im z picks the opposite side of acos’s cut',
    counterClockwise: 'inherited from acos at 1/z (Kahan 1987): [−1, 0) lower, (0, 1] upper',
  },
  acsc: {
    definition: 'DLMF 4.23.7: acsc z = asin(1/z)',
    annexG:
      'through casin at 1/z (ISO/IEC 9899:2011 G.6): on [−1, 0) and (0, 1] the sign of Im z picks the opposite side of asin’s cut',
    counterClockwise: 'inherited from asin at 1/z (Kahan 1987): [−1, 0) lower, (0, 1] upper',
  },
  acoth: {
    definition: 'DLMF 4.37.9: acoth z = atanh(1/z)',
    annexG:
      'through catanh at 1/z (ISO/IEC 9899:2011 G.6.2.3): on [−1, 0) and (0, 1] the sign of Im z picks the opposite side of atanh’s cut',
    counterClockwise: 'inherited from atanh at 1/z (Kahan 1987): [−1, 0) lower, (0, 1] upper',
  },
  asech: {
    definition: 'DLMF 4.37.8: asech z = acosh(1/z)',
    annexG:
      'through cacosh at 1/z (ISO/IEC 9899:2011 G.6.2.1): on (−∞, 0) and [1, ∞) the sign of Im z picks the opposite side of acosh’s cut',
    counterClockwise: 'inherited from acosh at 1/z (Kahan 1987): both pieces lower',
  },
  acsch: {
    definition: 'DLMF 4.37.7: acsch z = asinh(1/z)',
    annexG:
      'through casinh at 1/z (ISO/IEC 9899:2011 G.6.2.2): on [−i, 0) and (0, i] the sign of Re z picks the side, as for asinh',
    counterClockwise: 'inherited from asinh at 1/z (Kahan 1987): [−i, 0) right, (0, i] left',
  },
};

/** ISO/IEC 9899:2011 7.3.3 (branch cuts): how the two conventions treat cuts in general. */
export const CUT_CONVENTION_RULE = {
  'signed-zero': 'ISO/IEC 9899:2011 7.3.3 and Annex G: the sign of a zero part distinguishes the sides of a cut',
  'counter-clockwise':
    'ISO/IEC 9899:2011 7.3.3 for implementations without signed zeros (Kahan 1987): a cut is continuous with the side reached turning counter-clockwise about its finite end',
} as const;
