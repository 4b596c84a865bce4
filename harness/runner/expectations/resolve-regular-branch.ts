import type { Suite } from '../../../shared/schemas/suite-schema';
import { parseSubject } from '../../expressions/parse-subject';
import type { SubjectExpr } from '../../expressions/subject-expr';
import { BigComplex } from '../../reference/complex/big-complex';
import type { Point } from '../../reference/continuation/continuation-path';
import { parseDouble } from '../../reference/numbers/parse-double';
import { branchContinuation } from './branch-continuation';
import { CutGeometry } from './cut-geometry';
import { principalPower } from './principal-power';
import type { ReferenceCache } from '../reference-cache/reference-cache';
import type { RegularBranch } from './regular-branch';
import { REGULAR_TUNING } from './regular-tuning';
import { rootSheets } from './subject-sheet-family';
import type { WireComplex } from '../../../shared/wire-complex';
import { formatComplexText } from '../../../shared/format-complex-text';

/** The first step of a regular expectation: the suite's branch read exactly, with C = f0/P(z0) and its description. */
export function resolveRegularBranch(suite: Suite, cache: ReferenceCache, cacheKey: string): RegularBranch {
  const branch = suite.branch;
  if (branch.kind !== 'regular') throw new TypeError('regularExpectation needs a regular branch');
  const continuation = branchContinuation(branch);
  const { g, nu, z0, start } = continuation;
  const gExpr = parseSubject(branch.g);
  const nuText = typeof branch.nu === 'string' ? { re: branch.nu, im: '0' } : branch.nu;
  const gPow: SubjectExpr = nu.im.isZero()
    ? { kind: 'power', base: gExpr, exponent: nu.re }
    : { kind: 'complexPower', base: gExpr, exponent: { kind: 'const', re: nu.re, im: nu.im } };
  const f0 = start.kind === 'value' ? start.f0 : null;

  // C = f0 / P(z0), exactly enough; none when the branch is named by k (the continuation then carries the k).
  let C: BigComplex | null = null;
  if (f0) {
    const p0 = principalPower({ gPow }, new BigComplex(z0[0].toBigFloat(256), z0[1].toBigFloat(256)));
    const n = p0.norm();
    const num = new BigComplex(f0[0].toBigFloat(256), f0[1].toBigFloat(256)).mul(p0.conj());
    C = new BigComplex(num.re.div(n, REGULAR_TUNING.bits), num.im.div(n, REGULAR_TUNING.bits));
  }
  // ASCII signs: this text is also each finding's rule, which the CSV and JUnit outputs carry.
  const text = (w: WireComplex) => formatComplexText(w, { ascii: true });
  const nuShown = nuText.im === '0' ? nuText.re : text(nuText);
  const fixedBy = branch.f0 ? `f0 = ${text(branch.f0)}` : `k = ${branch.k}`;
  return {
    suite,
    branch,
    cache,
    cacheKey,
    nuText,
    nu,
    nuDouble: [parseDouble(nuText.re), parseDouble(nuText.im)],
    gPow,
    singular: g.singularities(),
    geometry: new CutGeometry(branch),
    continuation,
    z0: [parseDouble(branch.z0.re), parseDouble(branch.z0.im)] as Point,
    C,
    CDouble: C ? [C.re.toDouble(), C.im.toDouble()] : [1, 0],
    description: `the regular branch of (${branch.g})^(${nuShown}) with ${fixedBy} at z0 = ${text(branch.z0)}`,
    sheetKs: nu.im.isZero() && nu.re.den <= 64n ? rootSheets(Number(nu.re.den)) : [-3, -2, -1, 1, 2, 3],
    factors: new Map(),
    continued: new Map(),
    pathValues: new WeakMap(),
    refusals: new Map(),
  };
}
