import type { Convention } from './schemas/convention-schema';
import type { TargetEntry } from './target-entry';

/** What names a target: one installed library at one version with its settings (docs/vocabulary.md). */
export interface TargetIdentity {
  /** Unique, usable as `--target`: "complex.js@2.4.1", "mathjs@15.2.0/number/predictable", "cmath@3.11.2". */
  name: string;
  library: string;
  version: string;
  settings: Record<string, string | number | boolean>;
  /**
   * The entries the target offers (shared/target-entry.ts), its default first. Absent on identities
   * stored before entries existed and on results, which name the entry they used instead.
   */
  entries?: TargetEntry[];
  /**
   * The convention the library itself follows on its cuts, where its adapter states one (cmath,
   * NumPy and the C library: signed-zero). A suite of the other convention then counts its inputs
   * with a −0 part as not applicable to this target (convention-mismatch-reason.ts): there the
   * library's own convention rightly picks the other side, which the suite's twin checks.
   * Absent: the library states none, and every suite holds it to its own convention.
   */
  convention?: Convention;
}
