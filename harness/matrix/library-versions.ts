import { discoverTargets } from '../adapters/discover-targets';
import type { TargetDescriptor } from '../adapters/target-descriptor';

/** A target's name without its version: "mathjs@15.2.0/complex" → "mathjs/complex". */
const withoutVersion = (name: string) => name.replace(/@[^/]*/, '');

/**
 * Every installed version of one library with the same settings, oldest first (discovery
 * sorts by version): `library` is a target name without its version, as in
 * "complex.js" or "mathjs/number/predictable".
 */
export function libraryVersions(library: string): TargetDescriptor[] {
  return discoverTargets().filter((d) => withoutVersion(d.name) === library);
}
