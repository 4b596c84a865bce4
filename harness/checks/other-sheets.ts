import type { ComplexDouble } from './complex-double';
import type { SheetFamily } from './sheet-family';

const mul = (a: ComplexDouble, b: ComplexDouble): ComplexDouble => [
  a[0] * b[0] - a[1] * b[1],
  a[0] * b[1] + a[1] * b[0],
];

/** e^{2πiνk} in doubles (enough for recognising a sheet, not for checking a value). */
export function sheetFactor(nu: readonly [number, number], k: number): ComplexDouble {
  const angle = 2 * Math.PI * nu[0] * k;
  const modulus = Math.exp(-2 * Math.PI * nu[1] * k);
  return [modulus * Math.cos(angle), modulus * Math.sin(angle)];
}

/** The expected value moved to each sheet k of its family (see sheet-family.ts), for diagnosis. */
export function otherSheets(family: SheetFamily, expected: ComplexDouble): { k: number; value: ComplexDouble }[] {
  const s = family.sign;
  const v: ComplexDouble = [s * expected[0], s * expected[1]];
  const back = (w: ComplexDouble): ComplexDouble => [s * w[0], s * w[1]];
  const odd = (k: number) => (k % 2 === 0 ? 1 : -1);
  return family.ks.map((k) => {
    switch (family.kind) {
      case 'power':
        return { k, value: back(mul(v, sheetFactor(family.nu, k))) };
      case 'log':
        return { k, value: back([v[0], v[1] + 2 * Math.PI * k]) };
      case 'asin':
        return { k, value: back([odd(k) * v[0] + k * Math.PI, odd(k) * v[1]]) };
      case 'acos':
        return { k, value: back([v[0] + 2 * k * Math.PI, v[1]]) };
      case 'atan':
        return { k, value: back([v[0] + k * Math.PI, v[1]]) };
      case 'asinh':
        return { k, value: back([odd(k) * v[0], odd(k) * v[1] + k * Math.PI]) };
      case 'acosh':
        return { k, value: back([v[0], v[1] + 2 * k * Math.PI]) };
      case 'atanh':
        return { k, value: back([v[0], v[1] + k * Math.PI]) };
    }
  });
}
