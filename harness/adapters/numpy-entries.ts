import type { TargetEntry } from '../../shared/target-entry';
import { ENTRY_CARRIES } from './entry-carries';

/**
 * NumPy's entries as harness/adapters/python/numpy_adapter.py builds them and lists them in its
 * `describe` answer (a test holds the two equal): the scalar np.complex128(complex(re, im)), the
 * default; a complex128 array of the batch, over which each function runs once; and the array a
 * NumPy user writes as `re + im * 1j`. NumPy promotes the float64 array to complex128 before the
 * product, so im * 1j is (im·0 − 0, im + 0): the imaginary −0 always becomes +0, a real −0 becomes +0 where
 * im ≥ +0, and an infinite or NaN im makes the real part NaN (probed with NumPy 1.24.2,
 * docs/c-and-numpy-adapters.md).
 */
export const NUMPY_ENTRIES: readonly TargetEntry[] = [
  { name: 'complex128', call: 'np.complex128(complex(re, im))', default: true, carries: ENTRY_CARRIES.everything },
  { name: 'array', call: 'np.array([complex(re, im), …])', default: false, carries: ENTRY_CARRIES.everything },
  {
    name: 'arithmetic',
    call: 'np.array([re, …]) + np.array([im, …]) * 1j',
    default: false,
    carries: { imaginaryPart: true, realZeroSign: false, imaginaryZeroSign: false },
  },
];
