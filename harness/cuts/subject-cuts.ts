import type { BranchSpec } from '../../shared/schemas/branch-spec-schema';
import type { SubjectExpr } from '../expressions/subject-expr';
import { parseDouble } from '../reference/numbers/parse-double';
import { catalogueCuts } from './catalogue-cuts';
import type { PlaneCut } from './plane-cut';

/**
 * Where a suite expects its subject's cuts, when that is known without solving anything:
 * a regular branch brings its layout (each polyline's segments; the last one continued to ∞
 * when the layout says so; a one-point cut, which the continuation engine refuses, adds
 * nothing); a principal branch whose subject is one catalogue function of z
 * itself (`sqrt(z)`, `pow(z, 1/3)`, `nthroot(z, 5)`) has that function's cuts. Any other
 * principal subject (`sqrt(z^2 - 1)`) returns null: its cuts are preimages we do not compute.
 */
export function subjectCuts(expr: SubjectExpr, branch: BranchSpec): PlaneCut[] | null {
  if (branch.kind === 'regular') {
    const cuts: PlaneCut[] = [];
    branch.cuts.forEach((cut, c) => {
      const points = cut.points.map((p): [number, number] => [parseDouble(p.re), parseDouble(p.im)]);
      for (let i = 0; i + 1 < points.length; i += 1) {
        const last = i + 2 === points.length;
        cuts.push({
          from: points[i]!,
          to: points[i + 1]!,
          toInfinity: last && cut.to_infinity,
          ccwSide: null,
          label: `cut ${c + 1} piece ${i + 1}`,
        });
      }
    });
    return cuts;
  }
  const onZ = (e: SubjectExpr): boolean => e.kind === 'z';
  if (expr.kind === 'call' && onZ(expr.arg)) return catalogueCuts(expr.fn);
  if (expr.kind === 'nthroot' && onZ(expr.arg)) return catalogueCuts('nthroot');
  if (expr.kind === 'power' && onZ(expr.base)) return expr.exponent.isInteger() ? [] : catalogueCuts('pow');
  if (expr.kind === 'complexPower' && onZ(expr.base)) return catalogueCuts('pow');
  return null;
}
