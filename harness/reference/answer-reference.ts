import { referenceRequest } from '../../shared/schemas/reference-request';
import { BigComplex } from './complex/big-complex';
import { describeRequestError } from './describe-request-error';
import type { PowerExponent } from './complex/power-exponent';
import { formatDouble } from './numbers/format-double';
import { parseDouble } from './numbers/parse-double';
import { parseNumber } from './numbers/parse-number';
import { Rational } from './numbers/rational';
import { principalValue } from './principal-value';

const RATIO = /^\s*[+-]?\d+\/\d+\s*$/;
const DEFAULT_DIGITS = 40;

/**
 * The answer to one `reference` request (docs/suite-format.md): the principal value to 40
 * significant digits and the correctly rounded double, or `{error}` naming what is wrong.
 * z and a decimal w are library inputs, so they name the nearest binary64; a w written
 * "p/q" is that exact rational.
 */
export function answerReference(input: unknown): Record<string, unknown> {
  const parsed = referenceRequest.safeParse(input);
  if (!parsed.success) return describeRequestError(parsed.error);
  const req = parsed.data;
  try {
    const z = BigComplex.fromDoubles(parseDouble(req.z.re), parseDouble(req.z.im));
    let w: PowerExponent | undefined;
    if (typeof req.w === 'string') {
      w = RATIO.test(req.w)
        ? { kind: 'rational', value: exactRatio(req.w) }
        : { kind: 'complex', value: BigComplex.fromDoubles(parseDouble(req.w), 0) };
    } else if (req.w) {
      w = { kind: 'complex', value: BigComplex.fromDoubles(parseDouble(req.w.re), parseDouble(req.w.im)) };
    }
    if ((req.fn === 'pow') !== (w !== undefined))
      return { error: req.fn === 'pow' ? 'pow needs "w"' : `"w" is only for pow` };
    if ((req.fn === 'nthroot') !== (req.n !== undefined)) {
      return { error: req.fn === 'nthroot' ? 'nthroot needs "n"' : `"n" is only for nthroot` };
    }
    const digits = req.digits ?? DEFAULT_DIGITS;
    const r = principalValue(
      { fn: req.fn, z, w, n: req.n === undefined ? undefined : Number(req.n), convention: req.convention },
      { double: true, digits },
    );
    const answer: Record<string, unknown> = {
      value: { re: r.approximation.re.toDecimal(digits), im: r.approximation.im.toDecimal(digits) },
      double: { re: formatDouble(r.double[0]), im: formatDouble(r.double[1]) },
    };
    if (!r.settled) answer.warning = 'precision cap reached before the rounding was decided';
    return answer;
  } catch (e) {
    return { error: e instanceof Error ? e.message : String(e) };
  }
}

function exactRatio(text: string): Rational {
  const p = parseNumber(text);
  if (p.kind !== 'exact') throw new RangeError(`"${text}" is not a ratio`);
  return p.value;
}
