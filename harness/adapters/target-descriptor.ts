import type { Target } from './target';
import type { TargetInfo } from '../../shared/target-identity';

/** An installed target that has not been loaded: `open` loads it (lazily, on first use). */
export interface TargetDescriptor extends TargetInfo {
  open(): Target;
}
