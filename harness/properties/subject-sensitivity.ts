import type { ComplexPair } from '../adapters/complex-pair';
import { catalogueEntry } from '../catalogue/catalogue-entry';
import type { SubjectExpr } from '../expressions/subject-expr';
import type { Rational } from '../reference/numbers/rational';

const approx = (r: Rational): number => Number(r.num) / Number(r.den);

/**
 * |z·f′(z)| for a subject that is one function of z itself: a catalogue function (its entry's
 * `sensitivity`, from the DLMF derivative), a power z^w (|w|·|f|) or nthroot(z, n) (|f|/n), with
 * `fz` the value of f at z. Zero for anything else (a composed subject such as sqrt(z^2 - 1)),
 * whose laws then allow the value's own rounding only, as before the sensitivity was added.
 */
export function subjectSensitivity(expr: SubjectExpr, z: ComplexPair, fz: ComplexPair): number {
  const size = Math.hypot(...fz);
  if (expr.kind === 'call' && expr.arg.kind === 'z') {
    const s = catalogueEntry(expr.fn)?.sensitivity?.(z) ?? 0;
    // ∞/∞ where |z| and |1 ± z²| both overflow (asin at 1.7e308(1 + i)): there the inverse
    // functions are well conditioned (|z·f′| → 1 or 0), and 0 leaves the value its rounding only.
    return Number.isNaN(s) ? 0 : s;
  }
  if (expr.kind === 'nthroot' && expr.arg.kind === 'z') return size / Math.abs(expr.n);
  if (expr.kind === 'power' && expr.base.kind === 'z') return Math.abs(approx(expr.exponent)) * size;
  if (expr.kind === 'complexPower' && expr.base.kind === 'z' && expr.exponent.kind === 'const')
    return Math.hypot(approx(expr.exponent.re), approx(expr.exponent.im)) * size;
  return 0;
}
