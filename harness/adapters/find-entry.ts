import type { TargetEntry } from '../../shared/target-entry';
import type { TargetIdentity } from '../../shared/target-identity';
import { targetEntries } from './target-entries';

/**
 * The entry `name` of a target, or its default when `name` is absent; an entry the target does
 * not offer is an Error naming it and listing the target's entries (never a fallback).
 */
export function findEntry(target: Pick<TargetIdentity, 'name' | 'entries'>, name?: string): TargetEntry | Error {
  const entries = targetEntries(target);
  if (name === undefined) return entries.find((e) => e.default) ?? (entries[0] as TargetEntry);
  const found = entries.find((e) => e.name === name);
  if (found) return found;
  return new Error(`${target.name} has no entry "${name}"; its entries are ${entries.map((e) => e.name).join(', ')}`);
}
