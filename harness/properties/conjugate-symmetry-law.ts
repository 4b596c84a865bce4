import { symmetryLaw } from './symmetry-law';

/**
 * f(z̄) = conj f(z). Under signed-zero it holds everywhere and sign-exactly: ISO/IEC 9899:2011
 * G.6 paragraph 3 makes the complex functions conjugate-symmetric, zero signs included (clause
 * quoted from memory). Off the cuts it is the reflection principle for principal branches with
 * real values on the real axis (DLMF §4.2(i), §4.23(ii), §4.37(ii), from memory).
 */
export const conjugateSymmetryLaw = symmetryLaw({
  formula: 'f(conj z) = conj f(z)',
  source: 'ISO/IEC 9899:2011 G.6 para 3 (signed-zero, sign-exact); off the cuts DLMF 4.2(i), 4.23(ii), 4.37(ii)',
  input: ([re, im]) => [re, -im],
  value: ([re, im]) => [re, -im],
  brokenOnCutsByCcw: true,
  needsRealConstants: true,
});
