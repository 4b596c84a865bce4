import type { ComplexPair } from '../adapters/complex-pair';

/**
 * One way the convention fingerprint calls a function on its cuts: the label it is shown and
 * asked for by, the library operation, and the arguments after z.
 */
export interface FingerprintProbe {
  label: string;
  op: string;
  extra: ComplexPair[];
}
