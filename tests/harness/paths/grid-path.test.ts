import { gridPath } from '../../../harness/paths/grid-path';

import { zeroText as show } from './zero-text';

describe('gridPath', () => {
  it('samples the box row by row from the bottom left, t running over the point index', () => {
    const points = gridPath({ kind: 'grid', min: { re: -1, im: -2 }, max: { re: 1, im: 2 }, columns: 3, rows: 2 });
    expect(points.map((p) => [p.t, p.z.re, p.z.im])).toEqual([
      [0, -1, -2],
      [0.2, 0, -2],
      [0.4, 1, -2],
      [0.6, -1, 2],
      [0.8, 0, 2],
      [1, 1, 2],
    ]);
  });

  it('puts an interior grid line that falls on an axis at +0', () => {
    const points = gridPath({ kind: 'grid', min: { re: -2, im: -1 }, max: { re: 2, im: 1 }, columns: 5, rows: 3 });
    expect(points.filter((p) => p.z.im === 0).map((p) => show(p.z.im))).toEqual(['+0', '+0', '+0', '+0', '+0']);
    expect(points.filter((p) => p.z.re === 0).map((p) => show(p.z.re))).toEqual(['+0', '+0', '+0']);
  });

  it('emits points with a zero part with both signs when asked, +0 first', () => {
    const points = gridPath({
      kind: 'grid',
      min: { re: -1, im: -1 },
      max: { re: 1, im: 1 },
      columns: 3,
      rows: 3,
      bothZeroSigns: true,
    });
    expect(points).toHaveLength(9 + 2 * 2 + 3);
    const center = points.filter((p) => p.label?.startsWith('column 1 row 1'));
    expect(center.map((p) => `${show(p.z.re)} ${show(p.z.im)}`)).toEqual(['+0 +0', '+0 -0', '-0 +0', '-0 -0']);
  });

  it('keeps the signs written on the box edges', () => {
    const points = gridPath({ kind: 'grid', min: { re: -1, im: '-0' }, max: { re: 1, im: 1 }, columns: 2, rows: 2 });
    expect(points.slice(0, 2).map((p) => show(p.z.im))).toEqual(['-0', '-0']);
  });

  it('refuses fewer than two columns or rows and an empty box', () => {
    expect(() => gridPath({ kind: 'grid', min: { re: 0, im: 0 }, max: { re: 1, im: 1 }, columns: 1, rows: 2 })).toThrow(
      RangeError,
    );
    expect(() => gridPath({ kind: 'grid', min: { re: 1, im: 0 }, max: { re: 1, im: 1 }, columns: 2, rows: 2 })).toThrow(
      RangeError,
    );
  });
});
