/**
 * Double-double arithmetic: a value hi + lo with |lo| ≤ ulp(hi)/2, about 106 bits, on plain
 * doubles (T. J. Dekker 1971; the algorithms are common practice, as in Bailey's QD library).
 * JavaScript has no fused multiply-add, so exact products use Veltkamp's split; callers keep
 * operands below 2^995 in magnitude so the split cannot overflow, and above 2^−900 so products
 * stay normal. Relative error of one operation: add of like signs, mul, div, sqrt ≤ ~2^−104.
 *
 * Operands and results are scalars: each operation takes (hi, lo) pairs as separate numbers,
 * returns the result's hi and leaves its lo in `dd.lo`, to be read before the next operation.
 * Returning a two-element array per operation cost a fresh allocation each time: on the bench's
 * nine-function mix (npm run bench:reference) the array form took 1.20 µs a point, ~40 operations,
 * and a mul-then-add chain measured 41 ns an iteration against 28 ns in this form.
 */
const SPLITTER = 134217729; // 2^27 + 1

/** The rounding error of p = fl(a·b), exactly: a·b − p, by Veltkamp's split (Dekker). */
function productError(a: number, b: number, p: number): number {
  let t = SPLITTER * a;
  const ah = t - (t - a);
  const al = a - ah;
  t = SPLITTER * b;
  const bh = t - (t - b);
  const bl = b - bh;
  return ah * bh - p + ah * bl + al * bh + al * bl;
}

export const dd = {
  /** The low part of the last result. */
  lo: 0,

  /** a + b exactly, as a double-double. */
  twoSum(a: number, b: number): number {
    const s = a + b;
    const bb = s - a;
    dd.lo = a - (s - bb) + (b - bb);
    return s;
  },

  /** a·b exactly, as a double-double. */
  twoProd(a: number, b: number): number {
    const p = a * b;
    dd.lo = productError(a, b, p);
    return p;
  },

  /**
   * (ah + al) + (bh + bl) with one two-sum (QD's "sloppy" addition): error below ~2^−105 of
   * |a| + |b|, which is relative to the sum when the signs agree or cancellation is mild (every
   * use here but two, which take `addCancelling`). A third of the accurate one's flops.
   */
  add(ah: number, al: number, bh: number, bl: number): number {
    const s = ah + bh;
    const bb = s - ah;
    const e = ah - (s - bb) + (bh - bb) + al + bl;
    const h = s + e;
    dd.lo = e - (h - s);
    return h;
  },

  /** (ah + al) + (bh + bl) with two two-sums (the accurate "IEEE" addition), relative to the sum however much cancels. */
  addCancelling(ah: number, al: number, bh: number, bl: number): number {
    const s1 = ah + bh;
    let bb = s1 - ah;
    const s2 = ah - (s1 - bb) + (bh - bb);
    const t1 = al + bl;
    bb = t1 - al;
    const t2 = al - (t1 - bb) + (bl - bb);
    const v = s2 + t1;
    const u1 = s1 + v;
    const u2 = v - (u1 - s1) + t2;
    const h = u1 + u2;
    dd.lo = u2 - (h - u1);
    return h;
  },

  mul(ah: number, al: number, bh: number, bl: number): number {
    const p = ah * bh;
    const e = productError(ah, bh, p) + (ah * bl + al * bh);
    const h = p + e;
    dd.lo = e - (h - p);
    return h;
  },

  /** (ah + al) · b for a double b. */
  mulDouble(ah: number, al: number, b: number): number {
    const p = ah * b;
    const e = productError(ah, b, p) + al * b;
    const h = p + e;
    dd.lo = e - (h - p);
    return h;
  },

  /** One correction step after the double quotient: ~2^−104 relative (QD's "sloppy" division). */
  div(ah: number, al: number, bh: number, bl: number): number {
    const q = ah / bh;
    const p = q * bh;
    const r = ah - p - productError(q, bh, p) + al - q * bl;
    const c = r / bh;
    const h = q + c;
    dd.lo = c - (h - q);
    return h;
  },

  /** Two double-doubles a and b into out as [ah, al, bh, bl]: how the fast tier hands over a complex value or a sine and cosine. */
  storePair(out: Float64Array, ah: number, al: number, bh: number, bl: number): void {
    out[0] = ah;
    out[1] = al;
    out[2] = bh;
    out[3] = bl;
  },

  /** √(ah + al), one Newton correction of the double root; 0 for a non-positive argument. */
  sqrt(ah: number, al: number): number {
    if (ah <= 0) {
      dd.lo = 0;
      return 0;
    }
    const x = Math.sqrt(ah);
    const p = x * x;
    const c = (ah - p - productError(x, x, p) + al) / (2 * x);
    const h = x + c;
    dd.lo = c - (h - x);
    return h;
  },
};
