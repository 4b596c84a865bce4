import type { TargetEntry } from '../../shared/target-entry';
import { ENTRY_CARRIES } from './entry-carries';

/**
 * mathjs's entries (its docs: math.complex with two numbers, an object or a string; the
 * expression parser; plain numbers for real-line code); each `call` is a way of
 * mathjs-entry-ways.ts. `defaultEntry` is the one a target's name ends with
 * ("mathjs@15.2.0/complex", "mathjs@15.2.0/number"), listed first; the others follow.
 */
export function mathjsEntries(defaultEntry: 'complex' | 'number'): TargetEntry[] {
  const all: TargetEntry[] = [
    { name: 'complex', call: 'math.complex(re, im)', default: false, carries: ENTRY_CARRIES.everything },
    { name: 'object', call: 'math.complex({ re, im })', default: false, carries: ENTRY_CARRIES.everything },
    { name: 'string', call: 'math.complex("re±im i")', default: false, carries: ENTRY_CARRIES.everything },
    { name: 'parser', call: 'math.evaluate("re±im i")', default: false, carries: ENTRY_CARRIES.everything },
    { name: 'number', call: 're as a plain number', default: false, carries: ENTRY_CARRIES.realOnly },
  ];
  return [
    ...all.filter((e) => e.name === defaultEntry).map((e) => ({ ...e, default: true })),
    ...all.filter((e) => e.name !== defaultEntry),
  ];
}
