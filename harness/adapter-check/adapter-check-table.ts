import type { AdapterCheckReport } from './adapter-check-report';
import { ADAPTER_CHECKS } from './adapter-checks';

const STATUS_WORD = { pass: 'pass', fail: 'FAIL', 'not-checked': 'not checked' } as const;

/**
 * An adapter-check report as a plain-text table: one row per check with its group, result and what
 * the program did; under a failure, what it means and how to fix it; the counts last.
 */
export function adapterCheckTable(report: AdapterCheckReport): string {
  const rows = report.checks.map((c) => [ADAPTER_CHECKS[c.name].group, c.name, STATUS_WORD[c.status], c.found]);
  const header = ['group', 'check', 'result', 'what the program did'];
  const widths = header.map((h, i) => Math.max(h.length, ...rows.map((r) => r[i]!.length)));
  const indent = ' '.repeat(widths[0]! + widths[1]! + widths[2]! + 6);
  const line = (cells: string[]) =>
    cells
      .map((c, i) => (i === cells.length - 1 ? c : c.padEnd(widths[i]!)))
      .join('  ')
      .trimEnd();
  const identity = report.library ? ` (${report.library} ${report.version ?? '?'})` : '';
  return [
    `adapter-check of ${report.program}${identity}, time limit ${report.timeLimitMs} ms per request`,
    '',
    line(header),
    line(widths.map((w) => '-'.repeat(w))),
    ...report.checks.flatMap((c, i) => [
      line(rows[i]!),
      ...(c.advice ? [`${indent}why and how to fix: ${c.advice}`] : []),
    ]),
    '',
    `${report.checks.length} checks: ${report.passed} passed, ${report.failed} failed, ${report.notChecked} not checked`,
  ].join('\n');
}
