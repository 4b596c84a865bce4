import { spawnSync } from 'node:child_process';
import path from 'node:path';

/** Debian's interpreter, which sees python3-mpmath and python3-gmpy2 (docs/conventions.md). */
const DEBIAN_PYTHON = '/usr/bin/python3';

export interface OraclePoint {
  fn: string;
  z: [string, string];
  w?: [string, string] | string;
  n?: number;
  /** For source "cmath-formula": the subject written as a Python expression over z. */
  formula?: string;
  /** For mpmath: working digits for this point, when 660 past `dps` is not enough. */
  work_dps?: number;
}

/** Sends one batch of points to tests/external/python/oracle.py and returns its answers, in order. */
export function askPython<T>(source: 'cmath' | 'cmath-formula' | 'mpmath', points: OraclePoint[], dps = 60): T[] {
  const script = path.join(__dirname, 'python', 'oracle.py');
  const run = spawnSync(DEBIAN_PYTHON, [script], {
    input: JSON.stringify({ source, dps, points }),
    encoding: 'utf8',
    maxBuffer: 1 << 28,
  });
  if (run.status !== 0) throw new Error(`oracle.py failed: ${run.stderr}`);
  return JSON.parse(run.stdout) as T[];
}
