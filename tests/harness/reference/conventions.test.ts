import fc from 'fast-check';
import { close } from './close';
import { referenceValue } from './reference-value';

// The two conventions for values on a cut, checked as laws rather than against our tables:
// - signed-zero (ISO/IEC 9899:2011 G.6, IEC 60559): f(x ± 0i) is the limit of f from the side the
//   zero's sign names, so it equals f at a point 1e−300 to that side (to 30 digits);
// - counter-clockwise (Kahan 1987, "Branch cuts for complex elementary functions"): with zero signs
//   ignored, the value on a cut is the limit reached turning counter-clockwise about the cut's
//   finite end b, i.e. f at b + (z − b)·e^{−iε}, the point just clockwise of z.
// The cuts (finite end, direction) are those of DLMF 4.2.2, 4.23.1–3 and 4.37.1–3.
const SEED = 7070;
const RUNS = 40;

interface Ray {
  fn: string;
  end: [number, number];
  direction: [number, number];
}

const RAYS: Ray[] = [
  { fn: 'sqrt', end: [0, 0], direction: [-1, 0] },
  { fn: 'log', end: [0, 0], direction: [-1, 0] },
  { fn: 'cbrt', end: [0, 0], direction: [-1, 0] },
  { fn: 'asin', end: [1, 0], direction: [1, 0] },
  { fn: 'asin', end: [-1, 0], direction: [-1, 0] },
  { fn: 'acos', end: [1, 0], direction: [1, 0] },
  { fn: 'acos', end: [-1, 0], direction: [-1, 0] },
  { fn: 'atanh', end: [1, 0], direction: [1, 0] },
  { fn: 'atanh', end: [-1, 0], direction: [-1, 0] },
  { fn: 'acosh', end: [1, 0], direction: [-1, 0] },
  { fn: 'asinh', end: [0, 1], direction: [0, 1] },
  { fn: 'asinh', end: [0, -1], direction: [0, -1] },
  { fn: 'atan', end: [0, 1], direction: [0, 1] },
  { fn: 'atan', end: [0, -1], direction: [0, -1] },
];

const distance = fc.double({ min: 1e-6, max: 1e6, noNaN: true });
const EPS = 1e-300;

/** The point at distance d along the ray, with its zero part signed, and f there under a convention. */
function onCut(ray: Ray, d: number, negative: boolean, convention: 'signed-zero' | 'counter-clockwise') {
  const zero = negative ? -0 : 0;
  const x = ray.end[0] + d * ray.direction[0];
  const y = ray.end[1] + d * ray.direction[1];
  return ray.direction[1] === 0
    ? referenceValue(ray.fn, x, zero, convention)
    : referenceValue(ray.fn, zero, y, convention);
}

describe('values on branch cuts', () => {
  it.each(RAYS.map((r) => [`${r.fn} from (${r.end.join(', ')})`, r]))(
    'takes on the %s cut, with the zero signed, the limit from the side that sign names (Annex G)',
    (_, ray) => {
      fc.assert(
        fc.property(distance, fc.boolean(), (d, negative) => {
          const side = negative ? -EPS : EPS;
          const on = onCut(ray, d, negative, 'signed-zero');
          const x = ray.end[0] + d * ray.direction[0];
          const y = ray.end[1] + d * ray.direction[1];
          const off = ray.direction[1] === 0 ? referenceValue(ray.fn, x, side) : referenceValue(ray.fn, side, y);
          return close(on.re, off.re, 30) && close(on.im, off.im, 30);
        }),
        { seed: SEED, numRuns: RUNS },
      );
    },
  );

  it.each(RAYS.map((r) => [`${r.fn} from (${r.end.join(', ')})`, r]))(
    'takes on the %s cut, ignoring zero signs, the limit met turning counter-clockwise about its end (Kahan)',
    (_, ray) => {
      fc.assert(
        fc.property(distance, fc.boolean(), (d, negative) => {
          // (z − b)·e^{−iε} with z − b = d·direction: the point just clockwise of z about b.
          const rx = ray.end[0] + d * (ray.direction[0] + ray.direction[1] * 1e-20);
          const ry = ray.end[1] + d * (ray.direction[1] - ray.direction[0] * 1e-20);
          const on = onCut(ray, d, negative, 'counter-clockwise');
          const rotated = referenceValue(ray.fn, rx, ry);
          return close(on.re, rotated.re, 12) && close(on.im, rotated.im, 12);
        }),
        { seed: SEED, numRuns: RUNS },
      );
    },
  );

  // Reciprocal functions have segment cuts, where Kahan's rule (about a single finite end) does not
  // apply; they inherit the rule of g at 1/z. These rows are the sides their files document.
  it.each([
    ['acot', 0, 0.5, 'left'],
    ['acot', 0, -0.5, 'right'],
    ['acsc', 0.5, 0, 'upper'],
    ['acsc', -0.5, 0, 'lower'],
    ['asec', 0.5, 0, 'upper'],
    ['acoth', -0.5, 0, 'lower'],
    ['asech', 2, 0, 'lower'],
    ['asech', -2, 0, 'lower'],
    ['acsch', 0, 0.5, 'left'],
    ['acsch', 0, -0.5, 'right'],
  ] as const)(
    'takes %s at %d + %di under counter-clockwise from the %s side, as its file documents',
    (fn, x, y, side) => {
      const on = referenceValue(fn, x, y, 'counter-clockwise');
      const step = { upper: [0, EPS], lower: [0, -EPS], left: [-EPS, 0], right: [EPS, 0] }[side];
      const near = referenceValue(fn, x + (step[0] as number), y + (step[1] as number));
      expect(close(on.re, near.re, 30) && close(on.im, near.im, 30)).toBe(true);
    },
  );

  it('returns −2i for sqrt(−4 − 0i) under signed-zero and 2i under counter-clockwise', () => {
    expect(referenceValue('sqrt', -4, -0).double).toEqual([0, -2]);
    expect(referenceValue('sqrt', -4, -0, 'counter-clockwise').double).toEqual([0, 2]);
  });

  it('returns π/2 + 1.3170i for asin(2 + 0i) under signed-zero and π/2 − 1.3170i under counter-clockwise', () => {
    // ISO/IEC 9899:2011 G.6 (casin z = −i casinh(iz)) and Kahan's rule (the cut [1, ∞) joins quadrant IV);
    // 1.3169578969248168 is ln(2 + √3) = acosh 2 (DLMF 4.37.19) rounded to binary64.
    expect(referenceValue('asin', 2, 0).double).toEqual([Math.PI / 2, 1.3169578969248168]);
    expect(referenceValue('asin', 2, 0, 'counter-clockwise').double).toEqual([Math.PI / 2, -1.3169578969248168]);
  });
});
