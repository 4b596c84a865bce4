import { targetIdentityOf } from '../../shared/target-identity-of';
import type { TargetDescriptor } from '../adapters/target-descriptor';
import type { ConfiguredTargetSpec } from './configured-target-spec';
import { openTarget } from './open-target';

/** The module a worker thread requires to reopen a configured target (.ts from source, .js compiled). */
const OPEN_TARGET_MODULE = require.resolve('./open-target');

/**
 * A configured target's descriptor: its identity (creating the target object loads nothing), how
 * this process opens it, and how a worker thread does (`--workers N`), from the same spec.
 */
export function configuredTarget(spec: ConfiguredTargetSpec): TargetDescriptor {
  return {
    ...targetIdentityOf(openTarget(spec)),
    open: () => openTarget(spec),
    worker: { module: OPEN_TARGET_MODULE, args: [spec] },
  };
}
