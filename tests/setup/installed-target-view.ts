import type { TargetEntry } from '../../shared/target-entry';
import type { TargetView } from '../../shared/target-view';

const EVERYTHING: TargetEntry['carries'] = { imaginaryPart: true, realZeroSign: true, imaginaryZeroSign: true };

/**
 * An installed target as GET /api/targets lists it, for screen tests: `entries` as [name, call]
 * pairs (the first is the default, each carries everything) or whole entries.
 */
export function installedTargetView(name: string, entries: ([string, string] | TargetEntry)[]): TargetView {
  const [library = name, version = ''] = name.split('@');
  return {
    name,
    library,
    version,
    settings: {},
    installed: true,
    entries: entries.map((e, i) =>
      Array.isArray(e) ? { name: e[0], call: e[1], default: i === 0, carries: EVERYTHING } : e,
    ),
  };
}
