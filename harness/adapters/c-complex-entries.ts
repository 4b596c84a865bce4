import type { TargetEntry } from '../../shared/target-entry';
import { ENTRY_CARRIES } from './entry-carries';

/**
 * The C library's entries as harness/adapters/c/complex_adapter.c builds them and lists them in its
 * `describe` answer (a test holds the two equal): CMPLX(re, im), the default, which carries every
 * sign, and the everyday `re + im * I`. GCC has no imaginary type, so `im * I` is computed as
 * (im·0, im·1): a −0 real part becomes +0 where im is +0 or positive (−0 + +0 = +0), and an
 * infinite or NaN im makes the real part NaN (∞·0). Probed with GCC 12.2 (docs/c-and-numpy-adapters.md).
 */
export const C_COMPLEX_ENTRIES: readonly TargetEntry[] = [
  { name: 'cmplx', call: 'CMPLX(re, im)', default: true, carries: ENTRY_CARRIES.everything },
  {
    name: 'arithmetic',
    call: 're + im * I',
    default: false,
    carries: { imaginaryPart: true, realZeroSign: false, imaginaryZeroSign: true },
  },
];
