import { DIAGNOSIS_KINDS } from '../../../shared/diagnosis-kinds';
import type { RunResult } from '../../../shared/run-result';

/** Label counts with the branch kinds first, in the app's order (diagnosis-kinds.ts), as every output lists them. */
const ordered = (counts: Record<string, number>): Record<string, number> =>
  Object.fromEntries(
    [...Object.entries(counts)].sort(
      ([a], [b]) =>
        DIAGNOSIS_KINDS.indexOf(a as (typeof DIAGNOSIS_KINDS)[number]) -
        DIAGNOSIS_KINDS.indexOf(b as (typeof DIAGNOSIS_KINDS)[number]),
    ),
  );

/**
 * The run result as JSON (shared/run-result.ts). JSON has no infinities or NaN: a number
 * that is not finite (an error of Infinity ulps for a NaN value) is written as the string
 * "inf", "-inf" or "nan", the wire spelling of docs/suite-format.md. Every `byDiagnosis` lists
 * the branch labels before `inaccurate`.
 */
export function formatJson(result: RunResult): string {
  return `${JSON.stringify(
    result,
    (key, value: unknown) => {
      if (key === 'byDiagnosis' && value && typeof value === 'object') return ordered(value as Record<string, number>);
      return typeof value === 'number' && !Number.isFinite(value)
        ? Number.isNaN(value)
          ? 'nan'
          : value > 0
            ? 'inf'
            : '-inf'
        : value;
    },
    2,
  )}\n`;
}
