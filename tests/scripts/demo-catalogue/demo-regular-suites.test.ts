import { DEMO_REGULAR_SUITES } from '../../../scripts/demo-catalogue/demo-regular-suites';
import { evaluateSubject } from '../../../harness/expressions/evaluate-subject';
import { parseSubject } from '../../../harness/expressions/parse-subject';
import { BigComplex } from '../../../harness/reference/complex/big-complex';
import { answerContinue } from '../../../harness/reference/continuation/answer-continue';
import { validateSuite } from '../../../shared/validate-suite';
import type { WireComplex } from '../../../shared/wire-complex';

/** Points off every demo layout's cuts, in all four quadrants. */
const POINTS: [number, number][] = [
  [0.3, 0.7],
  [-1.7, 0.4],
  [-0.6, -1.3],
  [2.5, -0.2],
  [0.1, 3],
  [-2.2, -2.1],
];

function branchValue(suite: (typeof DEMO_REGULAR_SUITES)[number], p: [number, number]): [number, number] {
  const checked = validateSuite(suite, suite.id);
  if (!checked.ok || checked.suite.branch.kind !== 'regular')
    throw new Error(`${suite.id} is not a valid regular suite`);
  const b = checked.suite.branch;
  const answer = answerContinue({
    g: b.g,
    nu: b.nu,
    z0: b.z0,
    ...(b.f0 ? { f0: b.f0 } : { k: b.k }),
    path: { kind: 'polyline', points: [b.z0, { re: String(p[0]), im: String(p[1]) }] },
    at: ['1'],
    cuts: b.cuts,
  }) as { values?: { f: WireComplex }[]; error?: string };
  if (!answer.values) throw new Error(`${suite.id}: ${answer.error}`);
  const f = answer.values[0]!.f;
  return [Number(f.re), Number(f.im)];
}

function subjectValue(suite: (typeof DEMO_REGULAR_SUITES)[number], p: [number, number]): [number, number] {
  return evaluateSubject(parseSubject(suite.subject), BigComplex.fromDoubles(p[0], p[1]), suite.convention, {
    double: true,
    digits: 0,
  }).double;
}

const distance = (a: [number, number], b: [number, number]) =>
  Math.hypot(a[0] - b[0], a[1] - b[1]) / Math.hypot(b[0], b[1]);

describe('regular-branch demo suites', () => {
  // Each suite claims its subject *is* the branch it specifies; the continuation (an
  // independent computation from g, ν, z0 and the cuts) must agree with the subject on
  // the reference off the cuts. The naive formula is the one meant to disagree.
  const meant = DEMO_REGULAR_SUITES.filter((s) => s.id !== 'sqrt-z2-minus-1-naive-formula');

  it.each(meant.map((s) => [s.id, s] as const))(
    '%s: the subject equals the continued branch off the cuts',
    (_id, suite) => {
      for (const p of POINTS) {
        expect({ p, error: distance(subjectValue(suite, p), branchValue(suite, p)) < 1e-12 }).toEqual({
          p,
          error: true,
        });
      }
    },
  );

  it('finds the naive √(z²−1) on the other sheet in the left half of the upper half-plane', () => {
    const naive = DEMO_REGULAR_SUITES.find((s) => s.id === 'sqrt-z2-minus-1-naive-formula')!;
    const p: [number, number] = [-0.1, 2];
    const subject = subjectValue(naive, p);
    const branch = branchValue(naive, p);
    // principal √(z²−1) at −0.1+2i is about 0.0895 − 2.235i; the branch ≈ z is about −0.0895 + 2.235i.
    expect(distance(subject, [-branch[0], -branch[1]])).toBeLessThan(1e-12);
  });
});
