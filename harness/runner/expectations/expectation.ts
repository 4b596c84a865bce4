import type { SuitePath } from '../../../shared/schemas/suite-path-schema';
import type { ComplexDouble } from '../../checks/complex-double';
import type { PathPoint } from '../../paths/path-point';

/** The alternatives a failing point's diagnosis is chosen among, and what fixes its expected value. */
export interface PointAlternatives {
  flippedZero?: { part: 're' | 'im'; value: ComplexDouble };
  otherSide?: ComplexDouble;
  otherSheets?: { k: number; value: ComplexDouble }[];
  /** For a point on a cut: both one-sided limits, named. */
  limits?: { sides: [string, string]; values: [ComplexDouble, ComplexDouble] };
  rule: string;
}

/** Expected values at a path's points, each a double pair, or a reason the point has none. */
export interface ExpectedColumn {
  re: Float64Array;
  im: Float64Array;
  skipped: Map<number, string>;
}

/**
 * What a suite's subject should equal (docs/vocabulary.md) at the points of its paths, with the
 * alternatives to diagnose a failure. Principal suites: the reference value of the whole
 * subject under the suite's convention. Regular suites: the continued branch on the plane cut
 * along the layout. All values come through the reference cache.
 */
export interface Expectation {
  /** Whether the sign of a zero part of the value is part of the contract. */
  readonly zeroSigns: boolean;
  /** Describes the expectation in one line ("principal, signed-zero" or the regular branch). */
  readonly description: string;
  expected(path: SuitePath, points: readonly PathPoint[]): ExpectedColumn;
  alternatives(
    path: SuitePath,
    points: readonly PathPoint[],
    index: number,
    expected: ComplexDouble,
  ): PointAlternatives;
  /** The monodromy factor the branch has along a closed path, and ν to read a library's jumps; null when it does not apply. */
  monodromy(path: SuitePath): { factor: ComplexDouble; nu: [number, number] } | null;
}
