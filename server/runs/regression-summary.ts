import type { DiagnosisKind } from '../../shared/diagnosis';
import { diagnosisClass } from '../../shared/diagnosis-class';
import { DIAGNOSIS_CLASSES } from '../../shared/diagnosis-classes';
import { DIAGNOSIS_KIND_NAMES } from '../../shared/diagnosis-kind-names';
import { DIAGNOSIS_KINDS } from '../../shared/diagnosis-kinds';
import { failuresPath } from '../../shared/failures-path';
import type { ClassCounts } from '../../shared/run-result';
import { escapeHtml } from '../mail/escape-html';

const CLASS_TITLE = { branch: 'Branch findings', accuracy: 'Accuracy findings' } as const;

/** How many targets the summary names as most affected; the rest are counted. */
export const MOST_AFFECTED_SHOWN = 3;

/**
 * The block a regression mail opens with, before any table: the regressions of the run by kind
 * (branch kinds first, in DIAGNOSIS_KINDS' order, then accuracy; each a link to the failure table
 * filtered to that run's regressions of that kind), the targets with the most regressions, and a
 * link to all of them in the failure table. A point with several labels counts under each, as
 * the table's diagnosis filter matches any label, so each count is what its link shows. Plain
 * text lines and the same content in HTML, in rows of at most two cells (a phone reads them).
 */
export function regressionSummary(input: {
  runId: string;
  appUrl: string;
  total: number;
  byClass: ClassCounts;
  /** Regressions under each label kind (mark-regressions.ts counts them as the table filters). */
  byKind: Partial<Record<DiagnosisKind, number>>;
  /** Targets by number of regressions, most first (at least MOST_AFFECTED_SHOWN when there are that many). */
  targets: { name: string; count: number }[];
}): { text: string[]; html: string } {
  const link = (kind?: DiagnosisKind) =>
    `${input.appUrl}${failuresPath({ run: input.runId, status: 'new', diagnosis: kind })}`;
  const classes = DIAGNOSIS_CLASSES.map((cls) => ({
    cls,
    kinds: DIAGNOSIS_KINDS.filter((k) => diagnosisClass(k) === cls && (input.byKind[k] ?? 0) > 0),
  }));
  const shown = input.targets.slice(0, MOST_AFFECTED_SHOWN);
  const others = input.targets.length - shown.length;
  const affected = `${input.targets.length > 1 ? 'Most affected' : 'Affected'}: ${shown
    .map((t) => `${t.name} (${t.count})`)
    .join(', ')}${others > 0 ? ` and ${others} more ${others === 1 ? 'target' : 'targets'}` : ''}.`;
  const all = `All ${input.total} in the failure table`;
  const text = [
    'Summary by kind (a point with several labels counts under each):',
    ...classes.flatMap(({ cls, kinds }) => [
      `  ${CLASS_TITLE[cls]}: ${input.byClass[cls]}`,
      ...kinds.map((k) => `    ${DIAGNOSIS_KIND_NAMES[k].name}: ${input.byKind[k]}   ${link(k)}`),
    ]),
    ...(input.targets.length > 0 ? [affected] : []),
    `${all}: ${link()}`,
  ];
  const row = (label: string, value: string, indent: boolean) =>
    `<tr><th align="left" style="font-weight: ${indent ? 'normal; padding-left: 1.5em' : 'bold'}">${label}</th><td align="right">${value}</td></tr>`;
  const html = `<h2 style="font-size: 1.1em">Summary</h2>
<table cellpadding="4" style="border-collapse: collapse; max-width: 480px" aria-label="Regressions by kind">
<tbody>
${classes
  .flatMap(({ cls, kinds }) => [
    row(escapeHtml(CLASS_TITLE[cls]), String(input.byClass[cls]), false),
    ...kinds.map((k) =>
      row(
        `<a href="${escapeHtml(link(k))}">${escapeHtml(DIAGNOSIS_KIND_NAMES[k].name)}</a>`,
        String(input.byKind[k]),
        true,
      ),
    ),
  ])
  .join('\n')}
</tbody></table>
<p><small>A point with several labels counts under each.</small></p>
${input.targets.length > 0 ? `<p>${escapeHtml(affected)}</p>\n` : ''}<p><a href="${escapeHtml(link())}">${escapeHtml(all)}</a></p>`;
  return { text, html };
}
