import type { Suite } from '../../../shared/schemas/suite-schema';
import { buildPath } from '../../paths/build-path';
import { toPathSpec } from '../evaluation/to-path-spec';

/** Points per path of a suite, in its order; a path that cannot be built counts 0 (evaluating it reports why). */
export function suitePathPoints(suite: Suite): number[] {
  return suite.paths.map((path) => {
    try {
      return buildPath(toPathSpec(path)).length;
    } catch {
      return 0;
    }
  });
}
