import type { DemoPrincipalFunction } from '../../harness';
import type { Convention } from '../../shared/schemas/convention-schema';

/**
 * A demo suite's title: the function's name (never "principal" itself: the title adds it), which
 * branch, which convention. A function without cuts is single-valued, so there is no branch to
 * name: "Exponential, single-valued (no cut)", not "Exponential (no cut), principal branch".
 */
export function principalSuiteTitle(fn: DemoPrincipalFunction, convention: Convention): string {
  const branch = fn.cuts.length === 0 ? 'single-valued (no cut)' : 'principal branch';
  return `${fn.title}, ${branch}, ${convention === 'signed-zero' ? 'signed zeros (Annex G)' : 'counter-clockwise continuity'}`;
}
