import { type DD, dd } from './double-double';
import { fastReal } from './fast-real';

/**
 * The fast tier of Ziv's strategy for correctly rounded doubles: the same cancellation-free
 * formulas as the bigint engine (Kahan's for the inverse functions), evaluated in double-double.
 * Kernel errors are below ~2^−96 relative and each formula chains fewer than twenty of them, so
 * each part is within 2^−85 of the true value; the check below uses a bound 2^15 wider, 2^−70,
 * and declines (null) whenever that interval straddles a rounding boundary, so a rounding is only
 * returned when it is settled. Inputs outside its domain — a zero, infinite or NaN part, a part
 * outside [2^−400, 2^400], a known cancellation (|z| within 2^−30 of 1 for log and atanh) —
 * also return null; the caller then uses the bigint engine. The outside-source tests run on the
 * public entry point, and a dedicated test compares this tier with the bigint engine.
 *
 * Measured here (npm run bench:reference, 9 functions × 10,000 points, 2 cores shared with other
 * work, load average ~3): the bigint engine alone gave 69,333 doubles/s, 1.49× mpmath at 53 bits,
 * far from the 10× wanted; with this tier 254,000–603,000 doubles/s, 11–23× mpmath over six runs.
 * Writing the Horner loop (then add, subtract and multiply) on scalars, one allocation per
 * operation instead of up to four, took the per-function times of a first run from 0.9–6.1 µs
 * to 0.9–3.2 µs; a warm call on the bench's mix measured ~1.7 µs.
 */
const RELATIVE_BOUND = 2 ** -70;
const RANGE_LOW = 2 ** -400;
const RANGE_HIGH = 2 ** 400;

type Pair = [DD, DD];

const scratch = new Float64Array(1);
const words = new Uint32Array(scratch.buffer);
const HIGH = new Uint8Array(new Uint16Array([1]).buffer)[0] === 1 ? 1 : 0;

/**
 * Half the gap from |x| (a normal double) to the next double above, and to the one below: half
 * an ulp, or a quarter of one below an exact power of two. The power of two 2^E ≤ |x| is read by
 * clearing the significand bits, so everything here is exact.
 */
let halfUp = 0;
let halfDown = 0;
function halfGaps(x: number): void {
  scratch[0] = x;
  const powerOfTwo = ((words[HIGH] as number) & 0xfffff) === 0 && words[1 - HIGH] === 0;
  words[HIGH] = (words[HIGH] as number) & 0x7ff00000;
  words[1 - HIGH] = 0;
  halfUp = (scratch[0] as number) * 2 ** -53;
  halfDown = powerOfTwo ? halfUp / 2 : halfUp;
}

/** hi when every value within 2^−70 relative of hi + lo rounds to hi; else null. */
function settle(v: DD): number | null {
  const [hi, lo] = v;
  if (!Number.isFinite(hi) || hi === 0) return null;
  const e = Math.abs(hi) * RELATIVE_BOUND;
  halfGaps(hi);
  const towardUp = hi > 0 ? lo + e : -(lo - e);
  const towardDown = hi > 0 ? -(lo - e) : lo + e;
  return towardUp < halfUp && towardDown < halfDown ? hi : null;
}

function inRange(v: number): boolean {
  const a = Math.abs(v);
  return a >= RANGE_LOW && a <= RANGE_HIGH;
}

const ONE: DD = [1, 0];

/** Principal √ of a + bi (a, b double-double, b ≠ 0). */
function csqrt(a: DD, b: DD): Pair {
  const modulus = dd.sqrt(dd.add(dd.mul(a, a), dd.mul(b, b)));
  const t = dd.sqrt(dd.scale(dd.add(dd.abs(a), modulus), 0.5));
  const other = dd.div(dd.abs(b), dd.scale(t, 2));
  if (a[0] >= 0) return [t, b[0] < 0 ? dd.neg(other) : other];
  return [other, b[0] < 0 ? dd.neg(t) : t];
}

function asin(x: number, y: number): Pair | null {
  const s1 = csqrt(dd.twoSum(1, -x), [-y, 0]);
  const s2 = csqrt(dd.twoSum(1, x), [y, 0]);
  const r = dd.sub(dd.mul(s1[0], s2[0]), dd.mul(s1[1], s2[1]));
  const v = dd.sub(dd.mul(s1[0], s2[1]), dd.mul(s1[1], s2[0]));
  const im = fastReal.asinh(v);
  return im ? [fastReal.atan2([x, 0], r), im] : null;
}

function acos(x: number, y: number): Pair | null {
  const s1 = csqrt(dd.twoSum(1, -x), [-y, 0]);
  const s2 = csqrt(dd.twoSum(1, x), [y, 0]);
  const im = fastReal.asinh(dd.sub(dd.mul(s2[0], s1[1]), dd.mul(s2[1], s1[0])));
  return im ? [dd.scale(fastReal.atan2(s1[0], s2[0]), 2), im] : null;
}

function acosh(x: number, y: number): Pair | null {
  const s1 = csqrt(dd.twoSum(x, -1), [y, 0]);
  const s2 = csqrt(dd.twoSum(x, 1), [y, 0]);
  const re = fastReal.asinh(dd.add(dd.mul(s1[0], s2[0]), dd.mul(s1[1], s2[1])));
  return re ? [re, dd.scale(fastReal.atan2(s1[1], s2[0]), 2)] : null;
}

function atanh(x: number, y: number): Pair | null {
  if (x < 0) {
    const r = atanh(-x, -y);
    return r ? [dd.neg(r[0]), dd.neg(r[1])] : null;
  }
  const oneMinus = dd.twoSum(1, -x);
  const y2 = dd.twoProd(y, y);
  const den = dd.add(dd.mul(oneMinus, oneMinus), y2);
  const x2 = dd.twoProd(x, x);
  // 1 − x² − y² from exact squares: its error is 2^−106 of the larger term, so decline when it cancels to below 2^−30 of that.
  const across = dd.sub(dd.sub(ONE, x2), y2);
  if (Math.abs(across[0]) < 2 ** -30 * Math.max(1, x2[0] + y2[0])) return null;
  const re = fastReal.log1p(dd.div(dd.scale([x, 0], 4), den));
  return re ? [dd.scale(re, 0.25), dd.scale(fastReal.atan2([2 * y, 0], across), 0.5)] : null;
}

const FUNCTIONS: Record<string, (x: number, y: number) => Pair | null> = {
  sqrt: (x, y) => csqrt([x, 0], [y, 0]),
  log(x, y) {
    const s = dd.add(dd.twoProd(x, x), dd.twoProd(y, y));
    if (Math.abs(s[0] - 1) < 2 ** -30) return null;
    const re = fastReal.log(s);
    return re ? [dd.scale(re, 0.5), fastReal.atan2([y, 0], [x, 0])] : null;
  },
  exp(x, y) {
    const m = fastReal.exp([x, 0]);
    const sc = fastReal.sinCos([y, 0]);
    return m && sc ? [dd.mul(m, sc[1]), dd.mul(m, sc[0])] : null;
  },
  asin,
  acos,
  acosh,
  atanh,
  asinh(x, y) {
    const r = asin(y, -x);
    return r ? [dd.neg(r[1]), r[0]] : null;
  },
  atan(x, y) {
    const r = atanh(-y, x);
    return r ? [r[1], dd.neg(r[0])] : null;
  },
};

/** The correctly rounded principal value at x + iy, or null when this tier cannot settle it. */
export function fastPrincipal(fn: string, x: number, y: number): [number, number] | null {
  const f = FUNCTIONS[fn];
  if (!f || !inRange(x) || !inRange(y)) return null;
  const r = f(x, y);
  if (!r) return null;
  const re = settle(r[0]);
  const im = settle(r[1]);
  return re === null || im === null ? null : [re, im];
}
