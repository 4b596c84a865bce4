import { SubjectError } from '../../expressions/subject-error';
import type { SubjectExpr } from '../../expressions/subject-expr';
import { BigComplex } from '../complex/big-complex';
import { BigFloat } from '../numbers/big-float';
import { GaussianRational } from './gaussian-rational';
import { Polynomial } from './polynomial';

const MAX_DEGREE = 32;

/** A zero (order > 0) or pole (order < 0) of g, located in doubles; the order is exact. */
export interface Singularity {
  at: [number, number];
  order: number;
}

/**
 * g(z) = P(z)/Q(z) · exp(A(z)/B(z)) with exact polynomials, P/Q and A/B in lowest terms:
 * the form `continue` accepts. The exp factor has no zeros or poles (its ν-th power is
 * single-valued), so branch points are the zeros and poles of P/Q; the zeros of B are
 * essential singularities a path must still avoid.
 */
export class FactoredFunction {
  private constructor(
    readonly P: Polynomial,
    readonly Q: Polynomial,
    readonly A: Polynomial,
    readonly B: Polynomial,
  ) {}

  /** Builds g from a parsed subject; throws SubjectError for anything outside the form above. */
  static fromSubject(expr: SubjectExpr): FactoredFunction {
    const r = build(expr);
    const g = r.P.gcd(r.Q);
    const e = r.A.gcd(r.B);
    const P = r.P.divmod(g)[0];
    const Q = r.Q.divmod(g)[0];
    if (P.isZero()) throw new SubjectError('g is identically zero');
    if (Math.max(P.degree(), Q.degree()) > MAX_DEGREE) throw new SubjectError(`g has degree above ${MAX_DEGREE}`);
    return new FactoredFunction(
      P,
      Q,
      r.A.isZero() ? r.A : r.A.divmod(e)[0],
      r.A.isZero() ? Polynomial.ONE : r.B.divmod(e)[0],
    );
  }

  /** Zeros and poles of g with exact orders (square-free parts of P and Q, each root located numerically). */
  singularities(): Singularity[] {
    const out: Singularity[] = [];
    for (const [factor, m] of this.P.squareFree()) for (const at of factor.roots()) out.push({ at, order: m });
    for (const [factor, m] of this.Q.squareFree()) for (const at of factor.roots()) out.push({ at, order: -m });
    return out;
  }

  /** Points where the exp factor is singular (zeros of B). */
  essentialSingularities(): [number, number][] {
    return this.B.squareFree().flatMap(([factor]) => factor.roots());
  }

  /** [P(z), Q(z), A(z)/B(z)] at working precision. */
  parts(z: BigComplex, bits: number): [BigComplex, BigComplex, BigComplex] {
    const p = this.P.evaluate(z, bits);
    const q = this.Q.evaluate(z, bits);
    if (this.A.isZero()) return [p, q, new BigComplex(BigFloat.ZERO, BigFloat.ZERO)];
    const a = this.A.evaluate(z, bits);
    const b = this.B.evaluate(z, bits);
    const n = b.norm();
    const num = a.mul(b.conj());
    return [p, q, new BigComplex(num.re.div(n, bits), num.im.div(n, bits))];
  }
}

interface Parts {
  P: Polynomial;
  Q: Polynomial;
  A: Polynomial;
  B: Polynomial;
}

const ZERO_POLY = new Polynomial([]);

function refuse(what: string): never {
  throw new SubjectError(`g must be built from z, numbers, i, + − × ÷, integer powers and exp of such terms; ${what}`);
}

function build(e: SubjectExpr): Parts {
  switch (e.kind) {
    case 'z':
      return { P: Polynomial.Z, Q: Polynomial.ONE, A: ZERO_POLY, B: Polynomial.ONE };
    case 'const':
      return {
        P: Polynomial.constant(new GaussianRational(e.re, e.im)),
        Q: Polynomial.ONE,
        A: ZERO_POLY,
        B: Polynomial.ONE,
      };
    case 'neg': {
      const a = build(e.a);
      return { ...a, P: a.P.scale(GaussianRational.ONE.negate()) };
    }
    case 'add':
    case 'sub': {
      const a = build(e.a);
      const b = build(e.b);
      if (!a.A.isZero() || !b.A.isZero()) refuse('a sum may not contain exp factors');
      const bp = e.kind === 'add' ? b.P : b.P.scale(GaussianRational.ONE.negate());
      return { P: a.P.mul(b.Q).add(bp.mul(a.Q)), Q: a.Q.mul(b.Q), A: ZERO_POLY, B: Polynomial.ONE };
    }
    case 'mul':
    case 'div': {
      const a = build(e.a);
      const b = build(e.b);
      if (e.kind === 'div' && b.P.isZero()) refuse('it divides by zero');
      const bA = e.kind === 'mul' ? b.A : b.A.scale(GaussianRational.ONE.negate());
      return {
        P: e.kind === 'mul' ? a.P.mul(b.P) : a.P.mul(b.Q),
        Q: e.kind === 'mul' ? a.Q.mul(b.Q) : a.Q.mul(b.P),
        A: a.A.mul(b.B).add(bA.mul(a.B)),
        B: a.B.mul(b.B),
      };
    }
    case 'power': {
      if (!e.exponent.isInteger() || e.exponent.num > 64n || e.exponent.num < -64n) {
        refuse(`the power ^${e.exponent.toString()} is not an integer of at most 64 (ν carries non-integer powers)`);
      }
      const k = Number(e.exponent.num);
      const a = build(e.base);
      const m = Math.abs(k);
      const scaled = a.A.scale(new GaussianRational(e.exponent));
      return k >= 0
        ? { P: a.P.pow(m), Q: a.Q.pow(m), A: scaled, B: a.B }
        : { P: a.Q.pow(m), Q: a.P.pow(m), A: scaled, B: a.B };
    }
    case 'call': {
      if (e.fn !== 'exp') refuse(`"${e.fn}" is not allowed`);
      const a = build(e.arg);
      if (!a.A.isZero()) refuse('exp of an exp is not allowed');
      return { P: Polynomial.ONE, Q: Polynomial.ONE, A: a.P, B: a.Q };
    }
    default:
      return refuse(`"${e.kind}" is not allowed`);
  }
}
