import { symmetryLaw } from './symmetry-law';

/**
 * f(z̄) = conj f(z). Under signed-zero it holds everywhere and sign-exactly: each function's
 * subclause of ISO/IEC 9899:2011 G.6 states f(conj(z)) = conj(f(z)) (G.6.2.2 casinh, G.6.3.2
 * clog, ...), and G.6 paragraph 3 makes the functions continuous onto both sides of their cuts
 * by the sign of zero. Off the cuts it is the reflection principle for principal branches with
 * real values on the real axis (DLMF §4.2(i), §4.23(ii), §4.37(ii)).
 */
export const conjugateSymmetryLaw = symmetryLaw({
  formula: 'f(conj z) = conj f(z)',
  source:
    "ISO/IEC 9899:2011 G.6, each function's subclause (signed-zero, sign-exact); off the cuts DLMF 4.2(i), 4.23(ii), 4.37(ii)",
  input: ([re, im]) => [re, -im],
  value: ([re, im]) => [re, -im],
  brokenOnCutsByCcw: true,
  needsRealConstants: true,
});
