import type { CallResult } from './call-result';
import type { ComplexPair } from './complex-pair';
import type { TargetInfo } from './target-info';

/**
 * A library under test. `evaluate` takes a batch: one item per call, each the list of
 * that call's arguments (one pair for sqrt, two for pow), and answers one result per
 * item in order. A call the library cannot make gives an error result, never a throw.
 */
export interface Target extends TargetInfo {
  supports(op: string): Promise<boolean>;
  evaluate(op: string, calls: ComplexPair[][]): Promise<CallResult[]>;
  /** Releases what the target holds (a child process); safe to call twice. */
  close(): Promise<void>;
}
