import type { TargetIdentity } from '../../shared/target-identity';
import type { Target } from './target';

/**
 * A target not yet opened: what names it, how to open it in this process (lazily, on first
 * use), and how a worker thread opens it — by a discovered target's name (discover-targets.ts),
 * or from a module whose `openTarget` export builds it from `args` (for targets that are not
 * installed libraries, such as the self-check mutants or a deliberately hanging test target).
 * Without `worker` the target runs in process only.
 */
export interface TargetDescriptor extends TargetIdentity {
  open(): Target;
  worker?: { discovered: string } | { module: string; args?: unknown[] };
  /**
   * Where a configured target comes from, for people (`sheetkeeper.config.json targets[0]`,
   * `--npm complex.js@2.5.0`; docs/target-sources.md); absent for the installed targets.
   */
  from?: string;
}
