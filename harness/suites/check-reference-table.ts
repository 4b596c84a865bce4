import { parse } from 'csv-parse/sync';
import type { ReferenceTableCheck } from '../../shared/reference-table-check';
import type { Suite } from '../../shared/schemas/suite-schema';
import { evaluateSubject } from '../expressions/evaluate-subject';
import { parseSubject } from '../expressions/parse-subject';
import { SubjectError } from '../expressions/subject-error';
import { BigComplex } from '../reference/complex/big-complex';
import { continueRegularBranch } from '../reference/continuation/continue-regular-branch';
import { wireDouble } from '../runner/evaluation/wire-double';
import { Rational } from '../reference/numbers/rational';
import { parseDouble } from '../reference/numbers/parse-double';
import { ulpDistance } from '../reference/numbers/ulp-distance';
import { branchContinuation } from '../runner/expectations/branch-continuation';

/** Uploaded tables are for spot checks: 5,000 rows take ~2 s here. */
export const MAX_REFERENCE_ROWS = 5000;
const COLUMNS = ['z_re', 'z_im', 'expected_re', 'expected_im', 'source'];

/**
 * Checks a CSV of reference values computed elsewhere (`z_re, z_im, expected_re, expected_im,
 * source`; numbers as decimals, C hex floats, "-0", "inf", "nan") against our reference for the
 * suite: the subject's principal value under the suite's convention, or the suite's regular
 * branch continued from z0 along a straight path with the suite's cuts. Values agree when each
 * part is within 1 ulp and zero signs match.
 */
export function checkReferenceTable(suite: Suite, csv: string): ReferenceTableCheck {
  let records: Record<string, string>[];
  try {
    records = parse(csv, { columns: true, skip_empty_lines: true, trim: true, bom: true }) as Record<string, string>[];
  } catch (e) {
    return {
      rows: 0,
      agree: 0,
      disagreements: [],
      invalid: [{ line: 1, reason: `not CSV: ${e instanceof Error ? e.message : String(e)}` }],
    };
  }
  const header = records[0] ? Object.keys(records[0]) : [];
  const missing = COLUMNS.filter((c) => c !== 'source' && !header.includes(c));
  if (records.length > 0 && missing.length > 0)
    return {
      rows: records.length,
      agree: 0,
      disagreements: [],
      invalid: [{ line: 1, reason: `missing columns: ${missing.join(', ')}` }],
    };
  if (records.length > MAX_REFERENCE_ROWS)
    return {
      rows: records.length,
      agree: 0,
      disagreements: [],
      invalid: [{ line: 1, reason: `more than ${MAX_REFERENCE_ROWS} rows` }],
    };
  const subject = suite.branch.kind === 'principal' ? parseSubject(suite.subject) : null;
  const regular = suite.branch.kind === 'regular' ? regularContinuation(suite.branch) : null;
  const result: ReferenceTableCheck = { rows: records.length, agree: 0, disagreements: [], invalid: [] };
  records.forEach((row, i) => {
    const line = i + 2;
    let z: [number, number];
    let theirs: [number, number];
    try {
      z = [parseDouble(row.z_re ?? ''), parseDouble(row.z_im ?? '')];
      theirs = [parseDouble(row.expected_re ?? ''), parseDouble(row.expected_im ?? '')];
    } catch (e) {
      result.invalid.push({ line, reason: e instanceof Error ? e.message : String(e) });
      return;
    }
    let ours: [number, number];
    if (subject) {
      ours = evaluateSubject(subject, BigComplex.fromDoubles(z[0], z[1]), suite.convention, {
        double: true,
        digits: 0,
      }).double;
    } else if (regular) {
      if (regular instanceof Error) {
        result.invalid.push({ line, reason: regular.message });
        return;
      }
      if (!z.every(Number.isFinite)) {
        result.invalid.push({ line, reason: 'z must be finite' });
        return;
      }
      const answer = continueRegularBranch({
        ...regular,
        path: { kind: 'polyline', points: [regular.z0, [Rational.fromDouble(z[0]), Rational.fromDouble(z[1])]] },
        at: [Rational.ONE],
      });
      if (answer.kind === 'refused') {
        result.invalid.push({ line, reason: answer.reason });
        return;
      }
      const f = (answer.values[0] as (typeof answer.values)[number]).f;
      ours = [f.re.toDouble(), f.im.toDouble()];
    } else {
      return;
    }
    const ulps = Math.max(ulpDistance(theirs[0], ours[0]), ulpDistance(theirs[1], ours[1]));
    const zeroSigns = theirs.every((x, p) => x !== 0 || ours[p] !== 0 || Object.is(x, -0) === Object.is(ours[p], -0));
    if (ulps <= 1 && zeroSigns) result.agree += 1;
    else {
      result.disagreements.push({
        line,
        z: wireDouble(z),
        theirs: wireDouble(theirs),
        ours: wireDouble(ours),
        ulps,
        source: row.source ?? '',
      });
    }
  });
  return result;
}

/** The suite's branch read exactly for the continuation engine, or why it cannot be (then every row says so). */
function regularContinuation(branch: Extract<Suite['branch'], { kind: 'regular' }>) {
  try {
    return branchContinuation(branch);
  } catch (e) {
    if (e instanceof SubjectError || e instanceof RangeError) return e;
    throw e;
  }
}
