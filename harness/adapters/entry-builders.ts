import type { TargetIdentity } from '../../shared/target-identity';
import type { ComplexPair } from './complex-pair';
import { findEntry } from './find-entry';

/**
 * The builder of each of an in-process target's entries: each entry's `call` names one of `ways`
 * (complex-js-entry-ways.ts, mathjs-entry-ways.ts: the same ways the entry-point probes try).
 * `builder(name)` answers the builder of an entry, the default's for no name, and throws naming an
 * entry the target does not offer (find-entry.ts) with every value it is asked to build, so each
 * call of a batch answers that error and nothing throws out of `evaluate`.
 */
export function entryBuilders(
  target: Pick<TargetIdentity, 'name' | 'entries'>,
  ways: () => Readonly<Record<string, (z: ComplexPair) => unknown>>,
): (name?: string) => (z: ComplexPair) => unknown {
  const known = new Map<string, (z: ComplexPair) => unknown>();
  return (name) => {
    const entry = findEntry(target, name);
    if (entry instanceof Error)
      return () => {
        throw entry;
      };
    const cached = known.get(entry.name);
    if (cached) return cached;
    const build = ways()[entry.call];
    if (!build) throw new Error(`${target.name}: entry "${entry.name}" names no way in (${entry.call})`);
    known.set(entry.name, build);
    return build;
  };
}
