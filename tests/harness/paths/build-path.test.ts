import { buildPath } from '../../../harness/paths/build-path';
import type { PathSpec } from '../../../harness/paths/path-spec';

describe('buildPath', () => {
  it('dispatches each kind to its generator', () => {
    const specs: PathSpec[] = [
      { kind: 'circle', center: { re: 0, im: 0 }, radius: 1, startAngle: 0, turns: 1, direction: 'ccw', samples: 5 },
      { kind: 'segment', from: { re: 0, im: 0 }, to: { re: 1, im: 0 }, samples: 4 },
      {
        kind: 'polyline',
        points: [
          { re: 0, im: 0 },
          { re: 1, im: 0 },
          { re: 1, im: 1 },
        ],
        samples: 3,
      },
      { kind: 'straddle', cut: { kind: 'ray', from: { re: 0, im: 0 }, through: { re: -1, im: 0 } }, along: [1] },
      { kind: 'grid', min: { re: 0, im: 0 }, max: { re: 1, im: 1 }, columns: 2, rows: 3 },
    ];
    expect(specs.map((s) => buildPath(s).length)).toEqual([5, 4, 3, 10, 6]);
    expect(buildPath(specs[2] as PathSpec)[1]?.z).toEqual({ re: 1, im: 0 });
  });

  it('refuses an unknown kind', () => {
    expect(() => buildPath({ kind: 'spiral' } as unknown as PathSpec)).toThrow(/unknown path kind "spiral"/);
  });
});
