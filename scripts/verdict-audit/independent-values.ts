import { spawnSync } from 'node:child_process';
import path from 'node:path';
import type { AuditPoint, IndependentValue } from './independent-verdict';

/** Debian's interpreter, which sees python3-mpmath (docs/conventions.md). */
const DEBIAN_PYTHON = '/usr/bin/python3';

/**
 * mpmath's values at the points, correctly rounded, from independent_values.py (principal values
 * as one-sided limits where a zero part names a side, regular branches continued from z0), one
 * per point in order; a point mpmath gives no value at is `{ unchecked: reason }`.
 */
export function independentValues(points: readonly AuditPoint[]): IndependentValue[] {
  const run = spawnSync(DEBIAN_PYTHON, [path.join(__dirname, 'independent_values.py')], {
    input: JSON.stringify({ points }),
    encoding: 'utf8',
    maxBuffer: 1 << 28,
  });
  if (run.status !== 0) throw new Error(`independent_values.py failed: ${run.stderr}`);
  return JSON.parse(run.stdout) as IndependentValue[];
}
