import type { Target } from '../../adapters/target';
import type { TargetInfo } from '../../../shared/target-identity';

/**
 * A target a plan names: how to open it in this process, and how a worker thread opens it —
 * by a discovered target's name (discover-targets.ts), or from a module whose `openTarget`
 * export builds it from `args` (for targets that are not installed libraries, such as the
 * self-check mutants or a deliberately hanging test target). Without `worker` the target
 * runs in process only.
 */
export interface TargetRef extends TargetInfo {
  open(): Target;
  worker?: { discovered: string } | { module: string; args?: unknown[] };
}
