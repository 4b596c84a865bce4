import { evaluateSubject } from '../../harness/expressions/evaluate-subject';
import { parseSubject } from '../../harness/expressions/parse-subject';
import { BigComplex } from '../../harness/reference/complex/big-complex';
import { formatDouble } from '../../harness/reference/numbers/format-double';
import { askPython, type OraclePoint } from './python-oracle';
import { unhex } from './unhex';
import { sameDouble } from './same-double';

// Subjects against the same formula in Python with cmath (Debian python3, /usr/bin/python3):
// Python's complex arithmetic carries IEEE zero signs through z*z, z - 1 and so on the way a
// library's does, and cmath puts each function on its Annex G branch, so on and beside the cuts
// of the inner functions the two must agree sign-exactly. Python rounds every intermediate step,
// so values are compared to 64 ulps (no point below is near a cancellation).
const SUBJECTS: [string, string][] = [
  ['sqrt(z^2 - 1)', 'sqrt(z*z - 1)'],
  ['log(1 - z) + asin(z)', 'log(1 - z) + asin(z)'],
  ['exp(z) * sqrt(z)', 'exp(z) * sqrt(z)'],
  ['atanh(z) / (z + 2)', 'atanh(z) / (z + 2)'],
  ['acosh(2*z - 1)', 'acosh(2*z - 1)'],
  ['asinh(i*z)', 'asinh(1j*z)'],
];
const POINTS: [number, number][] = [
  [-0.5, 0],
  [-0.5, -0],
  [0.5, 0],
  [0.5, -0],
  [3, 0],
  [3, -0],
  [-3, 0],
  [-3, -0],
  [0, 2],
  [-0, 2],
  [0, -2],
  [-0, -2],
  [0.75, 1.25],
  [-2.5, -0.125],
  [1.5, 1e-9],
  [1.5, -1e-9],
];

describe('subjects against the same formula with Python cmath', () => {
  const cases = SUBJECTS.flatMap(([subject, formula]) => POINTS.map(([x, y]) => ({ subject, formula, x, y })));
  const points: OraclePoint[] = cases.map((c) => ({
    fn: 'formula',
    formula: c.formula,
    z: [formatDouble(c.x), formatDouble(c.y)],
  }));
  const answers = askPython<{ re?: string; im?: string; raises?: string }>('cmath-formula', points);

  it.each(SUBJECTS.map(([subject]) => [subject]))(
    'matches cmath sign-exactly for %s on and beside the cuts',
    (subject) => {
      const expr = parseSubject(subject);
      const failures: string[] = [];
      cases.forEach((c, i) => {
        if (c.subject !== subject) return;
        const answer = answers[i];
        if (!answer?.re || !answer.im)
          return (
            failures.push(`cmath raised ${answer?.raises} at ${formatDouble(c.x)} + ${formatDouble(c.y)}i`) && undefined
          );
        const ours = evaluateSubject(expr, BigComplex.fromDoubles(c.x, c.y), 'signed-zero', {
          double: true,
          digits: 0,
        }).double;
        const theirs = [unhex(answer.re), unhex(answer.im)];
        if (!sameDouble(ours[0], theirs[0] as number, 64) || !sameDouble(ours[1], theirs[1] as number, 64)) {
          failures.push(
            `at ${formatDouble(c.x)} + ${formatDouble(c.y)}i: ours ${ours.map(formatDouble).join(' + ')}i, cmath ${answer.re} + ${answer.im}i`,
          );
        }
      });
      expect(failures).toEqual([]);
    },
  );
});
