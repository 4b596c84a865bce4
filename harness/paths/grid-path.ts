import { geometryPoint } from './geometry-point';
import { lerpComponent } from './lerp-component';
import type { PathPoint } from './path-point';
import type { PathSpec } from './path-spec';

/**
 * A box sampled columns × rows for cut maps, row by row from min.im upwards, each
 * row from min.re rightwards; t is the point's index over (count − 1). Edges keep the
 * signs written for min and max; a grid line that falls exactly on an axis inside
 * the box is +0, or, with bothZeroSigns, every point with a zero part comes twice
 * (+0 first, then −0) with labels saying which.
 */
export function gridPath(spec: Extract<PathSpec, { kind: 'grid' }>): PathPoint[] {
  const min = geometryPoint(spec.min, 'min');
  const max = geometryPoint(spec.max, 'max');
  for (const [name, n] of [
    ['columns', spec.columns],
    ['rows', spec.rows],
  ] as const) {
    if (!Number.isInteger(n) || n < 2) throw new RangeError(`${name} must be an integer ≥ 2, got ${n}`);
  }
  if (!(min.re < max.re) || !(min.im < max.im)) throw new RangeError('min must lie below and left of max');
  const axis = (a: number, b: number, n: number): number[] =>
    Array.from({ length: n }, (_, i) => {
      const x = lerpComponent(a, b, i / (n - 1));
      return x === 0 && i > 0 && i < n - 1 ? 0 : x;
    });
  const res = axis(min.re, max.re, spec.columns);
  const ims = axis(min.im, max.im, spec.rows);
  const count = spec.columns * spec.rows;
  const points: PathPoint[] = [];
  ims.forEach((im, row) => {
    res.forEach((re, column) => {
      const t = (row * spec.columns + column) / (count - 1);
      const label = `column ${column} row ${row}`;
      if (!spec.bothZeroSigns || (re !== 0 && im !== 0)) {
        points.push({ t, z: { re, im }, label });
        return;
      }
      const reSigns = re === 0 ? [0, -0] : [re];
      const imSigns = im === 0 ? [0, -0] : [im];
      for (const r of reSigns) {
        for (const i of imSigns) {
          const tags = [
            re === 0 ? `re ${Object.is(r, -0) ? '-0' : '+0'}` : '',
            im === 0 ? `im ${Object.is(i, -0) ? '-0' : '+0'}` : '',
          ]
            .filter(Boolean)
            .join(', ');
          points.push({ t, z: { re: r, im: i }, label: `${label} (${tags})` });
        }
      }
    });
  });
  return points;
}
