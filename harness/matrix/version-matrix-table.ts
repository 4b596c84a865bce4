import type { VersionMatrix } from '../../shared/version-matrix';
import { formatComplexText } from '../../shared/format-complex-text';

/** Changed points listed per suite in the table; the JSON output has them all. */
const LISTED = 12;

type Side = VersionMatrix['suites'][number]['changes'][number]['steps'][number]['before'];
const value = (s: Side) => (s.value ? formatComplexText(s.value, { ascii: true }) : 'no value');
const outcome = (s: Side) => (s.outcome.kind === 'fail' ? `fail: ${s.outcome.diagnosis.kind}` : s.outcome.kind);

/**
 * A version matrix as plain text: the statement, then per suite its status at each version and
 * up to 12 changed points, each with the first version where it changed and every change as
 * "before → after" with values and outcomes.
 */
export function versionMatrixTable(m: VersionMatrix): string {
  const lines = [`version matrix of ${m.library}: ${m.versions.join(', ')}`, m.statement, ''];
  for (const s of m.suites) {
    lines.push(`${s.id} v${s.version}  ${s.subject}${s.entry ? `  (entry ${s.entry})` : ''}`);
    lines.push(`  status: ${s.statusByVersion.map((v) => `${v.version} ${v.status} (${v.fail} failing)`).join(', ')}`);
    if (s.changes.length === 0) lines.push('  no value changed');
    for (const c of s.changes.slice(0, LISTED)) {
      lines.push(
        `  ${c.path} #${c.index}${c.label ? ` (${c.label})` : ''} at ${formatComplexText(c.z, { ascii: true })}: first changed in ${c.firstChangedIn}`,
      );
      for (const { before, after } of c.steps)
        lines.push(
          `    ${before.version} ${value(before)} [${outcome(before)}] -> ${after.version} ${value(after)} [${outcome(after)}]`,
        );
    }
    if (s.changes.length > LISTED)
      lines.push(`  … and ${s.changes.length - LISTED} more changed points (see --format json)`);
  }
  return lines.join('\n');
}
