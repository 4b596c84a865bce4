import type { ComplexPair } from './complex-pair';

/** The outcome of one call on a target: the value, or why there is none (threw, timed out, unsupported). */
export type CallResult = { value: ComplexPair } | { error: string };
