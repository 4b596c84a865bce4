import { queryObject } from './query-object';
import { fingerprintRequest } from './fingerprint-request';

/**
 * Query of `GET /api/targets/:name/fingerprint`: optionally which functions (comma-separated labels
 * as the fingerprint names them), the same rule as `sheetkeeper fingerprint --fn`, and the entry
 * values are built through (`--entry`; absent, the target's default). The target is
 * the route's `:name`; the work is fixed (a few places on each cut of each function), so nothing else is needed.
 */
export const fingerprintQuery = queryObject({ fn: fingerprintRequest.shape.fn, entry: fingerprintRequest.shape.entry });
