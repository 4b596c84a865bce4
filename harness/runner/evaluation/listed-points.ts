import { diagnosisClass } from '../../../shared/diagnosis-class';
import type { PathRun } from './path-run';

/**
 * The failing and erring points a path's result lists in full: branch findings first, then errors,
 * then accuracy findings, each in index order, the first `maxFindings` of them (the rest are
 * counted). When a path has more failures than that, the ones cut off are accuracy findings, never
 * a sign flip. Read once the labels are final (after compareAlongPath).
 */
export function listedPoints(run: Pick<PathRun, 'failing' | 'errored' | 'maxFindings' | 'labels'>): number[] {
  const rank = (i: number) => {
    const labels = run.labels[i];
    if (!labels) return 1;
    return labels.some((l) => diagnosisClass(l.kind) === 'branch') ? 0 : 2;
  };
  return [...run.failing, ...run.errored].sort((a, b) => rank(a) - rank(b) || a - b).slice(0, run.maxFindings);
}
