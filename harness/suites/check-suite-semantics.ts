import { parseSubject } from '../expressions/parse-subject';
import { SubjectError } from '../expressions/subject-error';
import { CutLayout } from '../reference/continuation/cut-layout';
import { FactoredFunction } from '../reference/continuation/factored-function';
import { LayoutError } from '../reference/continuation/layout-error';
import { parseNumber } from '../reference/numbers/parse-number';
import type { Rational } from '../reference/numbers/rational';
import type { Suite } from '../../shared/schemas/suite-schema';
import type { SuiteIssue } from '../../shared/suite-issue';

/**
 * What the schema cannot see: the subject (and g, and each counterpart's subject) must parse
 * under the subject whitelist,
 * and a regular branch's cut layout must be valid for g and ν — every branch point on a cut,
 * every cut-free loop with monodromy 1. Returns the problems in the shared issue form,
 * naming the suite, the field and the rule (e.g. the uncut branch point or the failing loop).
 */
export function checkSuiteSemantics(
  suite: Pick<Suite, 'id' | 'subject' | 'branch'> & Partial<Pick<Suite, 'counterparts'>>,
): SuiteIssue[] {
  const issues: SuiteIssue[] = [];
  const say = (field: string, rule: string) => issues.push({ suite: suite.id, field, rule });
  const subjects: [string, string][] = [['subject', suite.subject]];
  (suite.counterparts ?? []).forEach((c, i) => {
    if (c.subject !== undefined) subjects.push([`counterparts.${i}.subject`, c.subject]);
  });
  for (const [field, text] of subjects) {
    try {
      parseSubject(text);
    } catch (e) {
      if (!(e instanceof SubjectError)) throw e;
      say(field, e.message);
    }
  }
  const branch = suite.branch;
  if (branch.kind !== 'regular') return issues;
  let g: FactoredFunction;
  try {
    g = FactoredFunction.fromSubject(parseSubject(branch.g));
  } catch (e) {
    if (!(e instanceof SubjectError || e instanceof RangeError)) throw e;
    say('branch.g', e.message);
    return issues;
  }
  const nu =
    typeof branch.nu === 'string'
      ? { re: exact(branch.nu), im: exact('0') }
      : { re: exact(branch.nu.re), im: exact(branch.nu.im) };
  if (!nu.re || !nu.im) {
    say('branch.nu', 'must be finite');
    return issues;
  }
  const toDouble = (text: string) => {
    const r = exact(text);
    return r ? Number(r.num) / Number(r.den) : NaN;
  };
  try {
    CutLayout.build(
      branch.cuts.map((c) => ({
        points: c.points.map((p) => [toDouble(p.re), toDouble(p.im)] as [number, number]),
        toInfinity: c.to_infinity,
      })),
      g.singularities(),
      { re: nu.re, im: nu.im },
    );
  } catch (e) {
    if (!(e instanceof LayoutError || e instanceof RangeError)) throw e;
    say('branch.cuts', e.message);
  }
  return issues;
}

function exact(text: string): Rational | null {
  const parsed = parseNumber(text);
  return parsed.kind === 'exact' ? parsed.value : null;
}
