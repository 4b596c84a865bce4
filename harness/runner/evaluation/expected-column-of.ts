import type { PathPoint } from '../../paths/path-point';
import type { ExpectedColumn } from '../expectations/expectation';
import type { PathEvaluation } from './path-evaluation';

/**
 * The expected values at a path's points: from the cache's columns when this suite's points were
 * already gathered (checking the same suite against another target), else from the expectation.
 */
export function expectedColumnOf(
  evaluation: Pick<PathEvaluation, 'cache' | 'cacheKey' | 'expectation' | 'path'>,
  points: PathPoint[],
): ExpectedColumn {
  const { cache, cacheKey } = evaluation;
  let byKey = cache.columns.get(points);
  if (!byKey) cache.columns.set(points, (byKey = new Map()));
  const known = byKey.get(cacheKey) as ExpectedColumn | undefined;
  if (known) {
    cache.cached += points.length - known.skipped.size;
    return known;
  }
  const expected = evaluation.expectation.expected(evaluation.path, points);
  byKey.set(cacheKey, expected);
  return expected;
}
