import fc from 'fast-check';
import { turnCosSin } from '../../../harness/paths/turn-cos-sin';

describe('turnCosSin', () => {
  it('returns exactly 0 and ±1 at every quarter turn, including negative and multi-turn angles', () => {
    const quarters: [number, [number, number]][] = [
      [0, [1, 0]],
      [0.25, [0, 1]],
      [0.5, [-1, 0]],
      [0.75, [0, -1]],
      [1, [1, 0]],
      [-0.25, [0, -1]],
      [-0.5, [-1, 0]],
      [2.25, [0, 1]],
      [-3.75, [0, 1]],
    ];
    for (const [u, expected] of quarters) expect(turnCosSin(u)).toEqual(expected);
  });

  it('returns √½ for both parts at an eighth of a turn', () => {
    expect(turnCosSin(0.125)).toEqual([Math.SQRT1_2, Math.SQRT1_2]);
    expect(turnCosSin(0.375)).toEqual([-Math.SQRT1_2, Math.SQRT1_2]);
  });

  it('returns +0, never −0, for a zero part', () => {
    for (const u of [0.25, 0.5, 0.75, -0.25, -0]) {
      const [c, s] = turnCosSin(u);
      for (const x of [c, s]) if (x === 0) expect(Object.is(x, -0)).toBe(false);
    }
  });

  it('agrees with Math.cos and Math.sin of 2πu within 4e-16 for |u| ≤ 4 (seed 7101)', () => {
    fc.assert(
      fc.property(fc.double({ min: -4, max: 4, noNaN: true }), (u) => {
        const [c, s] = turnCosSin(u);
        const a = 2 * Math.PI * u;
        // Math.cos(a) itself carries the rounding of 2π·u (up to 4·2^-53·|a| ≈ 2.8e-15 at |u| = 4).
        const slack = 4e-16 + 4 * Number.EPSILON * Math.abs(a);
        return Math.abs(c - Math.cos(a)) <= slack && Math.abs(s - Math.sin(a)) <= slack;
      }),
      { seed: 7101, numRuns: 2000 },
    );
  });

  it('keeps cos² + sin² within 4 ulps of 1 (seed 7102)', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), (u) => {
        const [c, s] = turnCosSin(u);
        return Math.abs(c * c + s * s - 1) <= 4 * Number.EPSILON;
      }),
      { seed: 7102, numRuns: 2000 },
    );
  });

  it('refuses a non-finite angle', () => {
    expect(() => turnCosSin(Infinity)).toThrow(RangeError);
  });
});
