import type { Convention } from '../../../shared/schemas/convention-schema';
import { OP_ARITY } from '../../../harness/adapters/op-arity';
import type { ComplexPair } from '../../../harness/adapters/complex-pair';
import type { Target } from '../../../harness/adapters/target';
import { functionTarget } from './function-target';
import { referenceCall } from './reference-call';

/** Every operation a library target may offer: the catalogue's functions and the arithmetic. */
const REFERENCE_OPS = Object.keys(OP_ARITY);

/**
 * The reference engine as a target, with `replace` overriding some operations to make a
 * mutant (a deliberately wrong library). The replacements get the reference call too.
 */
export function referenceTarget(
  convention: Convention,
  replace: Record<
    string,
    (args: ComplexPair[], reference: (op: string, args: ComplexPair[]) => ComplexPair) => ComplexPair
  > = {},
  name = `reference/${convention}`,
): Target {
  const reference = (op: string, args: ComplexPair[]) => referenceCall(op, args, convention);
  return functionTarget(name, REFERENCE_OPS, (op, args) =>
    replace[op] ? replace[op]!(args, reference) : reference(op, args),
  );
}
