import { formatComplexText } from './format-complex-text';
import type { PointFinding } from './run-result';

/**
 * A composed subject's steps at one failing point in one line, for text people read (the CLI
 * table, JUnit, mail): each step's library value with the reference's beside it where they
 * differ, and the step that first left the reference marked. "" when the finding has no steps.
 * `ascii` as in formatComplexText.
 */
export function describeSteps(
  finding: Pick<PointFinding, 'steps' | 'firstLeftStep'>,
  options: { ascii?: boolean } = {},
): string {
  const steps = finding.steps ?? [];
  if (steps.length === 0) return '';
  const text = steps.map((s, k) => {
    const library = formatComplexText(s.library, options);
    const reference = s.left ? ` (reference ${formatComplexText(s.reference, options)})` : '';
    const first = k === finding.firstLeftStep ? ', the first step to leave the reference' : '';
    return `${k + 1}. ${s.text} = ${library}${reference}${first}`;
  });
  return `steps: ${text.join('; ')}`;
}
