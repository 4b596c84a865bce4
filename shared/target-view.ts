/** One target as `GET /api/targets` lists it: a library at one version with its settings (docs/vocabulary.md). */
export interface TargetView {
  /** The harness's name, e.g. "complex.js@2.4.1" or "mathjs@15.2.0/number/predictable". */
  name: string;
  library: string;
  version: string;
  settings: Record<string, string | number | boolean>;
  /** False once a server start no longer finds it installed. */
  installed: boolean;
}
