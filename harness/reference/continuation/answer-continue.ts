import { continueRequest, type ContinueRequest } from '../../../shared/schemas/continue-request';
import { parseSubject } from '../../expressions/parse-subject';
import { SubjectError } from '../../expressions/subject-error';
import type { BigComplex } from '../complex/big-complex';
import { Rational } from '../numbers/rational';
import { describeRequestError } from '../describe-request-error';
import type { ExactPoint } from './continuation-path';
import type { ContinuationRequest } from './continuation-request';
import { continueRegularBranch } from './continue-regular-branch';
import { exactTurns } from '../../paths/exact-turns';
import type { ExactAngle } from './exact-angle';
import { FactoredFunction } from './factored-function';
import { parseExact } from './parse-exact';
import type { WireComplex } from '../../../shared/wire-complex';

const DIGITS = 40;

/**
 * The answer to one `continue` request line (docs/suite-format.md for the numbers, and
 * docs/regular-branches.md): the regular branch of g(z)^ν fixed by f0 at z0 (or by k,
 * f0 = principal·e^{2πiνk}), at each requested t of the path, and the monodromy factor of a
 * closed path; with `cuts`, the values of the branch on that cut plane. Every number here is
 * exact: "0.1" is one tenth, "1/3" a third. This is only the JSON skin of the CLI: the request is
 * read into a ContinuationRequest, answered by continueRegularBranch, and its values written with
 * 40 significant digits.
 */
export function answerContinue(input: unknown): Record<string, unknown> {
  const parsed = continueRequest.safeParse(input);
  if (!parsed.success) return describeRequestError(parsed.error);
  const req = parsed.data;
  let request: ContinuationRequest;
  try {
    request = toRequest(req);
  } catch (e) {
    if (e instanceof SubjectError || e instanceof RangeError) return { error: e.message };
    throw e;
  }
  const result = continueRegularBranch(request);
  if (result.kind === 'refused') return { error: result.reason };
  const show = (c: BigComplex) => ({ re: c.re.toDecimal(DIGITS), im: c.im.toDecimal(DIGITS) });
  return {
    values: result.values.map((v, i) => ({ t: req.at[i] as string, z: show(v.z), f: show(v.f) })),
    monodromy: result.monodromy ? show(result.monodromy) : null,
  };
}

/** A start angle as in a suite's circle: an exact multiple of π in turns, else radians. */
function startAngle(text: string): ExactAngle {
  const turns = exactTurns(text, 'path.start_angle');
  return turns ? { kind: 'turns', turns } : { kind: 'radians', radians: parseExact(text, 'path.start_angle') };
}

/**
 * The circle's turns exactly as written: a string through the exact parser, a JSON number through
 * its shortest decimal text (0.1 is one tenth of a turn, not the double nearest it).
 */
function circleTurns(written: number | string): Rational {
  const turns = parseExact(typeof written === 'number' ? String(written) : written, 'path.turns');
  const size = turns.compare(Rational.ZERO) < 0 ? turns.negate() : turns;
  if (turns.isZero() || size.compare(new Rational(64n)) > 0) {
    throw new RangeError('path.turns must be non-zero and at most 64');
  }
  return turns;
}

/** The JSON request read exactly into the typed request; a number that is not finite is refused naming its field. */
function toRequest(req: ContinueRequest): ContinuationRequest {
  const point = (c: WireComplex, name: string): ExactPoint => [
    parseExact(c.re, `${name}.re`),
    parseExact(c.im, `${name}.im`),
  ];
  const g = FactoredFunction.fromSubject(parseSubject(req.g));
  const nu =
    typeof req.nu === 'string'
      ? { re: parseExact(req.nu, 'nu'), im: Rational.ZERO }
      : { re: parseExact(req.nu.re, 'nu.re'), im: parseExact(req.nu.im, 'nu.im') };
  return {
    g,
    nu,
    z0: point(req.z0, 'z0'),
    start: req.f0 ? { kind: 'value', f0: point(req.f0, 'f0') } : { kind: 'sheet', k: req.k as number },
    path:
      req.path.kind === 'circle'
        ? {
            kind: 'circle',
            center: point(req.path.center, 'path.center'),
            radius: parseExact(req.path.radius, 'path.radius'),
            startAngle: startAngle(req.path.start_angle),
            turns: circleTurns(req.path.turns),
            ccw: req.path.direction === 'ccw',
          }
        : { kind: 'polyline', points: req.path.points.map((p, i) => point(p, `path.points.${i}`)) },
    at: req.at.map((t, i) => parseExact(t, `at.${i}`)),
    cuts: req.cuts
      ? req.cuts.map((c) => ({
          points: c.points.map((p, i) => point(p, `cuts.points.${i}`)),
          toInfinity: c.to_infinity,
        }))
      : null,
  };
}
