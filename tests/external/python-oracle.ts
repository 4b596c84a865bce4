import { spawnSync } from 'node:child_process';
import path from 'node:path';

/** Debian's interpreter, which sees python3-mpmath and python3-gmpy2 (STACK.md). */
export const DEBIAN_PYTHON = '/usr/bin/python3';

export interface OraclePoint {
  fn: string;
  z: [string, string];
  w?: [string, string] | string;
  n?: number;
  /** For source "cmath-formula": the subject written as a Python expression over z. */
  formula?: string;
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

/** Reads Python's float.hex output (or inf/nan) back into a double. */
export function unhex(text: string): number {
  const t = text.trim();
  if (t === 'nan' || t === '-nan') return NaN;
  if (t === 'inf') return Infinity;
  if (t === '-inf') return -Infinity;
  const m = /^(-?)0x([01])\.([0-9a-f]+)p([+-]\d+)$/.exec(t);
  if (!m) throw new Error(`not a float.hex: ${t}`);
  const [, sign, lead, frac, exp] = m as unknown as [string, string, string, string, string];
  const mantissa = Number(BigInt('0x' + lead + frac)) / 2 ** (4 * frac.length);
  const v = mantissa * 2 ** Number(exp);
  return sign === '-' ? -v : v;
}
