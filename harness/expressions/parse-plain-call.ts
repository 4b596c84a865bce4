import { parseNumber } from '../reference/numbers/parse-number';
import type { Rational } from '../reference/numbers/rational';
import { ONE_ARGUMENT_FUNCTIONS } from './one-argument-functions';
import type { SubjectExpr } from './subject-expr';

/** An integer literal as mathjs reads one: no leading zeros, no exponent, no sign (a sign is an operator). */
const INTEGER = '(0|[1-9][0-9]{0,5})';
const CALL = new RegExp(`^ *([a-z]+) *\\( *z *\\) *$`);
const WITH_NUMBER = new RegExp(`^ *(pow|nthroot) *\\( *z *, *(-?) *${INTEGER}(?: */ *${INTEGER})? *\\) *$`);

const integer = (digits: string): Rational => {
  const parsed = parseNumber(digits);
  if (parsed.kind !== 'exact') throw new Error(`not an integer: ${digits}`);
  return parsed.value;
};

/**
 * The subject of most suites without mathjs: `z`, `f(z)` for a catalogue function of one
 * argument, `nthroot(z, ±k)` and `pow(z, ±p)` or `pow(z, ±p/q)` with integer literals and plain
 * spaces. Returns exactly what parseSubject's mathjs route returns for the same text
 * (tests/harness/expressions/parse-plain-call.test.ts holds that over every demo subject and
 * seeded texts), or null for anything else, which then goes to mathjs: an error is always
 * mathjs's route's, so its wording stays one. Loading mathjs was 0.6–0.7 s of the compiled CLI's
 * 0.8 s for one principal demo suite (docs/cli-package.md).
 */
export function parsePlainCall(text: string): SubjectExpr | null {
  if (/^ *z *$/.test(text)) return { kind: 'z' };
  const call = CALL.exec(text);
  if (call)
    return ONE_ARGUMENT_FUNCTIONS.has(call[1] as string)
      ? { kind: 'call', fn: call[1] as string, arg: { kind: 'z' } }
      : null;
  const m = WITH_NUMBER.exec(text);
  if (!m) return null;
  const [, fn, minus, p, q] = m as unknown as [string, string, string, string, string | undefined];
  const signed = minus ? integer(p).negate() : integer(p);
  if (fn === 'nthroot') {
    if (q !== undefined || signed.isZero() || signed.num > 1000n || signed.num < -1000n) return null;
    return { kind: 'nthroot', arg: { kind: 'z' }, n: Number(signed.num) };
  }
  if (q === undefined) return { kind: 'power', base: { kind: 'z' }, exponent: signed };
  const denominator = integer(q);
  return denominator.isZero() ? null : { kind: 'power', base: { kind: 'z' }, exponent: signed.div(denominator) };
}
