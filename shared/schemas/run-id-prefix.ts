import { SHORT_RUN_ID_LENGTH } from '../short-run-id';
import { textSchema } from './text-schema';

/** A canonical run id's groups: 8-4-4-4-12 hex digits. */
const GROUPS = [8, 4, 4, 4, 12];

/** Whether `s` (lower case) is the start of a canonical id, dashes in place, with at least the short id's 8 digits. */
function isIdPrefix(s: string): boolean {
  let at = 0;
  for (const [i, size] of GROUPS.entries()) {
    if (at === s.length) return i > 0;
    if (i > 0) {
      if (s[at] !== '-') return false;
      at += 1;
    }
    const digits = /^[0-9a-f]*/.exec(s.slice(at, at + size))![0].length;
    if (i === 0 && digits < SHORT_RUN_ID_LENGTH) return false;
    at += digits;
    if (digits < size) return at === s.length;
  }
  return at === s.length;
}

/**
 * A run named as people see it: its short id ("37e7ec6f", shared/short-run-id.ts) or any longer
 * start of its id, the whole id included; case does not matter. Which run it names (none, one,
 * or several that start alike) only the server can say: server/failures/resolve-run-prefix.ts.
 */
export const runIdPrefix = textSchema()
  .trim()
  .toLowerCase()
  .refine(isIdPrefix, {
    error: `must be a run id or its first ${SHORT_RUN_ID_LENGTH} or more characters, as in "Run 37e7ec6f"`,
  });
