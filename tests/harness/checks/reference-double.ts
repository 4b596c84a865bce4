import { answerReference } from '../../../harness/reference/answer-reference';
import type { ComplexDouble } from '../../../harness/checks/complex-double';
import type { WireComplex } from '../../../shared/wire-complex';

const wire = (x: number) =>
  Object.is(x, -0) ? '-0' : Number.isNaN(x) ? 'nan' : x === Infinity ? 'inf' : x === -Infinity ? '-inf' : String(x);
const back = (s: string) =>
  s === '-0' ? -0 : s === 'nan' ? NaN : s === 'inf' ? Infinity : s === '-inf' ? -Infinity : Number(s);

/** The reference engine's correctly rounded principal value, for building check inputs in tests. */
export function referenceDouble(
  fn: string,
  z: ComplexDouble,
  convention: 'signed-zero' | 'counter-clockwise' = 'signed-zero',
): ComplexDouble {
  const answer = answerReference({ fn, z: { re: wire(z[0]), im: wire(z[1]) }, convention }) as {
    double?: WireComplex;
    error?: string;
  };
  if (!answer.double) throw new Error(`reference ${fn}: ${answer.error}`);
  return [back(answer.double.re), back(answer.double.im)];
}
