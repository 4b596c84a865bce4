import { outcomeClass } from '../../../shared/outcome-class';
import type { PointFinding, RunResult, SuiteTargetResult } from '../../../shared/run-result';
import type { WireComplex } from '../../../shared/wire-complex';
import { describeCounts } from './describe-counts';
import { describeOutcome } from './describe-outcome';
import { describeSteps } from '../../../shared/describe-steps';
import { formatComplexText } from '../../../shared/format-complex-text';
import { propertyFailureLines } from '../../../shared/property-failure-lines';

const c = (w: WireComplex | null): string => formatComplexText(w);
/** The groups findings are listed in: branch findings lead, then points that could not be evaluated, then accuracy. */
const GROUPS = [
  { key: 'branch', title: 'branch findings' },
  { key: 'error', title: 'errors' },
  { key: 'accuracy', title: 'accuracy findings' },
] as const;
const groupOf = (f: PointFinding) => outcomeClass(f.outcome) ?? 'error';
/** Pairs with branch findings first, then the others in plan order. */
const branchFirst = <T extends { byClass: { branch: number } }>(list: readonly T[]): T[] =>
  [...list].sort((a, b) => Number(b.byClass.branch > 0) - Number(a.byClass.branch > 0));

function pair(r: SuiteTargetResult, maxRows: number): string[] {
  const lines: string[] = [];
  lines.push(
    `${r.status.toUpperCase().padEnd(9)} ${r.suite.id} v${r.suite.version} × ${r.target.name} — ${describeCounts(r.counts, r.byClass, r.byDiagnosis)}`,
  );
  lines.push(
    `          checked: ${r.checked.branch}; ${r.checked.entry ? `entry ${r.checked.entry}; ` : ''}tolerance ${r.checked.tolerance}; ${r.checked.paths} path(s), ${r.checked.points} point(s); properties: ${r.checked.properties.listed.length ? `${r.checked.properties.listed.join(', ')} (${r.checked.properties.note})` : 'none listed'}`,
  );
  for (const e of r.errors) lines.push(`          error: ${e}`);
  for (const o of r.properties ?? []) {
    if (o.kind === 'failed')
      lines.push(
        `          property FAILED: ${o.title} — ${o.reason}`,
        ...propertyFailureLines(o).map((l) => `            ${l}`),
      );
    else if (o.kind === 'not-checked') lines.push(`          property not checked: ${o.title} — ${o.reason}`);
  }
  for (const p of branchFirst(r.paths)) {
    const mono = p.monodromy
      ? `; monodromy ${p.monodromy.pass ? 'ok' : 'FAILS'}: expected ${c(p.monodromy.expected)}, library ${c(p.monodromy.library)}${p.monodromy.note ? ` (${p.monodromy.note})` : ''}`
      : '';
    const skips = [
      ...(p.entry ? [`; entry ${p.entry}`] : []),
      ...p.skipped.map((s) => `; ${s.count} skipped: ${s.reason}`),
      ...(p.notApplicable ?? []).map((s) => `; ${s.count} not applicable: ${s.reason}`),
    ].join('');
    const agree = (p.agreements ?? [])
      .map(
        (a) =>
          `; ${a.compared - a.disagreed} of ${a.compared} agree with ${a.with}` +
          a.oneSided.map((s) => `, ${s.count} ${s.reason}`).join('') +
          (a.note ? ` (${a.note})` : ''),
      )
      .join('');
    const oneSided = (p.agreements ?? []).some((a) => a.oneSided.length > 0 || a.note);
    if (p.counts.fail + p.counts.error === 0 && !mono.includes('FAILS') && !skips && !oneSided) continue;
    // A list of points has nothing between them: say that no continuity check ran on it.
    const list = p.kind === 'points' ? ', a list: no jumps or monodromy looked for' : '';
    lines.push(
      `          path "${p.name}" (${p.kind}, ${p.points} points${list}): ${describeCounts(p.counts, p.byClass, p.byDiagnosis)}${mono}${skips}${agree}`,
    );
  }
  const findings = r.paths.flatMap((p) => p.findings);
  let shown = 0;
  for (const group of GROUPS) {
    const rows = findings.filter((f) => groupOf(f) === group.key);
    if (rows.length === 0 || shown >= maxRows) continue;
    lines.push(`          ${group.title}:`);
    for (const f of rows.slice(0, maxRows - shown)) {
      shown++;
      lines.push(
        `            ${`"${f.path}" ${f.label ?? `t = ${f.t}`}`.padEnd(30)} z = ${c(f.z)}  expected ${c(f.expected)}  got ${c(f.actual)}  → ${describeOutcome(f.outcome)}`,
      );
      const steps = describeSteps(f);
      if (steps) lines.push(`              ${steps}`);
      if (f.choice) lines.push(`              expected value is ${f.choice}`);
    }
  }
  const listed = r.paths.reduce((s, p) => s + p.findings.length + p.findingsOmitted, 0);
  if (listed > shown)
    lines.push(
      `          … ${listed - shown} more failing point(s): --format json lists each with its rule, limits and reproducer`,
    );
  return lines;
}

/**
 * The run for a person: one block per suite × target with its status, counts (failures split into
 * branch and accuracy findings) and labels, what was checked, and the first failing points (z,
 * expected, got, every label), branch findings first: pairs and paths with branch findings lead,
 * and each pair lists its branch findings, then errors, then accuracy findings. Every table ends
 * by saying that a pass is not a certification.
 */
export function formatTable(result: RunResult, maxRows = 12): string {
  const lines = [
    `sheetkeeper run: ${result.plan.suites.length} suite(s) × ${result.plan.targets.length} target(s), ${result.plan.slices} slice(s); status ${result.status.toUpperCase()}`,
    `points: ${describeCounts(result.counts, result.byClass, result.byDiagnosis)}; reference values computed ${result.reference.computed}, from the cache ${result.reference.cached}`,
    '',
  ];
  for (const r of branchFirst(result.results)) lines.push(...pair(r, maxRows), '');
  lines.push(result.disclaimer);
  return `${lines.join('\n')}\n`;
}
