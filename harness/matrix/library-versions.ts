import { compareVersions } from '../adapters/compare-versions';
import { installedTargets } from '../adapters/installed-targets';
import type { TargetDescriptor } from '../adapters/target-descriptor';

/** A target's name without its version: "mathjs@15.2.0/complex" → "mathjs/complex". */
const withoutVersion = (name: string) => name.replace(/@[^/]*/, '');

/**
 * Every version of one library with the same settings among `known` (the installed targets by
 * default; a command adds the configured ones), oldest first, an installed version before a
 * configured copy of the same version: `library` is a target name without its version, as in
 * "complex.js" or "mathjs/number/predictable".
 */
export function libraryVersions(
  library: string,
  known: readonly TargetDescriptor[] = installedTargets(),
): TargetDescriptor[] {
  return known
    .filter((d) => withoutVersion(d.name) === library)
    .sort(
      (a, b) => compareVersions(a.version, b.version) || Number(a.from !== undefined) - Number(b.from !== undefined),
    );
}
