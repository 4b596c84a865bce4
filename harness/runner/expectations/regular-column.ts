import type { SuitePath } from '../../../shared/schemas/suite-path-schema';
import type { PathPoint } from '../../paths/path-point';
import type { Point } from '../../reference/continuation/continuation-path';
import { continueAlongPath } from './continue-along-path';
import type { ExpectedColumn } from './expectation';
import type { RegularBranch } from './regular-branch';
import { regularValueAt } from './regular-value-at';
import { REGULAR_TUNING } from './regular-tuning';

/** The expected values of a path's points on the branch; a point the branch refuses is skipped with the reason. */
export function regularColumn(branch: RegularBranch, path: SuitePath, points: readonly PathPoint[]): ExpectedColumn {
  const n = points.length;
  const col: ExpectedColumn = { re: new Float64Array(n), im: new Float64Array(n), skipped: new Map() };
  const out = [0, 0];
  let along: (Point | null)[] | null | undefined;
  for (let i = 0; i < n; i++) {
    const p: Point = [(points[i] as PathPoint).z.re, (points[i] as PathPoint).z.im];
    try {
      if (!branch.cache.get(branch.cacheKey, REGULAR_TUNING.kindValue, p[0], p[1], out)) {
        // Only when something is missing: one continuation along the whole path serves its off-cut points.
        if (along === undefined) along = continueAlongPath(branch, path, points);
        const v = regularValueAt(branch, p, REGULAR_TUNING.kindValue, along?.[i] ?? null);
        out[0] = v[0];
        out[1] = v[1];
      }
      col.re[i] = out[0] as number;
      col.im[i] = out[1] as number;
    } catch (e) {
      col.skipped.set(i, e instanceof Error ? e.message : String(e));
    }
  }
  return col;
}
