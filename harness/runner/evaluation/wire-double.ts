import type { WireComplex } from '../../../shared/wire-complex';
import type { ComplexDouble } from '../../checks/complex-double';
import { formatDouble } from '../../reference/numbers/format-double';

/** A double pair as the results write it. */
export function wireDouble(v: ComplexDouble): WireComplex {
  return { re: formatDouble(v[0]), im: formatDouble(v[1]) };
}
