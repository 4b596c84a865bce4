import { catalogueCuts } from '../cuts/catalogue-cuts';
import type { FingerprintFunction } from './fingerprint-function';

const plain = (op: string): FingerprintFunction => ({ label: op, op, extra: [], cuts: catalogueCuts(op) ?? [] });
const power = (label: string, op: string, extra: [number, number]): FingerprintFunction => ({
  label,
  op,
  extra: [extra],
  cuts: catalogueCuts('pow') ?? [],
});

/**
 * The functions a fingerprint looks at: every catalogue function with a cut (exp has none),
 * and the roots written as powers, because a library that gets √ right may still get
 * pow(z, 1/2) wrong on the same cut. The exponent 1/3 reaches a library as the double nearest it.
 */
export const FINGERPRINT_FUNCTIONS: readonly FingerprintFunction[] = [
  plain('sqrt'),
  power('pow(z, 1/2)', 'pow', [0.5, 0]),
  plain('log'),
  plain('cbrt'),
  power('pow(z, 1/3)', 'pow', [1 / 3, 0]),
  power('nthroot(z, 3)', 'nthroot', [3, 0]),
  ...['asin', 'acos', 'atan', 'asinh', 'acosh', 'atanh', 'acot', 'asec', 'acsc', 'acoth', 'asech', 'acsch'].map(plain),
];
