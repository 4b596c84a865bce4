import { describeWorstPart } from '../../shared/describe-worst-part';
import type { Diagnosis } from '../../shared/diagnosis';
import { formatUlps } from '../../shared/format-ulps';
import type { WireComplex } from '../../shared/wire-complex';
import type { NewMail } from '../mail/new-mail';
import type { RegressionRow } from './regression-row';
import { formatComplexText } from '../../shared/format-complex-text';

/** At most this many rows in one mail; the rest are counted and linked. */
const MAX_ROWS = 50;

const c = (v: WireComplex | null) => formatComplexText(v);
const escape = (s: string) =>
  s.replace(/[&<>"']/g, (ch) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[ch]!);
const describe = (d: Diagnosis | null): string => {
  if (!d) return 'error';
  switch (d.kind) {
    case 'other-sheet':
      return `other sheet (k = ${d.k})`;
    case 'zero-sign':
      return `ignored zero sign (${d.of} ${d.part})`;
    case 'inaccurate':
      return `inaccurate (${[`${formatUlps(d.ulps)} ulps`, describeWorstPart(d, 'long')].filter(Boolean).join(' ')}; relative error of the whole value ${d.relativeError.toPrecision(2)})`;
    case 'misplaced-cut':
      return 'misplaced cut';
    default:
      return d.kind;
  }
};

/**
 * The regression mail of a run: one row per regression with input bits, expected and actual
 * values, the diagnosis, the rule and a reproducer, and a link to each case; plain text and HTML
 * with the same content. It says what a regression is and that it covers only what was checked.
 * In HTML each regression is a block of label–value rows, two columns wide, so the mail reads on
 * a phone without scrolling sideways (eight columns side by side did not).
 */
export function regressionMail(input: {
  recipients: string[];
  planName: string;
  runId: string;
  appUrl: string;
  rows: RegressionRow[];
  total: number;
  versionChanges: { key: string; from: string; to: string }[];
  /** Keeps the same regressions from being mailed twice (mark-regressions.ts). */
  idempotencyKey?: string;
}): NewMail {
  const { rows, total } = input;
  const link = (id: string) => `${input.appUrl}/failures/${id}`;
  const subject = `[Sheetkeeper] ${total} regression${total === 1 ? '' : 's'} in ${input.planName}`;
  const lead = `${total} point${total === 1 ? '' : 's'} passed in the previous completed run of "${input.planName}" and fail now.`;
  const changes = input.versionChanges.map((v) => `${v.key}: ${v.from} → ${v.to}`);
  const scope =
    'A regression is judged only at the points, paths and conventions the suites check; points outside them were not looked at.';
  const shown = rows.slice(0, MAX_ROWS);
  const more = total - shown.length;
  const text = [
    lead,
    changes.length ? `Version changes since then: ${changes.join('; ')}.` : 'No library version changed since then.',
    '',
    ...shown.flatMap((r) => [
      `${r.suiteSlug} × ${r.targetName} — ${r.pathName}`,
      `  input     z = ${c(r.z)}   bits ${r.zHex.re}, ${r.zHex.im}`,
      `  expected  ${c(r.expected)}`,
      `  actual    ${c(r.actual)}`,
      `  diagnosis ${describe(r.diagnosis)}`,
      `  rule      ${r.rule}`,
      `  reproduce ${r.reproducer.split('\n').join('\n            ')}`,
      `  case      ${link(r.id)}`,
      '',
    ]),
    more > 0 ? `…and ${more} more: ${input.appUrl}/runs/${input.runId}` : '',
    scope,
  ].join('\n');
  const html = `<!doctype html><html><body style="font-family: sans-serif">
<p>${escape(lead)}</p>
<p>${escape(changes.length ? `Version changes since then: ${changes.join('; ')}.` : 'No library version changed since then.')}</p>
<table cellpadding="6" style="border-collapse: collapse; width: 100%; max-width: 720px" border="1">
<tbody>
${shown
  .map((r) => {
    const line = (label: string, value: string) =>
      `<tr><th align="left" valign="top" style="width: 6.5em; font-weight: normal; color: #4D5A68">${label}</th><td style="word-break: break-word">${value}</td></tr>`;
    return [
      `<tr><th colspan="2" align="left" style="background: #F4F1EA">${escape(`${r.suiteSlug} × ${r.targetName}`)} — ${escape(r.pathName)}</th></tr>`,
      line('Input', `<code>z = ${escape(c(r.z))}</code><br><code>bits ${escape(`${r.zHex.re}, ${r.zHex.im}`)}</code>`),
      line('Expected', `<code>${escape(c(r.expected))}</code>`),
      line('Actual', `<code>${escape(c(r.actual))}</code>`),
      line('Diagnosis', escape(describe(r.diagnosis))),
      line('Rule', escape(r.rule)),
      line(
        'Reproducer',
        `<pre style="white-space: pre-wrap; word-break: break-all; margin: 0">${escape(r.reproducer)}</pre>`,
      ),
      line('Case', `<a href="${escape(link(r.id))}">open the case</a>`),
    ].join('\n');
  })
  .join('\n')}
</tbody></table>
${more > 0 ? `<p>…and ${more} more: <a href="${escape(`${input.appUrl}/runs/${input.runId}`)}">the whole run</a></p>` : ''}
<p><small>${escape(scope)}</small></p>
</body></html>`;
  return {
    kind: 'regression',
    recipients: input.recipients,
    subject,
    text,
    html,
    idempotencyKey: input.idempotencyKey,
  };
}
