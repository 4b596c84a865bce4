import type { Suite } from '../../shared/schemas/suite-schema';
import type { VersionMatrix } from '../../shared/version-matrix';
import { findEntry } from '../adapters/find-entry';
import type { TargetDescriptor } from '../adapters/target-descriptor';
import { parseSubject } from '../expressions/parse-subject';
import { buildPath } from '../paths/build-path';
import { formatDouble } from '../reference/numbers/format-double';
import { evaluateProgram } from '../runner/evaluation/evaluate-program';
import { evaluateSuite } from '../runner/evaluation/evaluate-suite';
import { ReferenceCache } from '../runner/reference-cache/reference-cache';
import { subjectProgram } from '../runner/evaluation/subject-program';
import { toPathSpec } from '../runner/evaluation/to-path-spec';

type SuiteEntry = VersionMatrix['suites'][number];
type Side = SuiteEntry['changes'][number]['steps'][number]['before'];

/**
 * A column's version as its target's name spells it, so a configured working copy of an installed
 * version ("complex.js@2.4.3+local") is its own column, "2.4.3+local"; a name without "@" shows the version.
 */
const versionLabel = (t: { name: string; version: string }): string => /@([^/]+)/.exec(t.name)?.[1] ?? t.version;
const wire = (re: number, im: number) => ({ re: formatDouble(re), im: formatDouble(im) });
/** Sign-exact sameness of two values: bit for bit, except that every NaN is the same NaN. */
const sameValue = (a: Side['value'], b: Side['value']): boolean =>
  a === null || b === null ? a === b : a.re === b.re && a.im === b.im;

/**
 * Runs each suite (at each entry asked for) against each version of one library (`targets`, oldest first) through the
 * runner's evaluateSuite, with one reference cache for all versions so every expected value is
 * computed once, and reads the library's value at every point with the runner's own evaluation
 * of the subject. A point changed when its value at one version differs sign-exactly from the
 * previous version's (or one of them has no value); each change is reported with the value and
 * outcome (pass, or the failure's diagnosis) on both sides.
 *
 * evaluateSuite reports failing points one by one but skipped points only as counts per path,
 * so a point that is neither failing nor an error is `pass` on a path without skips, and
 * `skipped` (with that caveat as the reason) on a path with some.
 */
export async function versionMatrix(
  library: string,
  suites: readonly Suite[],
  targets: readonly TargetDescriptor[],
  /**
   * The entries to compare at (shared/target-entry.ts), each suite once per entry; absent, each
   * suite at its own entry (the library's constructor from two numbers when it names none). A
   * version that lacks an entry shows an error status there.
   */
  atEntries?: readonly string[],
): Promise<VersionMatrix> {
  const cache = new ReferenceCache(null);
  const opened = targets.map((d) => d.open());
  const entries: SuiteEntry[] = [];
  let pointCount = 0;
  try {
    for (const suite of suites.flatMap((x) => (atEntries ?? [x.entry]).map((entry) => ({ ...x, entry })))) {
      const program = subjectProgram(parseSubject(suite.subject));
      const built = suite.paths.map((p) => {
        try {
          return buildPath(toPathSpec(p));
        } catch {
          return null;
        }
      });
      const entry: SuiteEntry = {
        id: suite.id,
        version: suite.version,
        subject: suite.subject,
        entry: suite.entry ?? findEntry(opened[0] ?? { name: library }).name,
        statusByVersion: [],
        changes: [],
      };
      // sides[path][point][version]
      const sides: Side[][][] = built.map((b) => (b ?? []).map(() => []));
      for (const target of opened) {
        const result = await evaluateSuite(suite, target, { cache, maxFindings: Number.MAX_SAFE_INTEGER });
        entry.statusByVersion.push({
          version: versionLabel(target),
          status: result.status,
          fail: result.counts.fail,
          pass: result.counts.pass,
        });
        for (const [k, points] of built.entries()) {
          if (!points) continue;
          const column = await evaluateProgram(
            program,
            target,
            Float64Array.from(points, (p) => p.z.re),
            Float64Array.from(points, (p) => p.z.im),
            undefined,
            suite.paths[k]?.entry ?? suite.entry,
          );
          const pathResult = result.paths[k];
          const findings = new Map((pathResult?.findings ?? []).map((f) => [f.index, f]));
          const allSkipped = pathResult !== undefined && pathResult.counts.skipped === pathResult.points;
          const someSkipped = pathResult !== undefined && pathResult.counts.skipped > 0;
          points.forEach((_, i) => {
            const error = column.errors.get(i);
            const value = error === undefined ? wire(column.re[i]!, column.im[i]!) : null;
            const finding = findings.get(i);
            let outcome: Side['outcome'];
            if (finding)
              outcome =
                finding.outcome.kind === 'fail'
                  ? { kind: 'fail', diagnosis: finding.outcome.diagnosis }
                  : finding.outcome.kind === 'error'
                    ? { kind: 'error', message: finding.outcome.message }
                    : { kind: 'skipped', reason: finding.outcome.kind === 'skipped' ? finding.outcome.reason : '' };
            else if (allSkipped) outcome = { kind: 'skipped', reason: pathResult.skipped?.[0]?.reason ?? 'skipped' };
            else if (error !== undefined) outcome = { kind: 'error', message: error };
            else if (someSkipped)
              outcome = {
                kind: 'skipped',
                reason: 'passed or skipped: this path has skipped points, which the runner counts but does not list',
              };
            else outcome = { kind: 'pass' };
            sides[k]![i]!.push({ version: versionLabel(target), value, outcome });
          });
        }
      }
      for (const [k, points] of built.entries()) {
        if (!points) continue;
        points.forEach((p, i) => {
          const history = sides[k]![i]!;
          const steps = history
            .slice(1)
            .flatMap((after, v) => (sameValue(history[v]!.value, after.value) ? [] : [{ before: history[v]!, after }]));
          if (steps.length === 0) return;
          entry.changes.push({
            path: suite.paths[k]!.name,
            index: i,
            ...(p.label ? { label: p.label } : {}),
            z: wire(p.z.re, p.z.im),
            firstChangedIn: steps[0]!.after.version,
            steps,
          });
        });
      }
      pointCount += built.reduce((s, b) => s + (b?.length ?? 0), 0);
      entries.push(entry);
    }
  } finally {
    await Promise.all(opened.map((t) => t.close()));
  }
  return {
    library,
    versions: opened.map(versionLabel),
    statement:
      `Values of ${pointCount} points (the suites' paths) compared bit for bit between consecutive installed versions, ` +
      `each suite at the entry it names (how its inputs are built: "new Complex(re, im)" by default). ` +
      `A version absent here was not installed and not compared; no change means the same values at these points, not the same library.`,
    suites: entries,
  };
}
