import type { MonodromyCheck } from '../../../shared/run-result';
import type { Tolerance } from '../../../shared/schemas/tolerance-schema';
import { checkValue } from '../../checks/check-value';
import type { ComplexDouble } from '../../checks/complex-double';
import { libraryMonodromy } from '../../checks/library-monodromy';
import { relativeError } from '../../checks/relative-error';
import { wireDouble } from './wire-double';

/** The monodromy factor read from a library's values along a closed path, against the branch's. */
export function monodromyCheck(
  t: number[],
  values: ComplexDouble[],
  errors: Map<number, string>,
  mono: { factor: ComplexDouble; nu: [number, number] },
  tolerance: Tolerance,
): MonodromyCheck {
  const lib = libraryMonodromy(
    t,
    values.map((v, i) => (errors.has(i) ? null : v)),
    mono.nu,
  );
  if ('note' in lib)
    return { expected: wireDouble(mono.factor), library: null, relativeError: null, pass: false, note: lib.note };
  const err = relativeError(lib.factor, mono.factor);
  const pass = checkValue(lib.factor, mono.factor, tolerance, false).pass;
  return { expected: wireDouble(mono.factor), library: wireDouble(lib.factor), relativeError: err, pass };
}
