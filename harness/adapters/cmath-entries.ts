import type { TargetEntry } from '../../shared/target-entry';
import { ENTRY_CARRIES } from './entry-carries';

/**
 * Python's entries as harness/adapters/python/cmath_adapter.py builds them and lists them in its
 * `describe` answer (a test holds the two equal): complex(re, im), the default, and the string
 * form complex("re±imj").
 */
export const CMATH_ENTRIES: readonly TargetEntry[] = [
  { name: 'complex', call: 'complex(re, im)', default: true, carries: ENTRY_CARRIES.everything },
  { name: 'string', call: 'complex("re±imj")', default: false, carries: ENTRY_CARRIES.everything },
];
