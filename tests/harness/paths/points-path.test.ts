import { buildPath } from '../../../harness/paths/build-path';
import { pointsPath } from '../../../harness/paths/points-path';

import { zeroText as sign } from './zero-text';

describe('pointsPath', () => {
  it('returns exactly the points written, each once, in order, zero signs included', () => {
    const points = pointsPath({
      kind: 'points',
      points: [
        { re: '-1', im: '-0' },
        { re: '-4', im: '0' },
        { re: '-4', im: '-0' },
      ],
    });
    expect(points.map((p) => `${sign(p.z.re)} ${sign(p.z.im)}`)).toEqual(['-1 -0', '-4 +0', '-4 -0']);
    expect(points.map((p) => p.label)).toEqual(['point 1', 'point 2', 'point 3']);
  });

  it('numbers the points by t = index / (count − 1), and a single point has t = 0', () => {
    const three = pointsPath({
      kind: 'points',
      points: [
        { re: 1, im: 0 },
        { re: 2, im: 0 },
        { re: 3, im: 0 },
      ],
    });
    expect(three.map((p) => p.t)).toEqual([0, 0.5, 1]);
    // A single point is evaluated once: it was a segment from itself to itself, evaluated twice.
    const one = buildPath({ kind: 'points', points: [{ re: '-4', im: '-0' }] });
    expect(one).toHaveLength(1);
    expect(one[0]?.t).toBe(0);
  });

  it('keeps a point written twice twice', () => {
    expect(
      pointsPath({
        kind: 'points',
        points: [
          { re: 2, im: 0 },
          { re: 2, im: 0 },
        ],
      }),
    ).toHaveLength(2);
  });

  it('refuses an empty list and a point that is not a number', () => {
    expect(() => pointsPath({ kind: 'points', points: [] })).toThrow(RangeError);
    expect(() => pointsPath({ kind: 'points', points: [{ re: 'nan', im: '0' }] })).toThrow(/points\[0\]/);
  });
});
