import { formatComplexText } from '../../../shared/format-complex-text';
import type { ComplexDouble } from '../../checks/complex-double';
import { wireDouble } from '../evaluation/wire-double';

/** A point in messages, rule texts and reproducer headers, sign-exact with ASCII signs ("-1 - 0i", not "-1 + -0i"): the CSV and JUnit outputs carry them. */
export function pointText(p: ComplexDouble): string {
  return formatComplexText(wireDouble(p), { ascii: true });
}
