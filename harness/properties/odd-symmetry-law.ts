import { symmetryLaw } from './symmetry-law';

/**
 * f(−z) = −f(z) for the odd functions (asin, atan, asinh, atanh and their reciprocal
 * cousins, DLMF §4.23(iii) and §4.37(iii), the reflection formulas; the equation numbers
 * 4.23.10–12 and 4.37.10–12 were not checked one by one). Under signed-zero
 * Annex G makes casinh and catanh odd (ISO/IEC 9899:2011 G.6.2.2, G.6.2.3), so
 * sign-exactly. Kahan's counter-clockwise rule keeps them odd on the cuts too — a half turn
 * maps each cut's counter-clockwise side to the other cut's — so only points on a cut whose
 * closed side the catalogue leaves unnamed (the reciprocal functions' cuts through 0, where
 * f(0) = −f(0) cannot hold with one value) are excluded.
 */
export const oddSymmetryLaw = symmetryLaw({
  formula: 'f(-z) = -f(z)',
  source: 'DLMF 4.23(iii), 4.37(iii) reflection formulas; ISO/IEC 9899:2011 G.6.2.2-3 (odd, sign-exact)',
  input: ([re, im]) => [-re, -im],
  value: ([re, im]) => [-re, -im],
  brokenOnCutsByCcw: false,
  needsRealConstants: false,
});
