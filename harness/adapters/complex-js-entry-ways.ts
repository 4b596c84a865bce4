import type { ComplexPair } from './complex-pair';
import { complexString } from './complex-string';

type Value = { re: number; im: number; add(...a: unknown[]): Value; mul(...a: unknown[]): Value };
type ComplexJs = { new (...a: unknown[]): Value; (...a: unknown[]): Value; I: Value };

/**
 * Every way complex.js takes a number (its README: two numbers, an object {re, im},
 * an array, a string), plus the two ways people write re + im·i with its methods.
 */
export function complexJsEntryWays(Complex: ComplexJs): Record<string, (z: ComplexPair) => unknown> {
  return {
    'new Complex(re, im)': ([re, im]) => new Complex(re, im),
    'Complex(re, im) without new': ([re, im]) => Complex(re, im),
    'new Complex({ re, im })': ([re, im]) => new Complex({ re, im }),
    'new Complex([re, im])': ([re, im]) => new Complex([re, im]),
    'new Complex("re±im i")': (z) => new Complex(complexString(z)),
    'Complex.I.mul(im).add(re)': ([re, im]) => Complex.I.mul(im).add(re),
    'new Complex(re).add(new Complex(0, im))': ([re, im]) => new Complex(re).add(new Complex(0, im)),
  };
}
