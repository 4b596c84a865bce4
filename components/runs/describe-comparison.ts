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
  if (c.common.pairs === 0) lines.push('The two runs checked no suite × target pair in common: nothing to compare.');
  else
    lines.push(
      `On the ${W.plural(c.common.pairs, 'suite × target pair', 'suite × target pairs')} both runs checked, ${W.since}: ${changes.length ? changes.join(', ') : 'no change in failed or error points'}.`,
    );
  const { targetsAdded: ta, targetsRemoved: tr, suitesAdded: sa, suitesRemoved: sr } = c;
  if (ta.targets.length)
    lines.push(
      `${W.plural(ta.targets.length, 'target', 'targets')} added since the previous run (${ta.targets.join(', ')}): ${fromThem(ta, ta.targets.length === 1 ? 'it' : 'them')}`,
    );
  if (tr.targets.length)
    lines.push(
      `${W.plural(tr.targets.length, 'target', 'targets')} no longer checked (${tr.targets.join(', ')}): ${leftOut(tr, tr.targets.length === 1 ? 'it' : 'they')}`,
    );
  if (sa.slugs.length)
    lines.push(
      `${W.plural(sa.slugs.length, 'suite', 'suites')} added since the previous run (${sa.slugs.join(', ')}): ${fromThem(sa, sa.slugs.length === 1 ? 'it' : 'them')}`,
    );
  if (sr.slugs.length)
    lines.push(
      `${W.plural(sr.slugs.length, 'suite', 'suites')} no longer checked (${sr.slugs.join(', ')}): ${leftOut(sr, sr.slugs.length === 1 ? 'it' : 'they')}`,
    );
  return lines;
}
