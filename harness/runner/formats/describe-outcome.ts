import { describeWorstPart } from '../../../shared/describe-worst-part';
import type { PointOutcome } from '../../../shared/point-outcome';

const num = (x: number): string =>
  Number.isFinite(x) ? (Number.isInteger(x) ? String(x) : x.toPrecision(3)) : String(x);

/** One line for a point's outcome: "zero-sign (input im)", "other-sheet k = 1", "inaccurate, 7 ulps", "error: …". */
export function describeOutcome(o: PointOutcome): string {
  switch (o.kind) {
    case 'pass':
      return 'pass';
    case 'skipped':
      return `skipped: ${o.reason}`;
    case 'error':
      return `error: ${o.message}`;
    case 'not-applicable':
      return `not applicable: ${o.reason}`;
    case 'fail': {
      const d = o.diagnosis;
      switch (d.kind) {
        case 'other-sheet':
          return `other-sheet k = ${d.k}`;
        case 'cut-side':
          return 'cut-side (the other side’s limit)';
        case 'zero-sign':
          return `zero-sign (${d.of} ${d.part})`;
        case 'misplaced-cut':
          return `misplaced-cut (library jumps at t ≈ ${d.libraryJumpAt === null ? 'nowhere' : num(d.libraryJumpAt)}, expected ${d.expectedJumpAt === null ? 'none' : `at t ≈ ${num(d.expectedJumpAt)}`})`;
        case 'inaccurate':
          return `inaccurate, ${[`${num(d.ulps)} ulps`, describeWorstPart(d, 'short')].filter(Boolean).join(' ')}, relative error ${num(d.relativeError)}`;
        case 'not-finite':
          return 'not-finite';
        case 'disagreement':
          return `disagreement with ${d.with}`;
        case 'unexplained':
          return `unexplained, relative error ${num(d.relativeError)}`;
      }
    }
  }
}
