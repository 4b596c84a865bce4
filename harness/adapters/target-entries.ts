import type { TargetEntry } from '../../shared/target-entry';
import type { TargetIdentity } from '../../shared/target-identity';
import { ENTRY_CARRIES } from './entry-carries';

/** A target that declares no entries (an older stdio adapter) has one: whatever its adapter builds from two numbers. */
const ONLY_ENTRY: TargetEntry = {
  name: 'complex',
  call: 'the adapter’s own value from two numbers',
  default: true,
  carries: ENTRY_CARRIES.everything,
};

/** The entries a target offers, its default first. */
export function targetEntries(target: Pick<TargetIdentity, 'entries'>): TargetEntry[] {
  return target.entries && target.entries.length > 0 ? target.entries : [ONLY_ENTRY];
}
