import { buildPath } from '../../../../harness/paths/build-path';
import { ReferenceCache } from '../../../../harness/runner/reference-cache/reference-cache';
import { regularExpectation } from '../../../../harness/runner/expectations/regular-expectation';
import { toPathSpec } from '../../../../harness/runner/evaluation/to-path-spec';
import type { SuitePathInput } from '../../../../shared/schemas/suite-path-schema';
import { makeSuite } from '../support/make-suite';
import { sqrtBranch } from '../support/sqrt-branch';

/** √z as the branch of z^(1/2) with k = 0 at z0 = 1, cut along (−∞, 0], on a circle of radius 2 starting at `start_angle`. */
function sqrtOnCircle(start_angle: string) {
  const path: SuitePathInput = {
    kind: 'circle',
    name: 'radius 2',
    center: { re: '0', im: '0' },
    radius: '2',
    start_angle,
    samples: 33,
  };
  const suite = makeSuite({
    subject: 'sqrt(z)',
    branch: sqrtBranch,
    paths: [path],
  });
  const built = suite.paths[0]!;
  const points = buildPath(toPathSpec(built));
  const expectation = regularExpectation(suite, new ReferenceCache(null), `test-${start_angle}`);
  return { column: expectation.expected(built, points), monodromy: expectation.monodromy(built), points };
}

describe('regularExpectation', () => {
  // Before the typed API, "pi/2" reached the engine as String(0.25 * 2 * Math.PI) radians; the
  // suite written with those radians still takes that path, so the two must agree bit for bit.
  const exact = sqrtOnCircle('pi/2');
  const rounded = sqrtOnCircle('1.5707963267948966');

  it('gives a circle starting at pi/2 the same expected bits as one starting at π/2 rounded to radians', () => {
    expect(exact.points.map((p) => [p.z.re, p.z.im])).toEqual(rounded.points.map((p) => [p.z.re, p.z.im]));
    expect(Array.from(exact.column.re)).toEqual(Array.from(rounded.column.re));
    expect(Array.from(exact.column.im)).toEqual(Array.from(rounded.column.im));
    expect(exact.column.skipped.size).toBe(0);
    expect(exact.monodromy).toEqual(rounded.monodromy);
  });

  it('expects √(2i) = 1 + i at the first point and −1 as the monodromy once around 0', () => {
    expect([exact.column.re[0], exact.column.im[0]]).toEqual([1, 1]);
    expect(exact.monodromy).toEqual({ factor: [-1, 0], nu: [0.5, 0] });
  });

  it('turns from the upper to the lower half-plane once, where the circle crosses the cut', () => {
    const { im } = exact.column;
    const down = exact.points.map((_, i) => i).filter((i) => i > 0 && im[i - 1]! > 0 && im[i]! < 0);
    expect(down.length).toBe(1);
    expect(exact.points[down[0]!]!.z.re).toBeLessThan(0);
  });
});
