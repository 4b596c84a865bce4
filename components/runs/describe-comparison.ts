import { COMPARISON_WORDS as W } from '../../shared/comparison-words';
import type { PairCounts, RunComparison } from '../../shared/run-comparison';

/** "604 more failures and 2 errors come from them", or that none do. */
const fromThem = (c: PairCounts, whose: string) => {
  const parts = [
    c.fail > 0 ? W.plural(c.fail, 'more failure', 'more failures') : null,
    c.error > 0 ? W.plural(c.error, 'more point in error', 'more points in error') : null,
  ].filter((p) => p !== null);
  return parts.length
    ? `${parts.join(' and ')} ${c.fail + c.error === 1 ? 'comes' : 'come'} from ${whose}.`
    : `no failure comes from ${whose}.`;
};

/** "the 20 failures they had in the previous run are not counted", or that they had none. */
const leftOut = (c: PairCounts, whose: string) =>
  c.fail + c.error > 0
    ? `the ${[c.fail > 0 ? W.plural(c.fail, 'failure', 'failures') : null, c.error > 0 ? W.plural(c.error, 'point in error', 'points in error') : null].filter((p) => p !== null).join(' and ')} ${whose} had in the previous run are left out of the comparison.`
    : `${whose} had no failure in the previous run.`;

/**
 * A completed run compared with the completed run before it, in sentences: the change over the
 * pairs both runs checked ("↑ 12 more failed"), then each change of the target set or the suites
 * with the failures it brought or took away, so "↑ 604 more failed" never hides three new targets.
 */
export function describeComparison(c: RunComparison): string[] {
  const lines: string[] = [];
  const changes = [W.change(c.common.fail, 'failed'), W.change(c.common.error, 'in error')].filter((p) => p !== null);
  // Only failure counts lack a common ground here: regressions are matched point by point per
  // library, so a run on new versions can still have them, and the line must not say otherwise.
  if (c.common.pairs === 0)
    lines.push(
      'Failure counts are not compared: the two runs checked no suite × target pair in common (regressions are matched point by point, per library).',
    );
  else
    lines.push(
      `On the ${W.plural(c.common.pairs, 'suite × target pair', 'suite × target pairs')} both runs checked, ${W.since}: ${changes.length ? changes.join(', ') : 'no change in failed or error points'}.`,
    );
  const changed: [string, string, string[], PairCounts, boolean][] = [
    ['target', 'targets', c.targetsAdded.targets, c.targetsAdded, true],
    ['target', 'targets', c.targetsRemoved.targets, c.targetsRemoved, false],
    ['suite', 'suites', c.suitesAdded.slugs, c.suitesAdded, true],
    ['suite', 'suites', c.suitesRemoved.slugs, c.suitesRemoved, false],
  ];
  for (const [one, many, names, counts, added] of changed) {
    if (names.length === 0) continue;
    const what = `${W.plural(names.length, one, many)} ${added ? 'added since the previous run' : 'no longer checked'} (${names.join(', ')})`;
    const single = names.length === 1;
    lines.push(
      `${what}: ${added ? fromThem(counts, single ? 'it' : 'them') : leftOut(counts, single ? 'it' : 'they')}`,
    );
  }
  return lines;
}
