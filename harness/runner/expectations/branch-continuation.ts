import type { BranchSpec } from '../../../shared/schemas/branch-spec-schema';
import { parseSubject } from '../../expressions/parse-subject';
import type { ExactPoint } from '../../reference/continuation/continuation-path';
import type { ContinuationRequest } from '../../reference/continuation/continuation-request';
import { FactoredFunction } from '../../reference/continuation/factored-function';
import { parseExact } from '../../reference/continuation/parse-exact';
import type { WireComplex } from '../../../shared/wire-complex';

/**
 * What every continuation of a suite's regular branch shares — g factored, ν, z0, the value or
 * sheet at z0 and the cuts — read exactly from the suite; a path and its t complete a request.
 */
export function branchContinuation(
  branch: Extract<BranchSpec, { kind: 'regular' }>,
): Omit<ContinuationRequest, 'path' | 'at'> {
  const exactPoint = (c: WireComplex, name: string): ExactPoint => [
    parseExact(c.re, `${name}.re`),
    parseExact(c.im, `${name}.im`),
  ];
  const nuText = typeof branch.nu === 'string' ? { re: branch.nu, im: '0' } : branch.nu;
  return {
    g: FactoredFunction.fromSubject(parseSubject(branch.g)),
    nu: { re: parseExact(nuText.re, 'nu.re'), im: parseExact(nuText.im, 'nu.im') },
    z0: exactPoint(branch.z0, 'z0'),
    start: branch.f0 ? { kind: 'value', f0: exactPoint(branch.f0, 'f0') } : { kind: 'sheet', k: branch.k as number },
    cuts: branch.cuts.map((c, i) => ({
      points: c.points.map((p, j) => exactPoint(p, `cuts.${i}.points.${j}`)),
      toInfinity: c.to_infinity,
    })),
  };
}
