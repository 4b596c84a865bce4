import type { DataSource } from 'typeorm';
import type { PairCounts, RunComparison } from '../../shared/run-comparison';
import { targetKeySql } from '../sql/target-key-sql';

type Cell = PairCounts & { key: string; suite: string; names: string[] };

/** The target names (versions) each target key was checked at in one run. */
const versionsByKey = (cells: Map<string, Cell>) => {
  const versions = new Map<string, Set<string>>();
  for (const cell of cells.values()) {
    const names = versions.get(cell.key) ?? new Set<string>();
    for (const name of cell.names) names.add(name);
    versions.set(cell.key, names);
  }
  return versions;
};

const add = (into: PairCounts, cell: PairCounts, sign = 1) => {
  into.fail += sign * cell.fail;
  into.error += sign * cell.error;
};

/**
 * Each completed run of `pairs` compared with the completed run before it (the one
 * markRegressions compared it with), by suite × target key: one query over the runs' shards,
 * then the pairs matched here. A pair only one run checked is counted under the target that
 * made it, or under its suite when both runs checked the target, never in the change. A
 * library checked at a different number of versions (the demo nightly: one release,
 * then the two newest) is a change of targets too, named by its versions.
 */
export async function loadRunComparisons(
  dataSource: DataSource,
  pairs: { latest: string; previous: { id: string; finishedAt: string | null } }[],
): Promise<Map<string, RunComparison>> {
  const result = new Map<string, RunComparison>();
  if (pairs.length === 0) return result;
  const rows: (Cell & { runId: string })[] = await dataSource.query(
    `SELECT s.run_id AS "runId", ${targetKeySql('s.target_name')} AS key, s.suite_slug AS suite,
            array_agg(DISTINCT s.target_name ORDER BY s.target_name) AS names,
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
    const versionsNow = versionsByKey(now);
    const versionsBefore = versionsByKey(before);
    // A library is compared with itself across an upgrade, as regressions are, when each run
    // checked the same number of its versions; otherwise summed counts would compare two
    // versions with one, so its versions count as targets added and removed.
    const same = (key: string) => versionsNow.get(key)?.size === versionsBefore.get(key)?.size;
    // A new or dropped library by its key; one checked at a different number of versions by those versions.
    const listed = (versions: Map<string, Set<string>>, other: Map<string, Set<string>>) =>
      [...versions].flatMap(([key, names]) => (same(key) ? [] : other.has(key) ? [...names] : [key])).sort();
    const comparison: RunComparison = {
      previous,
      common: { pairs: 0, fail: 0, error: 0 },
      targetsAdded: { targets: listed(versionsNow, versionsBefore), fail: 0, error: 0 },
      targetsRemoved: { targets: listed(versionsBefore, versionsNow), fail: 0, error: 0 },
      suitesAdded: { slugs: [], fail: 0, error: 0 },
      suitesRemoved: { slugs: [], fail: 0, error: 0 },
    };
    const suitesAdded = new Set<string>();
    const suitesRemoved = new Set<string>();
    for (const [id, cell] of now) {
      const old = before.get(id);
      if (!same(cell.key)) add(comparison.targetsAdded, cell);
      else if (old) {
        comparison.common.pairs += 1;
        add(comparison.common, cell);
        add(comparison.common, old, -1);
      } else {
        suitesAdded.add(cell.suite);
        add(comparison.suitesAdded, cell);
      }
    }
    for (const [id, cell] of before) {
      if (!same(cell.key)) add(comparison.targetsRemoved, cell);
      else if (!now.has(id)) {
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
