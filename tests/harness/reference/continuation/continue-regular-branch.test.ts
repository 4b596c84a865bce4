import { parseSubject } from '../../../../harness/expressions/parse-subject';
import type { ContinuationRequest } from '../../../../harness/reference/continuation/continuation-request';
import { continueRegularBranch } from '../../../../harness/reference/continuation/continue-regular-branch';
import { parseExact } from '../../../../harness/reference/continuation/parse-exact';
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

  /**
   * √z (k = 0 at z0 = 1) on the plane cut along (−∞, 0], along the unit circle from `start` turns,
   * `turns` turns in the given direction, at its end.
   */
  function atArcEnd(start: Rational, turns: Rational, ccw: boolean) {
    const request: ContinuationRequest = {
      ...sqrtRequest(
        {
          kind: 'circle',
          center: [Rational.ZERO, Rational.ZERO],
          radius: Rational.ONE,
          startAngle: { kind: 'turns', turns: start },
          turns,
          ccw,
        },
        [Rational.ONE],
      ),
      cuts: [
        {
          points: [
            [Rational.ZERO, Rational.ZERO],
            [r(-1n), Rational.ZERO],
          ],
          toInfinity: true,
        },
      ],
    };
    const result = continueRegularBranch(request);
    if (result.kind !== 'continued') throw new Error(result.reason);
    return result.values[0]!;
  }

  // An arc whose exact end is −1, on the cut: the point keeps the value of the side it arrives from.
  // ISO/IEC 9899:2011 G.6.4.2: csqrt(−1 + i0) = +i (the upper side), csqrt(−1 − i0) = −i (the lower).
  // In doubles, 2π·(1/8) + 2π·(3/8) lands past π, which used to count as a crossing just before t = 1.
  it.each([
    ['1/8', '3/8', true, '1'],
    ['1/6', '1/3', true, '1'],
    ['1/4', '1/4', true, '1'],
    ['0', '1/2', true, '1'],
    ['-1/8', '3/8', false, '-1'],
    ['-1/6', '1/3', false, '-1'],
    ['0', '1/2', false, '-1'],
  ])(
    'ends an arc from %s turn over %s turn (counter-clockwise: %s) exactly on the cut at −1, on the side it arrives from (√ = %si)',
    (start, turns, ccw, im) => {
      const { z, f } = atArcEnd(parseExact(start, 'start'), parseExact(turns, 'turns'), ccw);
      expect([z.re.toDecimal(40), z.im.toDecimal(40)]).toEqual(['-1', '0']);
      expect([f.re.toDecimal(40), f.im.toDecimal(40)]).toEqual(['0', im]);
    },
  );

  it('still counts a crossing of the cut that lies strictly inside the arc', () => {
    // From 1/8 turn over 1/2 turn counter-clockwise: through −1 at t = 3/4, ending at e^{5πi/4}, below
    // the cut, where the branch of the cut plane is the principal root e^{−3πi/8} (DLMF 4.2.7, 4.2(iv)).
    const { f } = atArcEnd(r(1n, 8n), r(1n, 2n), true);
    expect(f.re.toDecimal(30)).toBe('0.38268343236508977172845998403'); // mpmath, 60 digits: cos(3π/8)
    expect(f.im.toDecimal(30)).toBe('-0.923879532511286756128183189397'); // mpmath, 60 digits: −sin(3π/8)
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
