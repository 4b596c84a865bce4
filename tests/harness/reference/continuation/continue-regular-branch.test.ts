import { parseSubject } from '../../../../harness/expressions/parse-subject';
import type { ContinuationRequest } from '../../../../harness/reference/continuation/continuation-request';
import { continueRegularBranch } from '../../../../harness/reference/continuation/continue-regular-branch';
import type { ExactAngle } from '../../../../harness/reference/continuation/exact-angle';
import { FactoredFunction } from '../../../../harness/reference/continuation/factored-function';
import { Rational } from '../../../../harness/reference/numbers/rational';

const r = (n: bigint, d = 1n) => new Rational(n, d);

/** √z with k = 0 at z0 = 1, no cuts, along `path` at `at`. */
const sqrtRequest = (path: ContinuationRequest['path'], at: Rational[]): ContinuationRequest => ({
  g: FactoredFunction.fromSubject(parseSubject('z')),
  nu: { re: r(1n, 2n), im: Rational.ZERO },
  z0: [Rational.ONE, Rational.ZERO],
  start: { kind: 'sheet', k: 0 },
  path,
  at,
  cuts: null,
});

/** √z at the start of the unit circle that begins at `startAngle`. */
function atCircleStart(startAngle: ExactAngle) {
  const request = sqrtRequest(
    {
      kind: 'circle',
      center: [Rational.ZERO, Rational.ZERO],
      radius: Rational.ONE,
      startAngle,
      turns: Rational.ONE,
      ccw: true,
    },
    [Rational.ZERO],
  );
  const result = continueRegularBranch(request);
  if (result.kind !== 'continued') throw new Error(result.reason);
  return result.values[0]!;
}

describe('continueRegularBranch (the typed continuation API)', () => {
  it('puts a circle starting at exactly 1/4 turn through exactly i, where √z has equal parts to 40 digits', () => {
    const { z, f } = atCircleStart({ kind: 'turns', turns: r(1n, 4n) });
    expect(z.re.isZero()).toBe(true);
    expect(z.im.toDecimal(40)).toBe('1');
    expect(f.re.toDecimal(40)).toBe(f.im.toDecimal(40));
    expect(f.re.toDecimal(40)).toBe('0.7071067811865475244008443621048490392848');
  });

  it('misses i by 6.1e-17 when the same start angle comes as π/2 rounded to a double in radians', () => {
    // What the old in-process JSON call sent: String(0.25 * 2 * Math.PI), i.e. the double nearest π/2.
    const { z, f } = atCircleStart({ kind: 'radians', radians: Rational.fromDouble(Math.PI / 2) });
    expect(z.re.toDouble()).toBeCloseTo(6.123233995736766e-17, 30);
    expect(f.re.toDecimal(40)).not.toBe(f.im.toDecimal(40));
  });

  /** The segment from 1 to `to` on the real axis. */
  const alongReal = (to: bigint): ContinuationRequest['path'] => ({
    kind: 'polyline',
    points: [
      [Rational.ONE, Rational.ZERO],
      [r(to), Rational.ZERO],
    ],
  });

  it('refuses a t outside [0, 1], naming it, instead of throwing', () => {
    const result = continueRegularBranch(sqrtRequest(alongReal(2n), [Rational.ZERO, r(3n, 2n)]));
    expect(result).toEqual({ kind: 'refused', reason: 'at.1 must lie in [0, 1]' });
  });

  it('refuses a path through a zero of g with the place, as a typed refusal', () => {
    const result = continueRegularBranch(sqrtRequest(alongReal(-1n), [Rational.ONE]));
    expect(result.kind).toBe('refused');
    expect(result.kind === 'refused' && result.reason).toMatch(/passes through a zero of g .* at \(0, 0\)/);
  });
});
