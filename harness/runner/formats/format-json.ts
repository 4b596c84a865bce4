import type { RunResult } from '../../../shared/run-result';

/**
 * The run result as JSON (shared/run-result.ts). JSON has no infinities or NaN: a number
 * that is not finite (an error of Infinity ulps for a NaN value) is written as the string
 * "inf", "-inf" or "nan", the wire spelling of docs/suite-format.md.
 */
export function formatJson(result: RunResult): string {
  return `${JSON.stringify(result, (_key, value: unknown) => (typeof value === 'number' && !Number.isFinite(value) ? (Number.isNaN(value) ? 'nan' : value > 0 ? 'inf' : '-inf') : value), 2)}\n`;
}
