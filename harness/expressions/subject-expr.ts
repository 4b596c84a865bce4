import type { Rational } from '../reference/numbers/rational';

/**
 * A validated subject: a formula over z built only from the whitelist (numbers, z, i,
 * + − × ÷, integer and rational powers, catalogue functions). Constants are exact
 * rationals (real and imaginary part); `pow` carries its exponent as an exact rational
 * when it is one, else as a sub-expression.
 */
export type SubjectExpr =
  | { kind: 'z' }
  | { kind: 'const'; re: Rational; im: Rational }
  | { kind: 'add' | 'sub' | 'mul' | 'div'; a: SubjectExpr; b: SubjectExpr }
  | { kind: 'neg'; a: SubjectExpr }
  | { kind: 'power'; base: SubjectExpr; exponent: Rational }
  | { kind: 'complexPower'; base: SubjectExpr; exponent: SubjectExpr }
  | { kind: 'call'; fn: string; arg: SubjectExpr }
  | { kind: 'nthroot'; arg: SubjectExpr; n: number };
