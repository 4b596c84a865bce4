import type { RunResult, SuiteTargetResult } from '../../../shared/run-result';
import type { WireComplex } from '../../../shared/wire-complex';
import { describeOutcome } from './describe-outcome';
import { formatComplexText } from '../../../shared/format-complex-text';

const c = (w: WireComplex | null): string => formatComplexText(w);
const counts = (r: { pass: number; fail: number; error: number; skipped: number }) =>
  `${r.pass} pass · ${r.fail} fail · ${r.error} error · ${r.skipped} skipped`;
const diagnoses = (d: Record<string, number | undefined>) => {
  const parts = Object.entries(d).map(([k, n]) => `${k} ${n}`);
  return parts.length ? ` [${parts.join(', ')}]` : '';
};

function pair(r: SuiteTargetResult, maxRows: number): string[] {
  const lines: string[] = [];
  lines.push(
    `${r.status.toUpperCase().padEnd(9)} ${r.suite.id} v${r.suite.version} × ${r.target.name} — ${counts(r.counts)}${diagnoses(r.byDiagnosis)}`,
  );
  lines.push(
    `          checked: ${r.checked.branch}; tolerance ${r.checked.tolerance}; ${r.checked.paths} path(s), ${r.checked.points} point(s); properties: ${r.checked.properties.listed.length ? `${r.checked.properties.listed.join(', ')} (${r.checked.properties.note})` : 'none listed'}`,
  );
  for (const e of r.errors) lines.push(`          error: ${e}`);
  for (const o of r.properties ?? []) {
    if (o.kind === 'failed') lines.push(`          property FAILED: ${o.title} — ${o.reason ?? ''}`);
    else if (o.kind === 'not-checked') lines.push(`          property not checked: ${o.title} — ${o.reason ?? ''}`);
  }
  let shown = 0;
  for (const p of r.paths) {
    const mono = p.monodromy
      ? `; monodromy ${p.monodromy.pass ? 'ok' : 'FAILS'}: expected ${c(p.monodromy.expected)}, library ${c(p.monodromy.library)}${p.monodromy.note ? ` (${p.monodromy.note})` : ''}`
      : '';
    const skips = p.skipped.map((s) => `; ${s.count} skipped: ${s.reason}`).join('');
    if (p.counts.fail + p.counts.error === 0 && !mono.includes('FAILS') && !skips) continue;
    lines.push(
      `          path "${p.name}" (${p.kind}, ${p.points} points): ${counts(p.counts)}${diagnoses(p.byDiagnosis)}${mono}${skips}`,
    );
    for (const f of p.findings) {
      if (shown >= maxRows) break;
      shown++;
      lines.push(
        `            ${(f.label ?? `t = ${f.t}`).padEnd(22)} z = ${c(f.z)}  expected ${c(f.expected)}  got ${c(f.actual)}  → ${describeOutcome(f.outcome)}`,
      );
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
 * The run for a person: one block per suite × target with its status, counts and diagnoses,
 * what was checked, and the first failing points (z, expected, got, diagnosis). Every table
 * ends by saying that a pass is not a certification.
 */
export function formatTable(result: RunResult, maxRows = 12): string {
  const lines = [
    `sheetkeeper run: ${result.plan.suites.length} suite(s) × ${result.plan.targets.length} target(s), ${result.plan.slices} slice(s); status ${result.status.toUpperCase()}`,
    `points: ${counts(result.counts)}${diagnoses(result.byDiagnosis)}; reference values computed ${result.reference.computed}, from the cache ${result.reference.cached}`,
    '',
  ];
  for (const r of result.results) lines.push(...pair(r, maxRows), '');
  lines.push(result.disclaimer);
  return `${lines.join('\n')}\n`;
}
