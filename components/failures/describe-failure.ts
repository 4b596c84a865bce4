import type { FailureView } from '../../shared/failure-view';
import type { DiagnosisTone } from './diagnosis-styles';
import { describeLabel } from '../../shared/describe-label';

/** The tone of a failure (its leading label, or error/skipped) and that label's own numbers in words. */
export function describeFailure(f: Pick<FailureView, 'diagnosis' | 'outcomeKind' | 'ulps'>): {
  tone: DiagnosisTone;
  detail: string | undefined;
} {
  const d = f.diagnosis;
  if (!d)
    return {
      tone: f.outcomeKind === 'skipped' ? 'skipped' : f.outcomeKind === 'error' ? 'error' : 'unexplained',
      detail: undefined,
    };
  return { tone: d.kind, detail: describeLabel(d, 'short') || undefined };
}
