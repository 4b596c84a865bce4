import fc from 'fast-check';
import { polylinePath } from '../../../harness/paths/polyline-path';

import { zeroText as sign } from './zero-text';

describe('polylinePath', () => {
  it('takes t as the fraction of arc length: a 3-then-4 path has its corner at t = 3/7', () => {
    const points = polylinePath({
      kind: 'polyline',
      points: [
        { re: 0, im: 0 },
        { re: 3, im: 0 },
        { re: 3, im: 4 },
      ],
      samples: 8,
    });
    expect(points.map((p) => [p.z.re, p.z.im])).toEqual([
      [0, 0],
      [1, 0],
      [2, 0],
      [3, 0],
      [3, 1],
      [3, 2],
      [3, 3],
      [3, 4],
    ]);
  });

  it('returns vertices exactly as written, zero signs included, where t·L lands on them', () => {
    // Edges of length 3 and 1: the corner (1, −0) sits at t = 3/4 exactly.
    const points = polylinePath({
      kind: 'polyline',
      points: [
        { re: 1, im: 3 },
        { re: 1, im: '-0' },
        { re: 0, im: '-0' },
      ],
      at: [0, 0.75, 0.875, 1],
    });
    expect(points.map((p) => `${sign(p.z.re)} ${sign(p.z.im)}`)).toEqual(['1 3', '1 -0', '0.5 -0', '+0 -0']);
  });

  it('skips zero-length edges', () => {
    const points = polylinePath({
      kind: 'polyline',
      points: [
        { re: 0, im: 0 },
        { re: 0, im: 0 },
        { re: 2, im: 0 },
      ],
      samples: 3,
    });
    expect(points.map((p) => p.z.re)).toEqual([0, 1, 2]);
  });

  it('puts the point at t a distance t·L along the path (seed 7401)', () => {
    const vertices = [
      { re: 0, im: 0 },
      { re: 2, im: 0 },
      { re: 2, im: 1 },
      { re: -1, im: 1 },
    ];
    // Along this path, the distance walked to a point is readable from its coordinates.
    const walked = (z: { re: number; im: number }): number =>
      z.im === 0 ? z.re : z.re === 2 && z.im < 1 ? 2 + z.im : 3 + (2 - z.re);
    fc.assert(
      fc.property(fc.double({ min: 0, max: 1, noNaN: true }), (t) => {
        // The vertices come too (each at its own t); the sample is the point at the t asked for.
        const p = polylinePath({ kind: 'polyline', points: vertices, at: [t] }).find((q) => q.t === t);
        return Math.abs(walked(p?.z as { re: number; im: number }) - 6 * t) < 1e-14;
      }),
      { seed: 7401, numRuns: 1000 },
    );
  });

  it('evaluates vertices placed 1e-6 and 1e-9 below the cut of sqrt, whatever the sampling', () => {
    // Vertices between samples: with 5 samples at t = 0, ¼, ½, ¾, 1 none of the inner vertices is sampled.
    const spec = {
      kind: 'polyline' as const,
      points: [
        { re: '-3', im: '1' },
        { re: '-2.5', im: '-1e-6' },
        { re: '-1.5', im: '-1e-9' },
        { re: '-1', im: '1' },
      ],
    };
    for (const sampling of [{ samples: 5 }, { at: ['0.1', '0.9'] }]) {
      const points = polylinePath({ ...spec, ...sampling });
      const zs = points.map((p) => `${p.z.re} ${p.z.im}`);
      expect(zs).toEqual(expect.arrayContaining(['-3 1', '-2.5 -0.000001', '-1.5 -1e-9', '-1 1']));
      // Points come in increasing t, and each vertex says which it is.
      expect(points.map((p) => p.t)).toEqual([...points.map((p) => p.t)].sort((a, b) => a - b));
      expect(points.filter((p) => p.label?.startsWith('vertex')).map((p) => p.label)).toEqual([
        'vertex 1',
        'vertex 2',
        'vertex 3',
        'vertex 4',
      ]);
    }
  });

  it("keeps every sample's t as written and gives each vertex its own fraction of arc length", () => {
    // Edges of lengths 1, 2 and 1 (total 4): the inner vertices sit at t = ¼ and ¾.
    const points = polylinePath({
      kind: 'polyline',
      points: [
        { re: 0, im: 0 },
        { re: 1, im: 0 },
        { re: 1, im: 2 },
        { re: 2, im: 2 },
      ],
      at: ['0.1', '0.5', '0.9'],
    });
    expect(points.map((p) => [p.t, p.z.re, p.z.im])).toEqual([
      [0, 0, 0],
      [0.1, 0.4, 0],
      [0.25, 1, 0],
      [0.5, 1, 1],
      [0.75, 1, 2],
      [0.9, 1.6, 2],
      [1, 2, 2],
    ]);
  });

  it('refuses fewer than two points and a path of zero length', () => {
    expect(() => polylinePath({ kind: 'polyline', points: [{ re: 0, im: 0 }], samples: 2 })).toThrow(RangeError);
    expect(() =>
      polylinePath({
        kind: 'polyline',
        points: [
          { re: 1, im: 1 },
          { re: 1, im: 1 },
        ],
        samples: 2,
      }),
    ).toThrow(RangeError);
  });
});
