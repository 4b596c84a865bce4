import type { DataSource } from 'typeorm';
import type { PairCounts, RunComparison } from '../../shared/run-comparison';
import { targetKeySql } from '../sql/target-key-sql';

type Cell = PairCounts & { key: string; suite: string };

const add = (into: PairCounts, cell: PairCounts, sign = 1) => {
  into.fail += sign * cell.fail;
  into.error += sign * cell.error;
};

/**
 * Each completed run of `pairs` compared with the completed run before it (the one
 * markRegressions compared it with), by suite × target key: one query over the runs' shards,
 * then the pairs matched here. A pair only one run checked is counted under the target that
 * made it, or under its suite when both runs checked the target, never in the change.
 */
export async function loadRunComparisons(
  dataSource: DataSource,
  pairs: { latest: string; previous: { id: string; finishedAt: string | null } }[],
): Promise<Map<string, RunComparison>> {
  const result = new Map<string, RunComparison>();
  if (pairs.length === 0) return result;
  const rows: (Cell & { runId: string })[] = await dataSource.query(
    `SELECT s.run_id AS "runId", ${targetKeySql('s.target_name')} AS key, s.suite_slug AS suite,
            sum(coalesce((s.counts->>'fail')::int, 0))::int AS fail, sum(coalesce((s.counts->>'error')::int, 0))::int AS error
       FROM shards s WHERE s.run_id = ANY($1::uuid[])
      GROUP BY 1, 2, 3`,
    [pairs.flatMap((p) => [p.latest, p.previous.id])],
  );
  const cellsOf = new Map<string, Map<string, Cell>>();
  for (const { runId, ...cell } of rows) {
    const cells = cellsOf.get(runId) ?? new Map<string, Cell>();
    cells.set(`${cell.key}\u0000${cell.suite}`, cell);
    cellsOf.set(runId, cells);
  }
  for (const { latest, previous } of pairs) {
    const now = cellsOf.get(latest) ?? new Map<string, Cell>();
    const before = cellsOf.get(previous.id) ?? new Map<string, Cell>();
    const keysNow = new Set([...now.values()].map((c) => c.key));
    const keysBefore = new Set([...before.values()].map((c) => c.key));
    const comparison: RunComparison = {
      previous,
      common: { pairs: 0, fail: 0, error: 0 },
      targetsAdded: { keys: [...keysNow].filter((k) => !keysBefore.has(k)).sort(), fail: 0, error: 0 },
      targetsRemoved: { keys: [...keysBefore].filter((k) => !keysNow.has(k)).sort(), fail: 0, error: 0 },
      suitesAdded: { slugs: [], fail: 0, error: 0 },
      suitesRemoved: { slugs: [], fail: 0, error: 0 },
    };
    const suitesAdded = new Set<string>();
    const suitesRemoved = new Set<string>();
    for (const [id, cell] of now) {
      const old = before.get(id);
      if (old) {
        comparison.common.pairs += 1;
        add(comparison.common, cell);
        add(comparison.common, old, -1);
      } else if (!keysBefore.has(cell.key)) add(comparison.targetsAdded, cell);
      else {
        suitesAdded.add(cell.suite);
        add(comparison.suitesAdded, cell);
      }
    }
    for (const [id, cell] of before) {
      if (now.has(id)) continue;
      if (!keysNow.has(cell.key)) add(comparison.targetsRemoved, cell);
      else {
        suitesRemoved.add(cell.suite);
        add(comparison.suitesRemoved, cell);
      }
    }
    comparison.suitesAdded.slugs = [...suitesAdded].sort();
    comparison.suitesRemoved.slugs = [...suitesRemoved].sort();
    result.set(latest, comparison);
  }
  return result;
}
