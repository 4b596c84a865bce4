import { readFileSync } from 'node:fs';
import { formatHexDouble, parseDouble, parseSubject } from '../../harness';
import type { PropertyOutcome } from '../../shared/property-outcome';
import type { RunResult } from '../../shared/run-result';
import { formatComplexText } from '../../shared/format-complex-text';
import type { WireComplex } from '../../shared/wire-complex';
import { callOf } from '../verdict-audit/call-of';
import { independentValues } from '../verdict-audit/independent-values';
import type { AuditPoint } from '../verdict-audit/independent-verdict';

type Pair = [number, number];
type Failed = Extract<PropertyOutcome, { kind: 'failed' }>;

const pair = (w: WireComplex): Pair => [parseDouble(w.re), parseDouble(w.im)];
const conj = ([x, y]: Pair): Pair => [x, -y];
/** Sign-exact text ("-0 - 0i"), as every output writes a value. */
const text = ([x, y]: Pair): string => formatComplexText({ re: signed(x), im: signed(y) }, { ascii: true });
const signed = (x: number): string => (Object.is(x, -0) ? '-0' : String(x));
const neg = ([x, y]: Pair): Pair => [-x, -y];

/**
 * Which of a law's named values are the subject f at a point, and how to read f there: the value
 * as named (f(conj z)), or mapped back (conj f(z) is conj of f at z). Other names (f(z)^2, g(z),
 * exp(log z), the expected side of the unwinding law) are not values of f.
 */
function subjectValues(o: Failed): { at: Pair; value: Pair; name: string }[] {
  const [z1, z2] = o.counterexample.map(pair) as [Pair, Pair | undefined];
  const named = new Map(o.values.map((v) => [v.name, pair(v.value)]));
  const product = named.get('z1*z2');
  const rules: [string, Pair | undefined, (v: Pair) => Pair][] = [
    ['f(z)', z1, (v) => v],
    ['f(conj z)', conj(z1), (v) => v],
    ['conj f(z)', z1, conj],
    ['f(-z)', neg(z1), (v) => v],
    ['-f(z)', z1, neg],
    ['log z', z1, (v) => v],
    ['log z1', z1, (v) => v],
    ['log z2', z2, (v) => v],
    ['log(z1*z2)', product, (v) => v],
  ];
  return rules.flatMap(([name, at, read]) => {
    const v = named.get(name);
    return v && at ? [{ at, value: read(v), name }] : [];
  });
}

/**
 * Recomputes every failed property check of a run's JSON with mpmath alone: each library value
 * of the subject that the law used is set beside mpmath's (scripts/verdict-audit/independent_values.py:
 * Debian's python3-mpmath, one-sided limits where a zero part names a side, Kahan's side under
 * counter-clockwise), with the library's normwise relative error in units of 2^−52. A failure
 * whose library values all agree with mpmath would be a false alarm of the law.
 *
 *   node --import tsx scripts/property-recheck/recheck-property-failures.ts RUN.json
 */
function main(): void {
  const file = process.argv[2];
  if (!file) throw new Error('usage: recheck-property-failures.ts RUN.json');
  const run = JSON.parse(readFileSync(file, 'utf8')) as RunResult;
  const rows: { heading: string; name: string; at: Pair; value: Pair; point: AuditPoint | null }[] = [];
  for (const r of run.results) {
    const call = callOf(parseSubject(r.suite.subject));
    const convention = r.checked.convention as AuditPoint['convention'];
    for (const o of r.properties ?? []) {
      if (o.kind !== 'failed') continue;
      const heading = `${r.suite.id} ${o.law}: ${o.reason}\n  counterexample ${o.counterexample.map((z) => formatComplexText(z, { ascii: true })).join(', ')}`;
      for (const v of subjectValues(o))
        rows.push({
          heading,
          ...v,
          point: call && {
            ...call,
            convention,
            z: [formatHexDouble(v.at[0]), formatHexDouble(v.at[1])],
          },
        });
    }
  }
  const asked = rows.flatMap((row) => (row.point ? [row.point] : []));
  const answers = independentValues(asked);
  let k = 0;
  const verdicts = new Map<string, { lines: string[]; recomputed: boolean; real: boolean }>();
  for (const row of rows) {
    const answer = row.point ? answers[k++]! : { unchecked: 'the subject is not one call of z' };
    const mpmath: Pair | null = 'unchecked' in answer ? null : [parseDouble(answer.re), parseDouble(answer.im)];
    const wrong = mpmath ? howWrong(row.value, mpmath, row.point?.convention === 'signed-zero') : null;
    const entry = verdicts.get(row.heading) ?? { lines: [], recomputed: false, real: false };
    entry.lines.push(
      `    ${row.name} at ${text(row.at)}: library ${text(row.value)}; mpmath ${mpmath ? text(mpmath) : `none (${'unchecked' in answer ? answer.unchecked : ''})`}${wrong ? ` — ${wrong.text}` : ''}`,
    );
    entry.recomputed ||= mpmath !== null;
    entry.real ||= wrong?.real ?? false;
    verdicts.set(row.heading, entry);
  }
  for (const [heading, { lines, recomputed, real }] of verdicts) {
    const verdict = !recomputed
      ? 'not recomputed: mpmath has no value at these points'
      : real
        ? `confirmed: a library value is more than ${REAL_EPS} eps from mpmath, not finite where it is, or has the other zero sign`
        : `NOT CONFIRMED: every library value is within ${REAL_EPS} eps of mpmath`;
    console.log(`${heading}\n${lines.join('\n')}\n  ${verdict}`);
  }
}

/** The demo's t in units of 2^−52: a value further than this from mpmath confirms a failure. */
const REAL_EPS = 16;

/** How far the library's value is from mpmath's, and whether that is beyond REAL_EPS (or a zero sign under signed-zero, or a non-finite part). */
function howWrong(value: Pair, mpmath: Pair, zeroSigns: boolean): { text: string; real: boolean } {
  if (![...value, ...mpmath].every(Number.isFinite)) {
    const same = value.every((x, i) => Object.is(x, mpmath[i]));
    return { text: same ? 'the same' : 'not finite where mpmath is, or the other way', real: !same };
  }
  const signs = [0, 1].filter((i) => value[i] === 0 && mpmath[i] === 0 && !Object.is(value[i], mpmath[i]));
  if (zeroSigns && signs.length > 0)
    return { text: `the zero sign of ${signs.map((i) => (i ? 'im' : 're')).join(' and ')} differs`, real: true };
  const eps = Math.hypot(value[0] - mpmath[0], value[1] - mpmath[1]) / (Math.hypot(...mpmath) || 1) / 2 ** -52;
  return { text: `normwise error ${eps.toPrecision(3)} eps`, real: eps > REAL_EPS };
}

main();
