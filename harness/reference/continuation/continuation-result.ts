import type { BigComplex } from '../complex/big-complex';
import type { Rational } from '../numbers/rational';

/**
 * The answer to a ContinuationRequest: the branch's value f at the path point z for each t
 * asked (in the request's order) and, for a closed path, the monodromy factor e^{iν·Δarg g};
 * or a refusal saying why (a zero or pole on the path, z0 on a cut, an invalid cut layout, a t
 * outside [0, 1], a g that cannot be factored). Values are at 192 bits, with parts that are
 * noise of that precision set to 0.
 */
export type ContinuationResult =
  | {
      kind: 'continued';
      values: { t: Rational; z: BigComplex; f: BigComplex }[];
      monodromy: BigComplex | null;
    }
  | { kind: 'refused'; reason: string };
