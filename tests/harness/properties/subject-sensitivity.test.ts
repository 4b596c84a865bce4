import type { SubjectExpr } from '../../../harness/expressions/subject-expr';
import { Rational } from '../../../harness/reference/numbers/rational';
import { subjectSensitivity } from '../../../harness/properties/subject-sensitivity';

// Built by hand: the subject parser's first call costs about 2 s (it loads mathjs).
const Z: SubjectExpr = { kind: 'z' };
const call = (fn: string): SubjectExpr => ({ kind: 'call', fn, arg: Z });

describe('subjectSensitivity', () => {
  // DLMF 4.24.1: |z·asin′(z)| = |z|/|1 − z²|^½, which tends to 1 as |z| grows; in doubles both |z| and |1 − z²| overflow.
  it('is a number, not NaN, for asin where |z| overflows a double', () => {
    const s = subjectSensitivity(call('asin'), [1.7e308, 1.7e308], [0.78, 709.7]);
    expect(Number.isNaN(s)).toBe(false);
  });

  it('is infinite at a branch point, where the law then leaves the value to the sign rule', () => {
    expect(subjectSensitivity(call('acos'), [-1, 0], [Math.PI, 0])).toBe(Infinity);
  });

  it('is |w|·|f| for a power of z and 0 for a composed subject', () => {
    expect(subjectSensitivity({ kind: 'power', base: Z, exponent: new Rational(1n, 3n) }, [8, 0], [2, 0])).toBeCloseTo(
      2 / 3,
      15,
    );
    expect(
      subjectSensitivity(
        {
          kind: 'call',
          fn: 'sqrt',
          arg: {
            kind: 'sub',
            a: { kind: 'power', base: Z, exponent: new Rational(2n) },
            b: { kind: 'const', re: Rational.ONE, im: Rational.ZERO },
          },
        },
        [2, 1],
        [1, 1],
      ),
    ).toBe(0);
  });
});
