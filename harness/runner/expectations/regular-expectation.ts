import type { Suite } from '../../../shared/schemas/suite-schema';
import type { Expectation } from './expectation';
import type { ReferenceCache } from '../reference-cache/reference-cache';
import { regularAlternatives } from './regular-alternatives';
import { regularColumn } from './regular-column';
import { regularMonodromy } from './regular-monodromy';
import { resolveRegularBranch } from './resolve-regular-branch';

/**
 * The expectation of a regular suite: the branch of g(z)^ν fixed by f0 (or k) at z0 on the
 * plane cut along the layout, at each point as a correctly rounded double (to within the
 * reference's bound). See docs/regular-branches.md.
 *
 * Every branch value is C·P(z)·e^{2πiνk} for an integer k, where P is the principal g^ν
 * (evaluated exactly at the point's bits) and C = f0/P(z0) (1 when the branch is given by k).
 * The continuation engine (harness/reference/continuation, called through its typed API with
 * exact numbers and angles) decides k: it follows the branch from z0 to the point — once along a
 * whole circle, segment or polyline when it can, else along a straight line (or a bent one
 * around a zero or pole) — and k is the sheet whose value is nearest. Its answer only has to
 * tell sheets apart; the value itself is the exact product, rounded once.
 *
 * The steps, each taking the resolved branch: resolveRegularBranch (the suite read exactly),
 * regularColumn (values along a path, by continueAlongPath / continueToPoint, probePoint near a
 * cut, nearestSheet and sheetFactor), regularAlternatives (other side, flipped zero, other
 * sheets, on-cut limits by sideOnCut) and regularMonodromy (closed paths).
 * Output zero signs are not compared: a regular branch does not fix them.
 */
export function regularExpectation(suite: Suite, cache: ReferenceCache, cacheKey: string): Expectation {
  const branch = resolveRegularBranch(suite, cache, cacheKey);
  return {
    zeroSigns: false,
    description: `${branch.description}, cut along ${branch.branch.cuts.length} cut(s), ${suite.convention} on the cuts`,
    expected: (path, points) => regularColumn(branch, path, points),
    alternatives: (_path, points, index, expected) => regularAlternatives(branch, points, index, expected),
    monodromy: (path) => regularMonodromy(branch, path),
  };
}
