import fc from 'fast-check';
import { BigComplex } from '../../../../harness/reference/complex/big-complex';
import { fastPrincipal } from '../../../../harness/reference/fast/fast-principal';
import { principalValue } from '../../../../harness/reference/principal-value';
import { benchReferencePoints } from '../../../../scripts/bench-reference-points';

// The double-double tier may decline, but when it answers it must give the same correctly rounded
// double as the bigint engine (whose values are checked against mpmath and cmath in tests/external).
const FUNCTIONS = ['sqrt', 'exp', 'log', 'asin', 'acos', 'atan', 'asinh', 'acosh', 'atanh'];
const SEED = 31337;

function slow(fn: string, x: number, y: number): [number, number] {
  return principalValue({ fn, z: BigComplex.fromDoubles(x, y), convention: 'signed-zero' }, { double: true, digits: 0 })
    .double;
}

const box = fc.tuple(fc.double({ min: -8, max: 8, noNaN: true }), fc.double({ min: -8, max: 8, noNaN: true }));
const wide = fc.tuple(
  fc.double({ min: -1e120, max: 1e120, noNaN: true, noDefaultInfinity: true }),
  fc.double({ min: -1e120, max: 1e120, noNaN: true, noDefaultInfinity: true }),
);
const nearUnitCircle = fc
  .tuple(fc.double({ min: 0, max: 2 * Math.PI, noNaN: true }), fc.integer({ min: -60, max: 60 }))
  .map(([a, k]) => {
    const r = 1 + k * 2 ** -52;
    return [r * Math.cos(a), r * Math.sin(a)] as [number, number];
  });
const nearAxes = fc
  .tuple(fc.double({ min: -8, max: 8, noNaN: true }), fc.integer({ min: 20, max: 300 }), fc.boolean())
  .map(([v, k, flip]) => {
    const tiny = 10 ** -k;
    return (flip ? [tiny, v] : [v, tiny]) as [number, number];
  });

describe('the double-double tier', () => {
  it.each(FUNCTIONS.map((fn) => [fn]))(
    'returns the bigint engine’s correctly rounded double for %s whenever it answers',
    (fn) => {
      fc.assert(
        fc.property(fc.oneof(box, wide, nearUnitCircle, nearAxes), ([x, y]) => {
          const fast = fastPrincipal(fn, x, y);
          if (fast === null) return true;
          const ref = slow(fn, x, y);
          return Object.is(fast[0], ref[0]) && Object.is(fast[1], ref[1]);
        }),
        { seed: SEED, numRuns: 400 },
      );
    },
  );

  it('answers every one of the bench’s 10,000 seeded points (seed 12345) bit for bit as the bigint engine does', () => {
    // The points npm run bench:reference times: a speed-up of this tier may change how fast it
    // answers them, never an answer (the bigint engine is checked against mpmath in tests/external).
    const points = benchReferencePoints(10_000, 12345);
    const differ: string[] = [];
    let declined = 0;
    for (const { fn, x, y } of points) {
      const fast = fastPrincipal(fn, x, y);
      if (fast === null) {
        declined++;
        continue;
      }
      const ref = slow(fn, x, y);
      if (!Object.is(fast[0], ref[0]) || !Object.is(fast[1], ref[1]))
        differ.push(`${fn}(${x} + ${y}i): fast ${fast.join(', ')}, bigint ${ref.join(', ')}`);
    }
    expect(differ).toEqual([]);
    // So the bench measures this tier: it declined none of these points when this test was written.
    expect(declined).toBeLessThanOrEqual(10);
  });

  it('declines inputs with a zero, infinite or NaN part, leaving signed zeros and Annex G to the bigint engine', () => {
    for (const [x, y] of [
      [0, 1],
      [-0, 1],
      [1, -0],
      [Infinity, 1],
      [1, NaN],
    ] as [number, number][]) {
      expect(fastPrincipal('sqrt', x, y)).toBeNull();
    }
  });

  it('answers most points of a box, so the bench measures this tier and not the fallback', () => {
    let answered = 0;
    for (let i = 0; i < 200; i++) {
      const x = Math.cos(i) * 3;
      const y = Math.sin(i * 1.7) * 3 + 0.01;
      if (fastPrincipal(FUNCTIONS[i % FUNCTIONS.length] as string, x, y)) answered++;
    }
    expect(answered).toBeGreaterThan(190);
  });
});
