import type { Convention } from '../../shared/schemas/convention-schema';
import { catalogue } from './catalogue';
import { Approximation } from './complex/approximation';
import type { BigComplex } from './complex/big-complex';
import type { PowerExponent } from './complex/power-exponent';
import { applyConvention } from './functions/apply-convention';
import { CBRT_EXPONENT } from './functions/cbrt';
import { nthrootExponent } from './functions/nthroot';
import type { CatalogueFunction } from './functions/catalogue-function';
import { pow } from './functions/pow';
import type { ReciprocalFunction } from './functions/reciprocal-function';

/** A request for one principal value. `w` is for pow, `n` for nthroot. */
export interface PrincipalRequest {
  fn: string;
  z: BigComplex;
  w?: PowerExponent;
  n?: number;
  convention: Convention;
}

/** Extra precision for the second evaluation of a reciprocal function. */
const RECIPROCAL_STEP = 40;

/**
 * One evaluation of a catalogue function at a working precision, with its error bound:
 * the convention applied to the input, Annex G special values, else the function's formula.
 * Reciprocal functions evaluate g(1/z) with 1/z rounded, so their bound is the difference
 * between two evaluations 40 bits apart (a heuristic, as mpmath's own precision escalation is).
 */
export function evaluateFunction(request: PrincipalRequest, bits: number): Approximation {
  const entry = catalogue[request.fn];
  if (!entry) throw new RangeError(`unknown function "${request.fn}"`);
  const { z, convention } = request;
  if (entry.kind === 'plain') return evaluatePlain(entry.fn, applyConvention(z, entry.fn.cuts, convention), bits);
  if (entry.kind === 'reciprocal') return evaluateReciprocal(entry.fn, z, convention, bits);
  const base = applyConvention(z, [{ axis: 'real', from: -Infinity, to: 0, ccwSide: 'upper' }], convention);
  return pow(base, exponentOf(request, convention), bits);
}

function exponentOf(request: PrincipalRequest, convention: Convention): PowerExponent {
  if (request.fn === 'cbrt') return { kind: 'rational', value: CBRT_EXPONENT };
  if (request.fn === 'nthroot') return { kind: 'rational', value: nthrootExponent(request.n) };
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
  return Approximation.agreement(coarse, fine);
}

