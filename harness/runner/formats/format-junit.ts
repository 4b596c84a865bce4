import { outcomeClass } from '../../../shared/outcome-class';
import type { PathResult, PointFinding, RunResult, SuiteTargetResult } from '../../../shared/run-result';
import type { WireComplex } from '../../../shared/wire-complex';
import { describeCounts } from './describe-counts';
import { describeLabelCounts } from './describe-label-counts';
import { describeOutcome } from './describe-outcome';
import { describeSteps } from '../../../shared/describe-steps';
import { formatComplexText } from '../../../shared/format-complex-text';
import { propertyFailureLines } from '../../../shared/property-failure-lines';

// XML 1.0 allows tab, LF, CR and the ranges below; anything else (other control characters) is dropped.
const INVALID_XML = /[^\t\n\r\u0020-\uD7FF\uE000-\uFFFD\u{10000}-\u{10FFFF}]/gu;
const text = (s: string): string =>
  s.replace(INVALID_XML, '').replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;');
const attr = (s: string | number): string =>
  text(String(s))
    .replace(/"/g, '&quot;')
    .replace(/'/g, '&apos;')
    .replace(/\n/g, '&#10;')
    .replace(/\r/g, '&#13;')
    .replace(/\t/g, '&#9;');
const c = (w: WireComplex | null): string => formatComplexText(w, { ascii: true });
const seconds = (ms: number) => (ms / 1000).toFixed(3);

function findingText(f: PointFinding): string {
  const lines = [
    `point ${f.index} (t = ${f.t}${f.label ? `, ${f.label}` : ''}): ${outcomeClass(f.outcome) ? `[${outcomeClass(f.outcome)}] ` : ''}${describeOutcome(f.outcome)}`,
    `  z        = ${c(f.z)}   [${f.zHex.re}, ${f.zHex.im}]`,
    `  expected = ${c(f.expected)}`,
    `  actual   = ${c(f.actual)}`,
  ];
  if (f.limits)
    lines.push(
      `  limits   : ${f.limits.sides[0]} ${c(f.limits.values[0])}; ${f.limits.sides[1]} ${c(f.limits.values[1])}`,
    );
  const steps = describeSteps(f, { ascii: true });
  if (steps) lines.push(`  ${steps}`);
  if (f.rule) lines.push(`  rule     : ${f.rule}`);
  if (f.choice) lines.push(`  choice   : ${f.choice}`);
  lines.push('  reproducer:', ...f.reproducer.split('\n').map((l) => `    ${l}`));
  return lines.join('\n');
}

function testcase(r: SuiteTargetResult, p: PathResult): string {
  const classname = `${r.suite.id}@${r.suite.version}.${r.target.name}`;
  const name = `${p.name} (${p.kind}, ${p.points} points)`;
  const open = `    <testcase classname="${attr(classname)}" name="${attr(name)}" time="0">`;
  const mono =
    p.monodromy && !p.monodromy.pass
      ? `monodromy: expected ${c(p.monodromy.expected)}, library ${c(p.monodromy.library)}${p.monodromy.note ? ` (${p.monodromy.note})` : ''}`
      : '';
  const diag = describeLabelCounts(p.byDiagnosis);
  if (p.error || p.counts.error > 0) {
    const body = [p.error ?? '', ...p.findings.filter((f) => f.outcome.kind === 'error').map(findingText)]
      .filter(Boolean)
      .join('\n\n');
    return `${open}\n      <error message="${attr(`${p.counts.error} of ${p.points} points could not be evaluated${p.error ? `: ${p.error}` : ''}`)}" type="error">${text(body)}</error>\n    </testcase>`;
  }
  if (p.counts.fail > 0 || mono) {
    const body = [
      mono,
      ...p.findings.map(findingText),
      p.findingsOmitted ? `… and ${p.findingsOmitted} more failing points (see the JSON output)` : '',
    ]
      .filter(Boolean)
      .join('\n\n');
    // A CI reader tells the two apart by the type: "branch" when any point is on the wrong
    // branch (or the monodromy is wrong), "accuracy" when every failure is on the right branch.
    const type = p.byClass.branch > 0 || mono ? 'branch' : 'accuracy';
    const failed = `${p.counts.fail} of ${p.points} points failed (${p.byClass.branch} branch, ${p.byClass.accuracy} accuracy)`;
    return `${open}\n      <failure message="${attr(`${failed}${diag ? `: ${diag}` : ''}${mono ? `; ${mono}` : ''}`)}" type="${type}">${text(body)}</failure>\n    </testcase>`;
  }
  if (p.counts.pass === 0 && p.counts.skipped + (p.counts.notApplicable ?? 0) > 0) {
    const why = [
      ...p.skipped.map((s) => `${s.count} skipped: ${s.reason}`),
      ...(p.notApplicable ?? []).map((s) => `${s.count} not applicable: ${s.reason}`),
    ];
    return `${open}\n      <skipped message="${attr(why.join('; '))}"/>\n    </testcase>`;
  }
  return `${open}</testcase>`;
}

function propertyCases(r: SuiteTargetResult): string[] {
  return (r.properties ?? []).map((o) => {
    const open = `    <testcase classname="${attr(`${r.suite.id}@${r.suite.version}.${r.target.name}.properties`)}" name="${attr(`${o.title} (seed ${o.seed})`)}" time="0">`;
    if (o.kind === 'failed')
      return `${open}\n      <failure message="${attr(o.reason)}" type="property">${text([o.title, o.reason, ...propertyFailureLines(o, { ascii: true })].join('\n'))}</failure>\n    </testcase>`;
    if (o.kind === 'not-checked') return `${open}\n      <skipped message="${attr(o.reason)}"/>\n    </testcase>`;
    return `${open}</testcase>`;
  });
}

/**
 * The run as JUnit XML for CI: one <testsuite> per suite × target (its properties say what was
 * checked, under which convention, and that a pass is not a certification), one <testcase> per
 * path (and per property check when they ran), failing paths listing each failing point with its
 * class and every label, exact input bits, limits, rule and reproducer, branch findings first
 * (listFindings orders them). A failing path's type is "branch" or "accuracy". Text is escaped and characters XML
 * cannot hold are dropped, so the document is well-formed whatever a library printed.
 */
export function formatJunit(result: RunResult): string {
  const suites = result.results.map((r) => {
    const cases = [...r.paths.map((p) => testcase(r, p)), ...propertyCases(r)];
    const failures =
      r.paths.filter(
        (p) => !(p.error || p.counts.error > 0) && (p.counts.fail > 0 || (p.monodromy && !p.monodromy.pass)),
      ).length + (r.properties ?? []).filter((o) => o.kind === 'failed').length;
    const errors = r.paths.filter((p) => p.error || p.counts.error > 0).length;
    const skipped =
      r.paths.filter(
        (p) =>
          !(p.error || p.counts.error > 0) &&
          p.counts.fail === 0 &&
          p.counts.pass === 0 &&
          p.counts.skipped + (p.counts.notApplicable ?? 0) > 0,
      ).length + (r.properties ?? []).filter((o) => o.kind === 'not-checked').length;
    const props = [
      ['suite', r.suite.id],
      ['suite.version', r.suite.version],
      ['suite.title', r.suite.title],
      ['subject', r.suite.subject],
      ['target', r.target.name],
      ['target.settings', JSON.stringify(r.target.settings)],
      ['convention', r.checked.convention],
      ['branch', r.checked.branch],
      ['tolerance', r.checked.tolerance],
      ['entry', r.checked.entry ?? 'the target’s default'],
      [
        'checked',
        `${r.checked.paths} path(s), ${r.checked.points} point(s): ${describeCounts(r.counts, r.byClass, r.byDiagnosis, ', ')}`,
      ],
      [
        'properties',
        r.checked.properties.listed.length
          ? `${r.checked.properties.listed.join(', ')} (${r.checked.properties.note})`
          : 'none listed',
      ],
      ['status', r.status],
      ['disclaimer', result.disclaimer],
    ].map(([k, v]) => `      <property name="${attr(k as string)}" value="${attr(v as string | number)}"/>`);
    const errorsText = r.errors.length ? `\n    <system-err>${text(r.errors.join('\n'))}</system-err>` : '';
    return [
      `  <testsuite name="${attr(`${r.suite.id}@${r.suite.version} × ${r.target.name}`)}" tests="${cases.length}" failures="${failures}" errors="${errors}" skipped="${skipped}" time="${seconds(r.durationMs)}" timestamp="${attr(result.startedAt.replace(/\.\d+Z$/, ''))}">`,
      '    <properties>',
      ...props,
      '    </properties>',
      ...cases,
      `    <system-out>${text(`${r.checked.branch}; ${result.disclaimer}`)}</system-out>${errorsText}`,
      '  </testsuite>',
    ].join('\n');
  });
  const totals = result.results.reduce(
    (acc, r) => {
      const tests = r.paths.length + (r.properties ?? []).length;
      const failures =
        r.paths.filter(
          (p) => !(p.error || p.counts.error > 0) && (p.counts.fail > 0 || (p.monodromy && !p.monodromy.pass)),
        ).length + (r.properties ?? []).filter((o) => o.kind === 'failed').length;
      const errors = r.paths.filter((p) => p.error || p.counts.error > 0).length;
      return {
        tests: acc.tests + tests,
        failures: acc.failures + failures,
        errors: acc.errors + errors,
        time: acc.time + r.durationMs,
      };
    },
    { tests: 0, failures: 0, errors: 0, time: 0 },
  );
  return [
    '<?xml version="1.0" encoding="UTF-8"?>',
    `<testsuites name="sheetkeeper" tests="${totals.tests}" failures="${totals.failures}" errors="${totals.errors}" time="${seconds(totals.time)}">`,
    ...suites,
    '</testsuites>',
    '',
  ].join('\n');
}
