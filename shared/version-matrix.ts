import type { Diagnosis } from './diagnosis';
import type { WireComplex } from './wire-complex';

/** How a point came out at one version: its value (null when the library gave none) and its outcome. */
type Side = {
  version: string;
  value: WireComplex | null;
  outcome:
    | { kind: 'pass' }
    | { kind: 'fail'; diagnosis: Diagnosis }
    | { kind: 'error'; message: string }
    | { kind: 'skipped'; reason: string };
};

/**
 * The same suites over every installed version of one library (docs/vocabulary.md, "version
 * change"): per suite the status at each version, and every point whose value changed between
 * two consecutive versions (sign-exactly: a zero that changes sign is a change), with the
 * first version where it changed and, for each change, the value and outcome on both sides.
 * `statement` says what a matrix with no changes does and does not show.
 */
export interface VersionMatrix {
  /** The library and settings compared, e.g. "complex.js" or "mathjs/complex". */
  library: string;
  /** Oldest first, as installed. */
  versions: string[];
  statement: string;
  suites: {
    id: string;
    version: number;
    subject: string;
    /** The entry the inputs went in through at every version (shared/target-entry.ts); absent on matrices made before entries. */
    entry?: string;
    statusByVersion: { version: string; status: string; fail: number; pass: number }[];
    changes: {
      path: string;
      index: number;
      label?: string;
      z: WireComplex;
      firstChangedIn: string;
      steps: { before: Side; after: Side }[];
    }[];
  }[];
}
