import type { Convention } from '../../../shared/schemas/convention-schema';
import type { ComplexPair } from '../../../harness/adapters/complex-pair';
import { referenceValue } from '../../../harness/fingerprint/reference-value';

/**
 * One call of a catalogue operation answered by the reference engine (correctly rounded
 * principal values under `convention`), and + − × ÷ and negation in plain IEEE double
 * arithmetic, the textbook formulas a library would use. For tests: the reference's own values
 * must satisfy every law, and mutants are built by replacing one operation.
 */
export function referenceCall(op: string, args: readonly ComplexPair[], convention: Convention): ComplexPair {
  const [z, w] = args as [ComplexPair, ComplexPair | undefined];
  switch (op) {
    case 'add':
      return [z[0] + w![0], z[1] + w![1]];
    case 'sub':
      return [z[0] - w![0], z[1] - w![1]];
    case 'mul':
      return [z[0] * w![0] - z[1] * w![1], z[0] * w![1] + z[1] * w![0]];
    case 'div': {
      const d = w![0] * w![0] + w![1] * w![1];
      return [(z[0] * w![0] + z[1] * w![1]) / d, (z[1] * w![0] - z[0] * w![1]) / d];
    }
    case 'neg':
      return [-z[0], -z[1]];
    default:
      return referenceValue(op, args, convention);
  }
}
