import type { Convention } from '../../shared/schemas/convention-schema';
import { catalogueEntry } from '../catalogue/catalogue-entry';
import { Approximation } from './complex/approximation';
import { BigComplex } from './complex/big-complex';
import type { PowerExponent } from './complex/power-exponent';
import { applyConvention } from './functions/apply-convention';
import type { CatalogueFunction } from './functions/catalogue-function';
import { pow } from './functions/pow';
import type { ReciprocalFunction } from './functions/reciprocal-function';
import { BigFloat } from './numbers/big-float';

/** A request for one principal value. `w` is for pow, `n` for nthroot. */
export interface PrincipalRequest {
  fn: string;
  z: BigComplex;
  w?: PowerExponent;
  n?: number;
  convention: Convention;
}

/** Extra bits for 1/z, so that rounding it costs little of the reciprocal function's budget. */
const RECIPROCAL_GUARD = 16;
/** Doubles' parts are at most 2,098 binary orders apart (2^1024 and 2^−1074). */
const MAX_SPREAD = 2200;

/**
 * One evaluation of a catalogue function at a working precision, with its error bound:
 * the convention applied to the input, Annex G special values, else the function's formula.
 * Reciprocal functions evaluate g(1/z) with 1/z rounded; their bound adds what that rounding can
 * cost, from a bound on |g′| near 1/z (see {@link reciprocalError}).
 */
export function evaluateFunction(request: PrincipalRequest, bits: number): Approximation {
  const entry = catalogueEntry(request.fn)?.reference;
  if (!entry) throw new RangeError(`unknown function "${request.fn}"`);
  const { z, convention } = request;
  if (entry.kind === 'plain') return evaluatePlain(entry.fn, applyConvention(z, entry.fn.cuts, convention), bits);
  if (entry.kind === 'reciprocal') return evaluateReciprocal(entry.fn, z, convention, bits);
  const base = applyConvention(z, entry.cuts, convention);
  return pow(base, withConvention(entry.exponent(request), convention), bits);
}

/** Under counter-clockwise, a complex exponent's zero parts count as +0, as z's do. */
function withConvention(w: PowerExponent, convention: Convention): PowerExponent {
  if (w.kind === 'complex' && convention === 'counter-clockwise') {
    return { kind: 'complex', value: applyConvention(w.value, [], convention) };
  }
  return w;
}

function evaluatePlain(fn: CatalogueFunction, z: BigComplex, bits: number): Approximation {
  return fn.special(z)?.toApproximation(bits) ?? fn.evaluate(z, bits);
}

function evaluateReciprocal(
  fn: ReciprocalFunction,
  z: BigComplex,
  convention: Convention,
  bits: number,
): Approximation {
  const base = applyConvention(z, [], convention);
  const rounding = bits + RECIPROCAL_GUARD + partSpread(base);
  const w = applyConvention(base.reciprocal(rounding), fn.inner.cuts, convention);
  const a = evaluatePlain(fn.inner, w, bits);
  if (!base.isFinite() || base.isZero() || isExactReciprocal(base, w)) return a;
  const extra = reciprocalError(w, rounding, fn.derivative);
  const widen = (err: number) => (err === -Infinity ? err : Math.max(err, extra) + 1);
  return new Approximation(a.re, a.im, widen(a.reErr), widen(a.imErr));
}

/**
 * How many more bits 1/z is rounded to when z's parts are far apart: the rounding's cost is
 * bounded absolutely (by the larger part), so a part of g(1/z) that much smaller needs that many
 * more bits. Rounding 1/z to them costs one division; reaching them by doubling the whole
 * evaluation built tables at five levels up to 2,368 bits for
 * acsch(−1.18e−114 + 7.44e225i) (67 ms on its first answer, 2 ms after). Capped: a binary-fraction
 * z may have parts further apart than any double's.
 */
function partSpread(z: BigComplex): number {
  if (!z.isFinite() || z.re.isZero() || z.im.isZero()) return 0;
  return Math.min(MAX_SPREAD, Math.abs(z.re.exponent() - z.im.exponent()));
}

/**
 * Whether w is exactly 1/z (z·w = 1, formed exactly): then g(w) is f(z) with no rounding to
 * account for. It is at z = ±2^k and ±i·2^k, among them the branch points ±1 and ±i of the
 * reciprocal functions, where the bound below is infinite: acsch(i) = −iπ/2 escalated to the
 * precision cap (16,384 bits) before.
 */
function isExactReciprocal(z: BigComplex, w: BigComplex): boolean {
  const p = z.mul(w);
  return p.im.isZero() && p.re.compare(BigFloat.ONE) === 0;
}

/**
 * log2 of a bound on |g(w′) − g(w)| for the exact w′ = 1/z, when each part of the computed w has
 * relative error below 2^−rounding: |w′ − w| ≤ ρ = |w|·2^−rounding, and on that disc
 * |1 + s·w′²| ≥ |1 + s·w²| − 2|w|ρ − ρ² ≥ |1 + s·w²|/2 once the subtracted terms are at most half,
 * so |g′| ≤ (|1 + s·w²|/2)^−power and the error is at most ρ times that. Infinity when the disc
 * comes too near a branch point to say (the caller then raises the precision). A part of g(w) that
 * is exactly zero stays so: w's parts keep their signs and zeros, so w′ lies on the same side of
 * every cut and on the same axis.
 */
function reciprocalError(w: BigComplex, rounding: number, derivative: ReciprocalFunction['derivative']): number {
  const top = Math.max(w.re.exponent(), w.im.exponent()) + 1;
  const rho = top - rounding;
  const q = w.mul(w);
  const one = new BigComplex(BigFloat.ONE, BigFloat.ZERO);
  const norm = (derivative.sign > 0 ? one.add(q) : one.sub(q)).norm();
  if (norm.isZero()) return Infinity;
  const lowLog = (norm.exponent() - 1) / 2;
  const perturbation = top + rho + 3;
  if (lowLog - 1 < perturbation) return Infinity;
  return Math.ceil(rho - derivative.power * (lowLog - 1)) + 1;
}
