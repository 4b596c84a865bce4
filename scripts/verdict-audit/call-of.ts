import { catalogue, type Rational, type SubjectExpr } from '../../harness';
import type { AuditPoint } from './independent-verdict';

/** A cut for JSON: ±Infinity as strings (JSON has no infinities). */
const wireCut = ({ axis, from, to }: { axis: 'real' | 'imaginary'; from: number; to: number }) => ({
  axis,
  from: String(from),
  to: String(to),
});

/** A constant sub-expression ("0.5 + 2i") as exact rationals, or null when it depends on z. */
function constantOf(e: SubjectExpr): { re: Rational; im: Rational } | null {
  if (e.kind === 'const') return { re: e.re, im: e.im };
  if (e.kind === 'neg') {
    const a = constantOf(e.a);
    return a && { re: a.re.negate(), im: a.im.negate() };
  }
  if (e.kind === 'add' || e.kind === 'sub' || e.kind === 'mul') {
    const [a, b] = [constantOf(e.a), constantOf(e.b)];
    if (!a || !b) return null;
    if (e.kind === 'add') return { re: a.re.add(b.re), im: a.im.add(b.im) };
    if (e.kind === 'sub') return { re: a.re.sub(b.re), im: a.im.sub(b.im) };
    return { re: a.re.mul(b.re).sub(a.im.mul(b.im)), im: a.re.mul(b.im).add(a.im.mul(b.re)) };
  }
  return null;
}

/** What the reference engine's catalogue says about a single call, for mpmath's side: the function, its exponent, its cuts. */
export function callOf(expr: SubjectExpr): Omit<AuditPoint, 'z' | 'convention'> | null {
  const powerCuts = (fn: string) => {
    const ref = catalogue[fn];
    return ref?.kind === 'power' ? ref.cuts.map(wireCut) : [];
  };
  if (expr.kind === 'nthroot' && expr.arg.kind === 'z')
    return { fn: 'nthroot', n: expr.n, cuts: powerCuts('nthroot'), inner: null };
  if (expr.kind === 'power' && expr.base.kind === 'z')
    return { fn: 'pow', w: expr.exponent.toString(), cuts: powerCuts('pow'), inner: null };
  if (expr.kind === 'complexPower' && expr.base.kind === 'z') {
    const w = constantOf(expr.exponent);
    if (!w) return null;
    return { fn: 'pow', w: [w.re.toString(), w.im.toString()], cuts: powerCuts('pow'), inner: null };
  }
  if (expr.kind === 'call' && expr.arg.kind === 'z') {
    const ref = catalogue[expr.fn];
    if (!ref) return null;
    if (ref.kind === 'plain') return { fn: expr.fn, cuts: ref.fn.cuts.map(wireCut), inner: null };
    if (ref.kind === 'reciprocal')
      return {
        fn: expr.fn,
        cuts: [],
        inner: { fn: ref.fn.inner.name, cuts: ref.fn.inner.cuts.map(wireCut) },
      };
    return { fn: expr.fn, cuts: powerCuts(expr.fn), inner: null };
  }
  return null;
}
