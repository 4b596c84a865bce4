import type { ComplexPair } from './complex-pair';

/**
 * Reads what a JavaScript library returned as [re, im]: a number is real with a +0
 * imaginary part (a real type carries no imaginary sign); an object with numeric
 * `re` and `im` (complex.js, mathjs Complex) gives its parts as they are.
 */
export function libraryValuePair(value: unknown): ComplexPair {
  if (typeof value === 'number') return [value, 0];
  if (typeof value === 'object' && value !== null) {
    const { re, im } = value as { re?: unknown; im?: unknown };
    if (typeof re === 'number' && typeof im === 'number') return [re, im];
  }
  throw new TypeError(`result is not a number or complex: ${String(value)}`);
}
