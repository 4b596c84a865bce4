import { symmetryLaw } from './symmetry-law';

/**
 * f(−z) = f(z), for even subjects such as sqrt(z^2 − 1) or cos-like compositions (a definition, no clause to cite). Under
 * counter-clockwise, points with a zero part are excluded: the rule closes each cut from one
 * side, and a half turn can carry it to a cut closed from the other.
 */
export const evenSymmetryLaw = symmetryLaw({
  formula: 'f(-z) = f(z)',
  source: 'definition of an even function; sign-exact under signed-zero',
  input: ([re, im]) => [-re, -im],
  value: (f) => f,
  brokenOnCutsByCcw: true,
  needsRealConstants: false,
});
