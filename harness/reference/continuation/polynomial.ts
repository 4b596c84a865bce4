import { BigComplex } from '../complex/big-complex';
import { Rational } from '../numbers/rational';
import { GaussianRational } from './gaussian-rational';

/**
 * A polynomial with exact Gaussian-rational coefficients, lowest degree first. Exact
 * arithmetic is what makes multiplicities of zeros exact (Yun's square-free decomposition),
 * and the multiplicity decides whether a zero is a branch point of g^ν.
 */
export class Polynomial {
  readonly c: readonly GaussianRational[];

  constructor(coefficients: readonly GaussianRational[]) {
    let n = coefficients.length;
    while (n > 0 && (coefficients[n - 1] as GaussianRational).isZero()) n--;
    this.c = coefficients.slice(0, n);
  }

  static constant(a: GaussianRational): Polynomial {
    return new Polynomial([a]);
  }

  static readonly Z = new Polynomial([GaussianRational.ZERO, GaussianRational.ONE]);
  static readonly ONE = new Polynomial([GaussianRational.ONE]);

  degree(): number {
    return this.c.length - 1;
  }

  isZero(): boolean {
    return this.c.length === 0;
  }

  lead(): GaussianRational {
    return this.c[this.c.length - 1] ?? GaussianRational.ZERO;
  }

  add(b: Polynomial): Polynomial {
    const n = Math.max(this.c.length, b.c.length);
    const out: GaussianRational[] = [];
    for (let i = 0; i < n; i++) out.push((this.c[i] ?? GaussianRational.ZERO).add(b.c[i] ?? GaussianRational.ZERO));
    return new Polynomial(out);
  }

  sub(b: Polynomial): Polynomial {
    return this.add(b.scale(GaussianRational.ONE.negate()));
  }

  scale(a: GaussianRational): Polynomial {
    return new Polynomial(this.c.map((x) => x.mul(a)));
  }

  mul(b: Polynomial): Polynomial {
    if (this.isZero() || b.isZero()) return new Polynomial([]);
    const out: GaussianRational[] = Array.from({ length: this.c.length + b.c.length - 1 }, () => GaussianRational.ZERO);
    this.c.forEach((x, i) => b.c.forEach((y, j) => (out[i + j] = (out[i + j] as GaussianRational).add(x.mul(y)))));
    return new Polynomial(out);
  }

  pow(n: number): Polynomial {
    let r = Polynomial.ONE;
    for (let i = 0; i < n; i++) r = r.mul(this);
    return r;
  }

  /** Quotient and remainder of division by a non-zero b. */
  divmod(b: Polynomial): [Polynomial, Polynomial] {
    let rem = this as Polynomial;
    const q: GaussianRational[] = [];
    while (!rem.isZero() && rem.degree() >= b.degree()) {
      const k = rem.degree() - b.degree();
      const f = rem.lead().div(b.lead());
      q[k] = f;
      const shifted = new Polynomial([
        ...Array.from({ length: k }, () => GaussianRational.ZERO),
        ...b.c.map((x) => x.mul(f)),
      ]);
      rem = rem.sub(shifted);
    }
    return [new Polynomial(Array.from({ length: q.length }, (_, i) => q[i] ?? GaussianRational.ZERO)), rem];
  }

  monic(): Polynomial {
    return this.isZero() ? this : this.scale(GaussianRational.ONE.div(this.lead()));
  }

  gcd(b: Polynomial): Polynomial {
    let x: Polynomial = this;
    let y: Polynomial = b;
    while (!y.isZero()) [x, y] = [y, x.divmod(y)[1]];
    return x.monic();
  }

  derivative(): Polynomial {
    return new Polynomial(this.c.slice(1).map((x, i) => x.mul(new GaussianRational(new Rational(BigInt(i + 1))))));
  }

  /** Yun's algorithm: [factor, multiplicity] with square-free, pairwise coprime monic factors. */
  squareFree(): [Polynomial, number][] {
    const out: [Polynomial, number][] = [];
    if (this.degree() < 1) return out;
    const d = this.derivative();
    let a = this.gcd(d);
    let b = this.divmod(a)[0];
    let c = d.divmod(a)[0];
    let dd = c.sub(b.derivative());
    for (let i = 1; b.degree() >= 1; i++) {
      a = b.gcd(dd);
      if (a.degree() >= 1) out.push([a, i]);
      b = b.divmod(a)[0];
      c = dd.divmod(a)[0];
      dd = c.sub(b.derivative());
    }
    return out;
  }

  /** p(z) by Horner's rule, truncating to `bits` after each step. */
  evaluate(z: BigComplex, bits: number): BigComplex {
    let r = new BigComplex(this.lead().re.toBigFloat(bits), this.lead().im.toBigFloat(bits));
    for (let i = this.c.length - 2; i >= 0; i--)
      r = r
        .mul(z)
        .add((this.c[i] as GaussianRational).toBigComplex(bits))
        .truncate(bits);
    return r;
  }

  /**
   * Roots of a square-free polynomial in doubles by the Aberth–Ehrlich iteration (common practice),
   * for geometry only: which cut a zero lies on, how far a path passes from it.
   */
  roots(): [number, number][] {
    const n = this.degree();
    if (n < 1) return [];
    const coeffs = this.c.map((x) => x.toDoubles());
    const [lr, li] = coeffs[n] as [number, number];
    const norm = coeffs.map(([r, i]) => div([r, i], [lr, li]));
    const bound = 1 + Math.max(...norm.slice(0, n).map(([r, i]) => Math.hypot(r, i)));
    let zs: [number, number][] = Array.from({ length: n }, (_, k) => {
      const a = (2 * Math.PI * k) / n + 0.4;
      return [bound * 0.5 * Math.cos(a), bound * 0.5 * Math.sin(a)];
    });
    for (let iter = 0; iter < 500; iter++) {
      let moved = 0;
      zs = zs.map((z, k) => {
        const [p, dp] = hornerWithDerivative(norm, z);
        if (p[0] === 0 && p[1] === 0) return z;
        const ratio = div(p, dp);
        let s: [number, number] = [0, 0];
        zs.forEach((w, j) => {
          if (j !== k) s = add(s, div([1, 0], sub(z, w)));
        });
        const step = div(ratio, sub([1, 0], mul(ratio, s)));
        moved = Math.max(moved, Math.hypot(step[0], step[1]) / Math.max(1, Math.hypot(z[0], z[1])));
        return sub(z, step);
      });
      if (moved < 1e-17) break;
    }
    return zs;
  }
}

type C = [number, number];
const add = (a: C, b: C): C => [a[0] + b[0], a[1] + b[1]];
const sub = (a: C, b: C): C => [a[0] - b[0], a[1] - b[1]];
const mul = (a: C, b: C): C => [a[0] * b[0] - a[1] * b[1], a[0] * b[1] + a[1] * b[0]];
function div(a: C, b: C): C {
  const n = b[0] * b[0] + b[1] * b[1];
  return [(a[0] * b[0] + a[1] * b[1]) / n, (a[1] * b[0] - a[0] * b[1]) / n];
}
function hornerWithDerivative(c: C[], z: C): [C, C] {
  let p = c[c.length - 1] as C;
  let dp: C = [0, 0];
  for (let i = c.length - 2; i >= 0; i--) {
    dp = add(mul(dp, z), p);
    p = add(mul(p, z), c[i] as C);
  }
  return [p, dp];
}
