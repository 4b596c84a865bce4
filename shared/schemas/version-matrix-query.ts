import { queryObject } from './query-object';
import { versionMatrixRequest } from './version-matrix-request';

/**
 * At most this many suites per request: all 44 demo suites over complex.js's seven versions took
 * 5.7 s in one go, eight about 1 s, and the server does nothing else meanwhile. The app asks in
 * groups and shows the groups as they arrive.
 */
const MAX_SUITES = 8;

/**
 * Query of `GET /api/targets/:name/version-matrix` (`:name` is a library without the version,
 * "complex.js"): the suites, comma-separated slugs as `sheetkeeper matrix --suite` takes ids; each
 * is compared at its newest approved version; optionally the entries to compare at
 * (comma-separated, as `sheetkeeper matrix --entry`), each suite at its own by default.
 */
export const versionMatrixQuery = queryObject({
  suite: versionMatrixRequest.shape.suite
    .refine((list) => list.length <= MAX_SUITES, { error: `names more than ${MAX_SUITES} suites; ask in groups` })
    .refine((list) => list.every((s) => /^[a-z0-9]+(-[a-z0-9]+)*$/.test(s)), {
      error: 'must be suite slugs (lower-case words joined by hyphens)',
    }),
  entry: versionMatrixRequest.shape.entry,
});
