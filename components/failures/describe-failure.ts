import type { FailureView } from '../../shared/failure-view';
import type { DiagnosisTone } from './diagnosis-styles';
import { describeWorstPart } from '../../shared/describe-worst-part';
import { formatUlps } from '../../shared/format-ulps';

const fmtT = (t: number | null) => (t === null ? 'nowhere' : `t ≈ ${Number(t.toPrecision(3))}`);

/** The tone of a failure (its diagnosis, or error/skipped) and the diagnosis's own numbers in words. */
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
  switch (d.kind) {
    case 'other-sheet':
      return { tone: d.kind, detail: `k = ${d.k}` };
    case 'zero-sign':
      return { tone: d.kind, detail: `${d.part === 're' ? 'real' : 'imaginary'} part of the ${d.of}` };
    case 'misplaced-cut':
      return { tone: d.kind, detail: `library jumps ${fmtT(d.libraryJumpAt)}, expected ${fmtT(d.expectedJumpAt)}` };
    case 'inaccurate':
      return {
        tone: d.kind,
        detail: [`${formatUlps(d.ulps)} ulps`, describeWorstPart(d, 'short')].filter(Boolean).join(' '),
      };
    default:
      return { tone: d.kind, detail: undefined };
  }
}
