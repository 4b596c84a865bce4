import type { Convention } from '../../shared/schemas/convention-schema';
import { catalogue } from './catalogue';
import { Approximation } from './complex/approximation';
import { BigComplex } from './complex/big-complex';
import type { PowerExponent } from './complex/power-exponent';
import { applyConvention } from './functions/apply-convention';
import type { CatalogueFunction } from './functions/catalogue-function';
import { pow } from './functions/pow';
import type { ReciprocalFunction } from './functions/reciprocal-function';
import { BigFloat } from './numbers/big-float';
import { Rational } from './numbers/rational';

/** A request for one principal value. `w` is for pow, `n` for nthroot. */
export interface PrincipalRequest {
  fn: string;
  z: BigComplex;
  w?: PowerExponent;
  n?: number;
  convention: Convention;
}

/** What the caller needs settled: the correctly rounded double, and/or `digits` correct significant digits. */
export interface PrincipalNeeds {
  double: boolean;
  digits: number;
}

export interface PrincipalResult {
  approximation: Approximation;
  double: [number, number];
  /** False only if the precision cap was reached before the rounding was decided. */
  settled: boolean;
}

const MAX_BITS = 1 << 14;
const LOG2_10 = Math.log2(10);
/** Extra precision for the second evaluation of a reciprocal function. */
const RECIPROCAL_STEP = 40;

/**
 * The principal value of a catalogue function, with Ziv's strategy: evaluate with a
 * proven error bound at a modest precision (64 bits when only the double is wanted),
 * and double the precision only while the bound leaves the rounding of a part
 * undecided — i.e. the interval value ± bound holds two doubles (or both zero signs),
 * or fewer than `digits` digits are certain.
 *
 * The bounds come from each function's formula (no cancellation, exact polynomials,
 * kernels correct to 2^−bits relative). Reciprocal functions evaluate g(1/z) with 1/z
 * rounded, so their bound is instead the difference between two evaluations 40 bits
 * apart (a heuristic, as mpmath's own precision escalation is); DESIGN.md §4 asks for
 * no more than that there.
 */
export function principalValue(request: PrincipalRequest, needs: PrincipalNeeds): PrincipalResult {
  const wantBits = needs.digits > 0 ? Math.ceil(needs.digits * LOG2_10) + 4 : 0;
  let bits = Math.max(needs.double ? 64 : 0, wantBits + 8);
  for (;;) {
    const a = evaluateAt(request, bits);
    const settled =
      (!needs.double || (doubleDecided(a.re, a.reErr) && doubleDecided(a.im, a.imErr))) &&
      digitsDecided(a.re, a.reErr, wantBits) &&
      digitsDecided(a.im, a.imErr, wantBits);
    if (settled || bits >= MAX_BITS) {
      return { approximation: a, double: [a.re.toDouble(), a.im.toDouble()], settled };
    }
    bits *= 2;
  }
}

function evaluateAt(request: PrincipalRequest, bits: number): Approximation {
  const entry = catalogue[request.fn];
  if (!entry) throw new RangeError(`unknown function "${request.fn}"`);
  const { z, convention } = request;
  if (entry.kind === 'plain') return evaluatePlain(entry.fn, applyConvention(z, entry.fn.cuts, convention), bits);
  if (entry.kind === 'reciprocal') return evaluateReciprocal(entry.fn, z, convention, bits);
  const base = applyConvention(z, [{ axis: 'real', from: -Infinity, to: 0, ccwSide: 'upper' }], convention);
  return pow(base, exponentOf(request, convention), bits);
}

function exponentOf(request: PrincipalRequest, convention: Convention): PowerExponent {
  if (request.fn === 'cbrt') return { kind: 'rational', value: new Rational(1n, 3n) };
  if (request.fn === 'nthroot') {
    const n = request.n;
    if (n === undefined || !Number.isInteger(n) || n === 0) throw new RangeError('nthroot needs a non-zero integer "n"');
    return { kind: 'rational', value: new Rational(1n, BigInt(n)) };
  }
  if (!request.w) throw new RangeError('pow needs an exponent "w"');
  if (request.w.kind === 'complex' && convention === 'counter-clockwise') {
    return { kind: 'complex', value: applyConvention(request.w.value, [], convention) };
  }
  return request.w;
}

function evaluatePlain(fn: CatalogueFunction, z: BigComplex, bits: number): Approximation {
  return fn.special(z)?.toApproximation(bits) ?? fn.evaluate(z, bits);
}

function evaluateReciprocal(fn: ReciprocalFunction, z: BigComplex, convention: Convention, bits: number): Approximation {
  const base = applyConvention(z, [], convention);
  const at = (b: number) => evaluatePlain(fn.inner, applyConvention(base.reciprocal(b + 16), fn.inner.cuts, convention), b);
  const coarse = at(bits);
  const fine = at(bits + RECIPROCAL_STEP);
  return new Approximation(fine.re, fine.im, agreement(coarse.re, fine.re, fine.reErr), agreement(coarse.im, fine.im, fine.imErr));
}

/** Error bound from two evaluations: their difference (doubled), or the finer bound if they agree. */
function agreement(a: BigFloat, b: BigFloat, bErr: number): number {
  if (!a.isFinite() || !b.isFinite()) return Object.is(a.toDouble(), b.toDouble()) ? bErr : Infinity;
  if (a.isZero() && b.isZero()) return a.signbit() === b.signbit() ? bErr : Infinity;
  const d = a.sub(b);
  return Math.max(bErr, d.isZero() ? -Infinity : d.exponent() + 1);
}

function doubleDecided(c: BigFloat, err: number): boolean {
  if (err === -Infinity || !c.isFinite()) return true;
  if (err === Infinity) return false;
  const e = BigFloat.of(false, 1n, Math.ceil(err));
  return Object.is(c.sub(e).toDouble(), c.add(e).toDouble());
}

function digitsDecided(c: BigFloat, err: number, wantBits: number): boolean {
  if (wantBits === 0 || err === -Infinity || !c.isFinite()) return true;
  if (c.isZero() || err === Infinity) return false;
  return c.exponent() - err >= wantBits;
}
