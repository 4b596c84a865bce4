import type { PropertyOutcome } from '../../shared/property-outcome';
import type { RunPropertyRow } from '../../shared/run-property-row';

/** The property checks of one suite on one or more library versions whose outcomes are the very same. */
export interface PropertyGroup {
  /** "sqrt-principal-sz × complex.js@2.4.3", or "… × complex.js@2.4.2 and complex.js@2.4.3" for a merged group. */
  pair: string;
  targets: string[];
  checks: PropertyOutcome[];
  /** 0: a law failed; 1: a law was not checked; 2: every law held. */
  rank: 0 | 1 | 2;
}

const byName = (a: string, b: string) => a.localeCompare(b, 'en', { numeric: true });

/**
 * Groups a run's property checks by suite × target, then merges the targets of a suite whose
 * outcomes are identical, field for field (law, seed, counterexample, values, replay path): the
 * same failure twice says nothing new. On the demo's largest run 13 of its 18 suites with laws
 * failed or held alike on both complex.js versions, so its 36 pairs are 23 groups. Groups with a
 * failure come first, then those with an unchecked law, then those that held, each by name.
 */
export function groupPropertyChecks(rows: RunPropertyRow[]): PropertyGroup[] {
  const pairs = new Map<string, { suite: string; target: string; checks: PropertyOutcome[] }>();
  for (const row of rows) {
    const key = `${row.suite}\u0000${row.target}`;
    const pair = pairs.get(key) ?? { suite: row.suite, target: row.target, checks: [] };
    pair.checks.push(row.outcome);
    pairs.set(key, pair);
  }
  const merged = new Map<string, { suite: string; targets: string[]; checks: PropertyOutcome[] }>();
  for (const pair of [...pairs.values()].sort((a, b) => byName(a.target, b.target))) {
    const key = `${pair.suite}\u0000${JSON.stringify(pair.checks)}`;
    const group = merged.get(key);
    if (group) group.targets.push(pair.target);
    else merged.set(key, { suite: pair.suite, targets: [pair.target], checks: pair.checks });
  }
  const rank = (checks: PropertyOutcome[]): PropertyGroup['rank'] =>
    checks.some((c) => c.kind === 'failed') ? 0 : checks.some((c) => c.kind === 'not-checked') ? 1 : 2;
  return [...merged.values()]
    .map(({ suite, targets, checks }) => ({
      pair: `${suite} × ${andList(targets)}`,
      targets,
      checks,
      rank: rank(checks),
    }))
    .sort((a, b) => a.rank - b.rank || a.pair.localeCompare(b.pair));
}

function andList(words: string[]): string {
  return words.length < 2 ? (words[0] ?? '') : `${words.slice(0, -1).join(', ')} and ${words[words.length - 1]}`;
}
