import fc from 'fast-check';
import { segmentPath } from '../../../harness/paths/segment-path';

import { zeroText as sign } from './zero-text';

describe('segmentPath', () => {
  it('returns both ends exactly, zero signs included', () => {
    const points = segmentPath({ kind: 'segment', from: { re: '-0', im: 3 }, to: { re: 5, im: '-0' }, samples: 3 });
    expect(sign(points[0]?.z.re as number)).toBe('-0');
    expect(points[0]?.z.im).toBe(3);
    expect(points[2]?.z.re).toBe(5);
    expect(sign(points[2]?.z.im as number)).toBe('-0');
  });

  it('keeps a constant −0 part along the whole segment', () => {
    const points = segmentPath({ kind: 'segment', from: { re: -3, im: '-0' }, to: { re: -1, im: '-0' }, samples: 5 });
    expect(points.map((p) => sign(p.z.im))).toEqual(['-0', '-0', '-0', '-0', '-0']);
    expect(points.map((p) => p.z.re)).toEqual([-3, -2.5, -2, -1.5, -1]);
  });

  it('gives an interior zero crossing the sign of the side the segment comes from', () => {
    const up = segmentPath({ kind: 'segment', from: { re: -2, im: -1 }, to: { re: -2, im: 1 }, samples: 3 });
    expect(sign(up[1]?.z.im as number)).toBe('-0');
    const down = segmentPath({ kind: 'segment', from: { re: -2, im: 1 }, to: { re: -2, im: -1 }, samples: 3 });
    expect(sign(down[1]?.z.im as number)).toBe('+0');
  });

  it('maps t to evenly spaced parameters i/(n − 1)', () => {
    expect(
      segmentPath({ kind: 'segment', from: { re: 0, im: 0 }, to: { re: 1, im: 2 }, samples: 5 }).map((p) => p.t),
    ).toEqual([0, 0.25, 0.5, 0.75, 1]);
  });

  it('stays between its ends and is monotone in t (seed 7301)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -1e3, max: 1e3, noNaN: true }),
        fc.double({ min: -1e3, max: 1e3, noNaN: true }),
        fc.array(fc.double({ min: 0, max: 1, noNaN: true }), { minLength: 2, maxLength: 20 }),
        (a, b, ts) => {
          const sorted = [...ts].sort((x, y) => x - y);
          const xs = segmentPath({ kind: 'segment', from: { re: a, im: 0 }, to: { re: b, im: 0 }, at: sorted }).map(
            (p) => p.z.re,
          );
          const lo = Math.min(a, b);
          const hi = Math.max(a, b);
          const inRange = xs.every((x) => x >= lo && x <= hi);
          const monotone = xs.every(
            (x, i) => i === 0 || (b >= a ? x >= (xs[i - 1] as number) : x <= (xs[i - 1] as number)),
          );
          return inRange && monotone;
        },
      ),
      { seed: 7301, numRuns: 1000 },
    );
  });

  it('refuses a parameter outside [0, 1] and giving both samples and at', () => {
    expect(() => segmentPath({ kind: 'segment', from: { re: 0, im: 0 }, to: { re: 1, im: 0 }, at: [1.5] })).toThrow(
      RangeError,
    );
    expect(() =>
      segmentPath({ kind: 'segment', from: { re: 0, im: 0 }, to: { re: 1, im: 0 }, at: [0.5], samples: 3 } as never),
    ).toThrow(RangeError);
  });
});
