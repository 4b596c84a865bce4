import { catalogueEntry } from '../../catalogue/catalogue-entry';
import type { BigComplex } from '../complex/big-complex';

/**
 * Where published conventions disagree about a value, the rule the reference engine follows there:
 * a choice, labelled as one on a finding (PointFinding.choice), not a fact every library must share.
 *
 * The reciprocal functions f(z) = g(1/z) — acsc, asec, acot (DLMF 4.23.7–9) and acsch, asech,
 * acoth (DLMF 4.37.7–9) — are defined there for z ≠ 0 only. At 0 each has a singularity whose
 * limit depends on the direction of approach: |acsc|, |asec|, |acsch| and |asech| grow without
 * bound with a finite part that turns with the direction, acot tends to ±π/2 and acoth to ±iπ/2.
 * ISO/IEC 9899:2011 Annex G has no such functions (C has no csec, cacot…), so it fixes nothing
 * here either. The engine pushes the formula through IEEE 754 arithmetic: 1/(x + iy) at x = y = 0
 * is (x − iy)/|z|² with each signed part divided by +0, copysign(∞, x) + i·copysign(∞, −y)
 * (big-complex.ts, `reciprocal`), and g at that infinity is Annex G's special value (casin via
 * casinh, cacos, catan via catanh, casinh, cacosh, catanh). So acoth(+0 + 0i) = atanh(∞ − i∞) =
 * +0 − iπ/2 and acot(−0 + 0i) = −π/2, where mpmath 1.3 (Debian's, checked on 5 December 2026)
 * answers acoth(0) = iπ/2 and acot(0) = π/2 whatever the zero signs, and raises an error for acsc,
 * asec, acsch and asech at 0.
 */
export function reciprocalAtZeroChoice(fn: string, z: BigComplex): string | null {
  const entry = catalogueEntry(fn)?.reference;
  if (entry?.kind !== 'reciprocal' || !z.isZero()) return null;
  const inner = entry.fn.inner.name;
  return (
    `a choice: ${fn} z = ${inner}(1/z) is defined for z ≠ 0 only (DLMF), its limit at 0 depends on the direction, ` +
    `and Annex G has no ${fn}; the expected value takes 1/(x + iy) at x = y = 0 as copysign(∞, x) + i·copysign(∞, −y) ` +
    `(each signed part over +0, IEEE 754) and ${inner} there by Annex G's special values`
  );
}
