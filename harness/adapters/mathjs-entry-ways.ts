import { formatDouble } from '../reference/numbers/format-double';
import type { ComplexPair } from './complex-pair';
import { complexString } from './complex-string';

type MathInstance = {
  complex(...a: unknown[]): unknown;
  Complex: new (...a: unknown[]) => unknown;
  evaluate(expr: string, scope?: Record<string, unknown>): unknown;
  add(a: unknown, b: unknown): unknown;
  multiply(a: unknown, b: unknown): unknown;
  i: unknown;
};

/**
 * Every way mathjs takes a complex number: math.complex with two numbers, an object
 * and a string, the Complex class, the expression parser (a literal, complex(...) in
 * an expression, variables from a scope), mixed real/complex arithmetic, and the plain number
 * real-line code passes (a value that is not real cannot be a number, and goes in as
 * math.complex; a suite never sends one through the number entry, shared/target-entry.ts).
 */
export function mathjsEntryWays(math: MathInstance): Record<string, (z: ComplexPair) => unknown> {
  return {
    'math.complex(re, im)': ([re, im]) => math.complex(re, im),
    'new math.Complex(re, im)': ([re, im]) => new math.Complex(re, im),
    'math.complex({ re, im })': ([re, im]) => math.complex({ re, im }),
    'math.complex("re±im i")': (z) => math.complex(complexString(z)),
    'math.evaluate("re±im i")': (z) => math.evaluate(complexString(z)),
    'math.evaluate("complex(re, im)")': ([re, im]) =>
      math.evaluate(`complex(${formatDouble(re)}, ${formatDouble(im)})`),
    'math.evaluate("a + b i", { a: re, b: im })': ([re, im]) => math.evaluate('a + b i', { a: re, b: im }),
    'math.add(re, math.multiply(im, math.i))': ([re, im]) => math.add(re, math.multiply(im, math.i)),
    're as a plain number': ([re, im]) => (im === 0 ? re : math.complex(re, im)),
  };
}
