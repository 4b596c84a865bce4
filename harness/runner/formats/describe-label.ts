import { formatComplexText } from '../../../shared/format-complex-text';
import { describeWorstPart } from '../../../shared/describe-worst-part';
import type { Diagnosis } from '../../../shared/diagnosis';

const num = (x: number): string =>
  Number.isFinite(x) ? (Number.isInteger(x) ? String(x) : x.toPrecision(3)) : String(x);
const ulps = (n: number): string => `${num(n)} ${n === 1 ? 'ulp' : 'ulps'}`;

/**
 * One label in words: "zero-sign (input im)", "other-sheet k = 1", "inaccurate, 7 ulps in re,
 * relative error 1.6e-16". A part lost to cancellation is given as its absolute error beside the
 * size of the whole value, not as its ulps (1e18 ulps of a 1e−21 part say nothing).
 */
export function describeLabel(d: Diagnosis): string {
  switch (d.kind) {
    case 'other-sheet':
      return `other-sheet k = ${d.k}`;
    case 'cut-side':
      return 'cut-side (the other side’s limit)';
    case 'zero-sign':
      return `zero-sign (${d.of} ${d.part})`;
    case 'misplaced-cut':
      return `misplaced-cut (library jumps at t ≈ ${d.libraryJumpAt === null ? 'nowhere' : num(d.libraryJumpAt)}, expected ${d.expectedJumpAt === null ? 'none' : `at t ≈ ${num(d.expectedJumpAt)}`}${d.confirmed ? '; confirmed by refining between the samples' : ''})`;
    case 'inaccurate':
      if (d.cancellation) {
        const otherPart = d.cancellation.part === 're' ? 'im' : 're';
        const otherUlps = d.parts?.[otherPart].ulps ?? 0;
        return `inaccurate, ${d.cancellation.part} lost to cancellation: absolute error ${num(d.cancellation.absoluteError)} beside |value| ${num(d.cancellation.magnitude)}${d.signDiffers ? ', opposite sign' : ''}${otherUlps > 0 ? `; ${otherPart} ${ulps(otherUlps)}` : ''}, relative error ${num(d.relativeError)}`;
      }
      return `inaccurate, ${[ulps(d.ulps), describeWorstPart(d, 'short')].filter(Boolean).join(' ')}, relative error ${num(d.relativeError)}`;
    case 'not-finite':
      return 'not-finite';
    case 'disagreement':
      return `disagreement with ${d.with}, which gives ${formatComplexText(d.other)}${d.otherMatchesReference ? ', the reference value' : ''}`;
    case 'unexplained':
      return `unexplained, relative error ${num(d.relativeError)}`;
  }
}
