import type { CallResult } from '../adapters/call-result';
import type { ComplexPair } from '../adapters/complex-pair';
import type { LawFinding } from './law-finding';

/**
 * The values of a batch of library calls, or, when one of them failed, the finding that the
 * law could not be checked because the library gave no value there (a throw is a finding too:
 * Annex G gives these functions a value everywhere).
 */
export function libraryValues(
  results: readonly CallResult[],
  names: readonly string[],
): { values: ComplexPair[] } | { finding: LawFinding } {
  const values: ComplexPair[] = [];
  for (const [i, r] of results.entries()) {
    if ('error' in r)
      return {
        finding: {
          reason: `the library gave no value for ${names[i] ?? 'a call'}: ${r.error}`,
          values: values.map((value, k) => ({ name: names[k] ?? 'value', value })),
        },
      };
    values.push(r.value);
  }
  return { values };
}
