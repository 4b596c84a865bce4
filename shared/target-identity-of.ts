import type { TargetIdentity } from './target-identity';

/**
 * Just the naming fields of a target (name, library, version, settings, and entries and the stated
 * convention when it has them), dropping whatever else the object carries (an `open`, a process).
 * The one copy of a target's identity, so a field added to TargetIdentity reaches every copy.
 */
export function targetIdentityOf(t: TargetIdentity): TargetIdentity {
  return {
    name: t.name,
    library: t.library,
    version: t.version,
    settings: t.settings,
    ...(t.entries ? { entries: t.entries } : {}),
    ...(t.convention ? { convention: t.convention } : {}),
  };
}
