import type { CallResult } from './call-result';
import type { ColumnArg, ColumnResult } from './column-args';
import type { ComplexPair } from './complex-pair';
import type { TargetIdentity } from '../../shared/target-identity';

/**
 * A library under test. `evaluate` takes a batch: one item per call, each the list of
 * that call's arguments (one pair for sqrt, two for pow), and answers one result per
 * item in order. A call the library cannot make gives an error result, never a throw.
 * `entry` names the way every argument is built (shared/target-entry.ts, one of `entries`);
 * absent, the target's default. Values are built that way and never patched afterwards.
 */
export interface Target extends TargetIdentity {
  supports(op: string): Promise<boolean>;
  evaluate(op: string, calls: ComplexPair[][], entry?: string): Promise<CallResult[]>;
  /**
   * Optional: the same calls column-wise, `n` points, skipping the indices in `skip` (they keep
   * their error). Same values and errors as `evaluate`; an in-process library answers this way
   * without an array per call, which keeps the runner's check loop near a bare loop's speed, and
   * takes an argument column's own `values` (an earlier step's library values) as they are.
   * With `keepValues` it answers its own values too, for a later step to take.
   */
  evaluateColumns?(
    op: string,
    args: ColumnArg[],
    n: number,
    skip: ReadonlyMap<number, string>,
    entry?: string,
    keepValues?: boolean,
  ): Promise<ColumnResult>;
  /** Releases what the target holds (a child process); safe to call twice. */
  close(): Promise<void>;
}
