import type { PropertyOutcome } from './property-outcome';
import { propertyFailureParts } from './property-failure-parts';

/**
 * A failed property check as text lines for the CLI's table and the JUnit failure
 * (propertyFailureParts says what they hold): the counterexample, one line per library value
 * with the law's sides marked and the names aligned, and the replay line.
 */
export function propertyFailureLines(
  o: Extract<PropertyOutcome, { kind: 'failed' }>,
  options: { ascii?: boolean } = {},
): string[] {
  const parts = propertyFailureParts(o, options);
  const width = Math.max(0, ...parts.values.map((v) => v.name.length));
  return [
    parts.counterexample,
    ...parts.values.map((v) => `  ${(v.side ?? '').padEnd(10)} ${v.name.padEnd(width)} = ${v.text}`),
    parts.replay,
  ];
}
