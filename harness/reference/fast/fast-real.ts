import { BigFloat } from '../numbers/big-float';
import { FixedTables } from '../real/fixed-tables';
import { type DD, dd } from './double-double';

/**
 * Real kernels in double-double for the fast tier, mirroring the bigint kernels' reductions
 * (tables at j/64, series in |d| ≤ 1/128) with the same tables, converted once from the bigint
 * engine. Each returns a relative error below ~2^−96 for the inputs it accepts, or null where it
 * cannot promise that (the caller then falls back to the bigint engine):
 * - log: x within 2^−30 of 1 only through log1p of an accurate x − 1;
 * - exp: |x| ≤ 708 (beyond, the result is not a normal double anyway);
 * - sinCos: |x| ≤ 2^20 and x not within 2^−30 of a multiple of π/2.
 */
const F = 192;
const T = FixedTables.at(F);
const toDD = (v: bigint): DD => {
  const b = BigFloat.fromBigInt(v, -F);
  const hi = b.toDouble();
  return [hi, b.sub(BigFloat.fromDouble(hi)).toDouble()];
};
const LOG = T.logTable.map(toDD);
const ATAN = T.atanTable.map(toDD);
const SIN = T.sinTable.map(toDD);
const COS = T.cosTable.map(toDD);
const EXP = T.expTable.map(toDD);
const INV_ODD = T.inverseOdd.slice(0, 12).map(toDD);
const INV_FACT = T.inverseFactorial.slice(0, 20).map(toDD);
const LN2 = toDD(FixedTables.ln2(F));
const PI = toDD(FixedTables.pi(F));
const HALF_PI: DD = [PI[0] / 2, PI[1] / 2];
const PIO2_BITS = FixedTables.pi(F + 64) >> 1n;
const P1 = BigFloat.fromBigInt(PIO2_BITS, -(F + 64)).toDouble();
const P2 = BigFloat.fromBigInt(PIO2_BITS, -(F + 64))
  .sub(BigFloat.fromDouble(P1))
  .toDouble();
const P3 = BigFloat.fromBigInt(PIO2_BITS, -(F + 64))
  .sub(BigFloat.fromDouble(P1))
  .sub(BigFloat.fromDouble(P2))
  .toDouble();
const TWO_M30 = 2 ** -30;

/**
 * Σ (±w)^i · c_i by Horner's rule, c from a table. Written out on scalars because it is the
 * hot loop of every kernel: allocating a pair per step cost ~40% of a complex asin here.
 * Each step is a double-double multiply (Dekker product) and a double-double add of like
 * magnitude, each within ~2^−104 relative.
 */
function horner(w: DD, table: DD[], n: number, step: number, offset: number, alternating: boolean): DD {
  const xh = alternating ? -w[0] : w[0];
  const xl = alternating ? -w[1] : w[1];
  const last = table[offset + step * n] as DD;
  let sh = last[0];
  let sl = last[1];
  let t = SPLIT * xh;
  const xa = t - (t - xh);
  const xb = xh - xa;
  for (let i = n - 1; i >= 0; i--) {
    const p = xh * sh;
    t = SPLIT * sh;
    const sa = t - (t - sh);
    const sb = sh - sa;
    const e = xa * sa - p + xa * sb + xb * sa + xb * sb + (xh * sl + xl * sh);
    const mh = p + e;
    const ml = e - (mh - p);
    const c = table[offset + step * i] as DD;
    const s1 = c[0] + mh;
    const bb = s1 - c[0];
    const s2 = c[0] - (s1 - bb) + (mh - bb) + (c[1] + ml);
    sh = s1 + s2;
    sl = s2 - (sh - s1);
  }
  return [sh, sl];
}

const SPLIT = 134217729;

/** ln(1 + u) relative to u for |u| ≤ 1/64: 2t·Σ t^{2i}/(2i+1), t = u/(2 + u), t² ≤ 2^−14 (8 terms reach 2^−112). */
function log1pSmall(u: DD): DD {
  const t = dd.div(u, dd.add([2, 0], u));
  return dd.scale(dd.mul(t, horner(dd.mul(t, t), INV_ODD, 8, 1, 0, false)), 2);
}

function log(a: DD): DD | null {
  if (!(a[0] > 0) || !Number.isFinite(a[0])) return null;
  let e = Math.floor(Math.log2(a[0]));
  let f = dd.scale(a, 2 ** -e);
  if (f[0] >= 2) {
    f = dd.scale(f, 0.5);
    e += 1;
  } else if (f[0] < 1) {
    f = dd.scale(f, 2);
    e -= 1;
  }
  if (f[0] > Math.SQRT2) {
    f = dd.scale(f, 0.5);
    e += 1;
  }
  const j = Math.round((f[0] - 1) * 64);
  if (e === 0 && j === 0) return log1pSmall(dd.sub(f, [1, 0]));
  const c = 1 + j / 64;
  const u = dd.div(dd.sub(f, [c, 0]), [c, 0]);
  let sum = dd.add(LOG[j + 32] as DD, log1pSmall(u));
  if (e !== 0) sum = dd.add(dd.mulDouble(LN2, e), sum);
  return sum;
}

/** ln(1 + w) for w ≥ 0 given accurately (relative). */
function log1p(w: DD): DD | null {
  if (w[0] < 1 / 128) return log1pSmall(w);
  return log(dd.add([1, 0], w));
}

function exp(a: DD): DD | null {
  if (!(Math.abs(a[0]) <= 708)) return null;
  const k = Math.round(a[0] / LN2[0]);
  const r = dd.sub(a, dd.mulDouble(LN2, k));
  const j = Math.max(-32, Math.min(32, Math.round(r[0] * 64)));
  const d = dd.sub(r, [j / 64, 0]);
  const s = horner(d, INV_FACT, 12, 1, 0, false);
  return dd.scale(dd.mul(EXP[j + 32] as DD, s), 2 ** k);
}

function sinCos(a: DD): [DD, DD] | null {
  let r = a;
  let q = 0;
  if (Math.abs(a[0]) > 0.78) {
    if (!(Math.abs(a[0]) <= 2 ** 20)) return null;
    const k = Math.round(a[0] / P1);
    r = dd.sub(dd.sub(dd.sub(a, dd.twoProd(k, P1)), dd.twoProd(k, P2)), [k * P3, 0]);
    if (Math.abs(r[0]) < TWO_M30) return null;
    q = ((k % 4) + 4) % 4;
  }
  const j = Math.round(r[0] * 64);
  const d = dd.sub(r, [j / 64, 0]);
  const d2 = dd.mul(d, d);
  const sd = dd.mul(d, horner(d2, INV_FACT, 7, 2, 1, true));
  const cd = horner(d2, INV_FACT, 7, 2, 0, true);
  let s = sd;
  let c = cd;
  if (j !== 0) {
    const sj = j < 0 ? dd.neg(SIN[-j] as DD) : (SIN[j] as DD);
    const cj = COS[Math.abs(j)] as DD;
    s = dd.add(dd.mul(sj, cd), dd.mul(cj, sd));
    c = dd.sub(dd.mul(cj, cd), dd.mul(sj, sd));
  }
  if (q === 0) return [s, c];
  if (q === 1) return [c, dd.neg(s)];
  if (q === 2) return [dd.neg(s), dd.neg(c)];
  return [dd.neg(c), s];
}

/** atan t for 0 < t ≤ 1. */
function atanUnit(t: DD): DD {
  const j = Math.round(t[0] * 64);
  if (j === 0) return dd.mul(t, horner(dd.mul(t, t), INV_ODD, 9, 1, 0, true));
  const c = j / 64;
  const d = dd.div(dd.sub(t, [c, 0]), dd.add([1, 0], dd.mulDouble(t, c)));
  return dd.add(ATAN[j] as DD, dd.mul(d, horner(dd.mul(d, d), INV_ODD, 9, 1, 0, true)));
}

/** atan2(y, x) for non-zero y and x. */
function atan2(y: DD, x: DD): DD {
  const ay = dd.abs(y);
  const ax = dd.abs(x);
  let r: DD;
  if (ay[0] <= ax[0]) {
    const a = atanUnit(dd.div(ay, ax));
    r = x[0] > 0 ? a : dd.sub(PI, a);
  } else {
    const a = atanUnit(dd.div(ax, ay));
    r = x[0] > 0 ? dd.sub(HALF_PI, a) : dd.add(HALF_PI, a);
  }
  return y[0] < 0 ? dd.neg(r) : r;
}

/** asinh v for v ≠ 0: sign(v) · ln(1 + |v| + v²/(1 + √(1 + v²))). */
function asinh(v: DD): DD | null {
  const a = dd.abs(v);
  const a2 = dd.mul(a, a);
  const w = dd.add(a, dd.div(a2, dd.add([1, 0], dd.sqrt(dd.add([1, 0], a2)))));
  const r = log1p(w);
  if (!r) return null;
  return v[0] < 0 ? dd.neg(r) : r;
}

export const fastReal = { log, log1p, exp, sinCos, atan2, asinh, HALF_PI, PI };
