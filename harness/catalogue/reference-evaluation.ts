import type { PowerExponent } from '../reference/complex/power-exponent';
import type { CatalogueFunction } from '../reference/functions/catalogue-function';
import type { Cut } from '../reference/functions/cut';
import type { ReciprocalFunction } from '../reference/functions/reciprocal-function';

/** What a power's exponent is read from: `w` for pow, `n` for nthroot, nothing for a fixed root. */
export interface PowerArguments {
  w?: PowerExponent;
  n?: number;
}

/**
 * How the reference engine evaluates one catalogue function: a `plain` function of z, a
 * `reciprocal` one g(1/z), or a `power` z^w evaluated by pow with the exponent its arguments give
 * (throwing a RangeError when they give none) and the cuts of z^w.
 */
export type ReferenceEvaluation =
  | { kind: 'plain'; fn: CatalogueFunction }
  | { kind: 'reciprocal'; fn: ReciprocalFunction }
  | { kind: 'power'; cuts: readonly Cut[]; exponent(args: PowerArguments): PowerExponent };
