/**
 * Double-double arithmetic: a value hi + lo with |lo| ≤ ulp(hi)/2, about 106 bits, on plain
 * doubles (T. J. Dekker 1971; the algorithms are common practice, as in Bailey's QD library).
 * JavaScript has no fused multiply-add, so exact products use Veltkamp's split; callers keep
 * operands below 2^995 in magnitude so the split cannot overflow, and above 2^−900 so products
 * stay normal. Relative error of one operation: add of like signs, mul, div, sqrt ≤ ~2^−104.
 */
export type DD = [number, number];

const SPLITTER = 134217729; // 2^27 + 1

function twoSum(a: number, b: number): DD {
  const s = a + b;
  const bb = s - a;
  return [s, a - (s - bb) + (b - bb)];
}

function quickTwoSum(a: number, b: number): DD {
  const s = a + b;
  return [s, b - (s - a)];
}

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

function twoProd(a: number, b: number): DD {
  const p = a * b;
  return [p, productError(a, b, p)];
}

/** a + (b0 + b1) in double-double with two two-sums (the accurate "IEEE" addition). */
function addParts(a: DD, b0: number, b1: number): DD {
  const s1 = a[0] + b0;
  let bb = s1 - a[0];
  const s2 = a[0] - (s1 - bb) + (b0 - bb);
  const t1 = a[1] + b1;
  bb = t1 - a[1];
  const t2 = a[1] - (t1 - bb) + (b1 - bb);
  const v = s2 + t1;
  const u1 = s1 + v;
  const u2 = v - (u1 - s1) + t2;
  const h = u1 + u2;
  return [h, u2 - (h - u1)];
}

export const dd = {
  twoSum,
  twoProd,

  /** Accurate addition (two two-sums), written on scalars: one allocation instead of four. */
  add(a: DD, b: DD): DD {
    return addParts(a, b[0], b[1]);
  },

  sub(a: DD, b: DD): DD {
    return addParts(a, -b[0], -b[1]);
  },

  mul(a: DD, b: DD): DD {
    const p = a[0] * b[0];
    const e = productError(a[0], b[0], p) + (a[0] * b[1] + a[1] * b[0]);
    const h = p + e;
    return [h, e - (h - p)];
  },

  mulDouble(a: DD, b: number): DD {
    return dd.mul(a, [b, 0]);
  },

  /** One correction step after the double quotient: ~2^−104 relative (QD's "sloppy" division). */
  div(a: DD, b: DD): DD {
    const q1 = a[0] / b[0];
    const [p, e] = twoProd(q1, b[0]);
    const r = a[0] - p - e + a[1] - q1 * b[1];
    return quickTwoSum(q1, r / b[0]);
  },

  sqrt(a: DD): DD {
    if (a[0] <= 0) return [0, 0];
    const x = Math.sqrt(a[0]);
    const [p, e] = twoProd(x, x);
    const correction = (a[0] - p - e + a[1]) / (2 * x);
    return quickTwoSum(x, correction);
  },

  neg(a: DD): DD {
    return [-a[0], -a[1]];
  },

  abs(a: DD): DD {
    return a[0] < 0 ? [-a[0], -a[1]] : a;
  },

  scale(a: DD, k: number): DD {
    return [a[0] * k, a[1] * k];
  },
};
