import type { Convention } from '../../../shared/schemas/convention-schema';
import type { ComplexPair } from '../../../harness/adapters/complex-pair';
import type { Target } from '../../../harness/adapters/target';
import { functionTarget } from './function-target';
import { referenceCall } from './reference-call';

const REFERENCE_OPS = [
  'sqrt',
  'cbrt',
  'nthroot',
  'pow',
  'exp',
  'log',
  'asin',
  'acos',
  'atan',
  'asinh',
  'acosh',
  'atanh',
  'acot',
  'asec',
  'acsc',
  'acoth',
  'asech',
  'acsch',
  'add',
  'sub',
  'mul',
  'div',
  'neg',
] as const;

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
