import type { ADAPTER_CHECKS } from './adapter-checks';

/** The outcome of one check of adapter-check (the checks are declared in adapter-checks.ts). */
export interface AdapterCheckResult {
  name: keyof typeof ADAPTER_CHECKS;
  status: 'pass' | 'fail' | 'not-checked';
  /** What the program did, in a sentence: on a pass a measured figure, on a failure what went wrong, when not checked why. */
  found: string;
  /** On a failure: why it matters and how to fix it (ADAPTER_CHECKS' advice). */
  advice?: string;
}
