import type { AdapterCheckResult } from './adapter-check-result';

/** What `sheetkeeper adapter-check` found about one stdio program (`--format json` writes it as it is). */
export interface AdapterCheckReport {
  /** The command as run, words joined by spaces. */
  program: string;
  /** From the program's `describe` answer, when it gave them. */
  library: string | null;
  version: string | null;
  /** The per-request time limit the checks used, in ms. */
  timeLimitMs: number;
  /** Every check of adapter-checks.ts, in its order. */
  checks: AdapterCheckResult[];
  passed: number;
  failed: number;
  notChecked: number;
}
