import { formatDouble } from '../../harness/reference/numbers/format-double';
import { parseDouble } from '../../harness/reference/numbers/parse-double';
import type { CmathAnswer } from './cmath-answer';
import { CMATH_CASES } from './cmath-cases';
import { compareWithCmath } from './cmath-compare';
import { cutPointsOf } from './cut-points-of';
import { askPython, type OraclePoint } from './python-oracle';
import { unhex } from './unhex';
import { referenceDouble } from './reference-double';
import { sameDouble } from './same-double';

// Mutation check: deliberately wrong variants of the reference must be caught by the same
// comparisons the outside-source tests make (Python cmath on every cut with ±0, mpmath at 60
// digits off the cuts). A comparison that let a mutant through could not fail, and would be a defect.

type Evaluate = (fn: string, x: number, y: number) => [number, number];

const MUTANTS: Record<string, Evaluate> = {
  'flipped zero sign of the input': (fn, x, y) => referenceDouble(fn, x === 0 ? -x : x, y === 0 ? -y : y),
  'conjugated value': (fn, x, y) => {
    const [re, im] = referenceDouble(fn, x, y);
    return [re, -im];
  },
  'counter-clockwise taken for signed-zero': (fn, x, y) => referenceDouble(fn, x, y, 'counter-clockwise'),
};

/** The value on another sheet: for √ the other root, for log + 2πi, for inverse trig the next branch. */
const OTHER_SHEET: Record<string, (v: [number, number]) => [number, number]> = {
  sqrt: ([re, im]) => [-re, -im],
  log: ([re, im]) => [re, im + 2 * Math.PI],
  asin: ([re, im]) => [Math.PI - re, -im],
  acos: ([re, im]) => [-re, -im],
  atan: ([re, im]) => [re + Math.PI, im],
  asinh: ([re, im]) => [-re, Math.PI - im],
  acosh: ([re, im]) => [-re, -im],
  atanh: ([re, im]) => [re, im + Math.PI],
};

describe('mutation check of the outside-source comparisons', () => {
  const points = cutPointsOf(CMATH_CASES.cuts);
  const cmath = askPython<CmathAnswer>('cmath', points);
  const offCut: OraclePoint[] = Object.keys(OTHER_SHEET).flatMap((fn) => [
    { fn, z: ['0.75', '0.5'] as [string, string] },
    { fn, z: ['-2.5', '-1.25'] as [string, string] },
  ]);
  const mp = askPython<{ re_double: string; im_double: string }>('mpmath', offCut, 60);

  it('passes the reference itself, so the mutants below fail for their mutation alone', () => {
    const failures = points
      .map((p, i) =>
        compareWithCmath(p.fn, parseDouble(p.z[0]), parseDouble(p.z[1]), cmath[i] as CmathAnswer, CMATH_CASES.ulps),
      )
      .filter(Boolean);
    expect(failures).toEqual([]);
  });

  it.each(Object.entries(MUTANTS).map(([name, f]) => [name, f]))(
    'catches a variant with a %s on the cuts of every function',
    (_, mutant) => {
      for (const fn of Object.keys(CMATH_CASES.cuts)) {
        const caught = points.some(
          (p, i) =>
            p.fn === fn &&
            compareWithCmath(
              fn,
              parseDouble(p.z[0]),
              parseDouble(p.z[1]),
              cmath[i] as CmathAnswer,
              CMATH_CASES.ulps,
              mutant,
            ) !== null,
        );
        expect({ fn, caught }).toEqual({ fn, caught: true });
      }
    },
  );

  it.each(Object.keys(OTHER_SHEET).map((fn) => [fn]))(
    'catches %s returning a value on another sheet, against mpmath',
    (fn) => {
      offCut.forEach((p, i) => {
        if (p.fn !== fn) return;
        const answer = mp[i] as { re_double: string; im_double: string };
        const wrong = (OTHER_SHEET[fn] as (v: [number, number]) => [number, number])(
          referenceDouble(fn, parseDouble(p.z[0]), parseDouble(p.z[1])),
        );
        const right = referenceDouble(fn, parseDouble(p.z[0]), parseDouble(p.z[1]));
        const matches = (v: [number, number]) =>
          sameDouble(v[0], unhex(answer.re_double)) && sameDouble(v[1], unhex(answer.im_double));
        expect({
          at: p.z.map((s) => formatDouble(parseDouble(s))),
          right: matches(right),
          wrong: matches(wrong),
        }).toEqual({
          at: p.z.map((s) => formatDouble(parseDouble(s))),
          right: true,
          wrong: false,
        });
      });
    },
  );
});
