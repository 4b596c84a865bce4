import type { DataSource } from 'typeorm';
import { conjugatingSqrtTarget } from './conjugating-sqrt-target';
import { libraryVersionRuns } from './library-version-runs';

/** libraryVersionRuns with conjugatingSqrtTarget: version 2 breaks √z in the upper half-plane. */
export function conjugatingLibraryRuns(
  dataSource: DataSource,
  library: string,
  plan: { name: string; recipients: string[]; suites: string[] },
): ReturnType<typeof libraryVersionRuns> {
  return libraryVersionRuns(dataSource, library, plan, (version) => conjugatingSqrtTarget(library, version));
}
