import type { TargetEntry } from '../../shared/target-entry';
import { ENTRY_CARRIES } from './entry-carries';

/**
 * complex.js's entries (its README: "new Complex(re, im)", an object, an array, a string); each
 * `call` is a way of complex-js-entry-ways.ts. The two-number constructor is the default.
 */
export const COMPLEX_JS_ENTRIES: readonly TargetEntry[] = [
  { name: 'complex', call: 'new Complex(re, im)', default: true, carries: ENTRY_CARRIES.everything },
  { name: 'object', call: 'new Complex({ re, im })', default: false, carries: ENTRY_CARRIES.everything },
  { name: 'array', call: 'new Complex([re, im])', default: false, carries: ENTRY_CARRIES.everything },
  { name: 'string', call: 'new Complex("re±im i")', default: false, carries: ENTRY_CARRIES.everything },
];
