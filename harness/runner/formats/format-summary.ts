import { formatComplexText } from '../../../shared/format-complex-text';
import { outcomeClass } from '../../../shared/outcome-class';
import { propertyFailureParts } from '../../../shared/property-failure-parts';
import type { RunResult } from '../../../shared/run-result';
import { describeCounts } from './describe-counts';
import { describeOutcome } from './describe-outcome';

/**
 * The run in a few lines, for a CI log (docs/ci-recipes.md): the status and counts with the labels
 * by class, each pair's errors and failed property checks, then the first `first` branch findings over all pairs (suite ×
 * target, path, z, expected, got, every label) and how many more there are. Accuracy findings are
 * counted, not listed: the JUnit file and `--format json` have every point.
 */
export function formatSummary(result: RunResult, first = 5): string {
  const lines = [
    `sheetkeeper run: ${result.status.toUpperCase()}; ${result.plan.suites.length} suite(s) × ${result.plan.targets.length} target(s); ${describeCounts(result.counts, result.byClass, result.byDiagnosis)}`,
  ];
  for (const r of result.results) {
    for (const e of r.errors) lines.push(`  error: ${r.suite.id} × ${r.target.name}: ${e}`);
    for (const o of r.properties ?? [])
      if (o.kind === 'failed') {
        const parts = propertyFailureParts(o);
        lines.push(
          `  property FAILED: ${r.suite.id} × ${r.target.name}: ${o.law} — ${o.reason}; ${parts.counterexample}; ${parts.replay}`,
        );
      }
  }
  const branch = result.results.flatMap((r) =>
    r.paths.flatMap((p) => p.findings.filter((f) => outcomeClass(f.outcome) === 'branch').map((f) => ({ r, f }))),
  );
  if (branch.length > 0) lines.push(`first branch findings:`);
  for (const { r, f } of branch.slice(0, first)) {
    lines.push(
      `  ${r.suite.id} × ${r.target.name}, "${f.path}" ${f.label ?? `t = ${f.t}`}: z = ${formatComplexText(f.z)}  expected ${formatComplexText(f.expected)}  got ${formatComplexText(f.actual)}  → ${describeOutcome(f.outcome)}`,
    );
  }
  const more = result.byClass.branch - Math.min(first, branch.length);
  if (more > 0) lines.push(`  … ${more} more branch finding(s): the JUnit file and --format json list every point`);
  return `${lines.join('\n')}\n`;
}
