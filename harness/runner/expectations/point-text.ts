import { formatComplexText } from '../../../shared/format-complex-text';
import { formatDouble } from '../../reference/numbers/format-double';

/** A point in messages and rule texts, sign-exact with ASCII signs ("-1 - 0i", not "-1 + -0i"): the CSV and JUnit outputs carry them. */
export function pointText([re, im]: readonly [number, number]): string {
  return formatComplexText({ re: formatDouble(re), im: formatDouble(im) }, { ascii: true });
}
