import { dd } from './double-double';
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
 *
 * Issue 12 (doubles ≥ 30× mpmath): profiled with node --cpu-prof on the bench's points, the time
 * was in the double-double operations themselves (addition, products, the pair each returned) and
 * the series. Scalar operations (double-double.ts) took a warm mixed call from 1.20 to 0.77 µs;
 * small series terms in plain doubles, log and atan with one division each, the one-two-sum
 * addition and module constants for the operations, to ~0.6 µs. Warm single-function loops,
 * CPU time at load average ~4: sqrt 0.15, exp 0.45, log 0.39, atan and atanh 0.46, asin, acos,
 * asinh, acosh 0.63–0.69 µs. The remaining ~0.1 µs of the mixed call over their mean is the
 * bench's alternation of nine functions (a switch instead of the table below measured the same).
 */
/**
 * The operations and kernels as module constants: reached through the import's binding, each
 * `dd.op` went through the module getter, which V8 inlined at every call and charged to the
 * inlining budget, leaving more operations as real calls (with their doubles boxed). Measured on
 * a warm loop: asin 765 → 690 ns, sqrt 172 → 152 ns.
 */
const D = dd;
const R = fastReal;
const RELATIVE_BOUND = 2 ** -70;
const RANGE_LOW = 2 ** -400;
const RANGE_HIGH = 2 ** 400;

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

/** hi when every value within 2^−70 relative of hi + lo rounds to hi; else NaN. */
function settle(hi: number, lo: number): number {
  if (!Number.isFinite(hi) || hi === 0) return NaN;
  const e = Math.abs(hi) * RELATIVE_BOUND;
  halfGaps(hi);
  const towardUp = hi > 0 ? lo + e : -(lo - e);
  const towardDown = hi > 0 ? -(lo - e) : lo + e;
  return towardUp < halfUp && towardDown < halfDown ? hi : NaN;
}

function inRange(v: number): boolean {
  const a = Math.abs(v);
  return a >= RANGE_LOW && a <= RANGE_HIGH;
}

/** The value being built: [re hi, re lo, im hi, im lo]; a NaN hi means declined. */
const result = new Float64Array(4);
/** The two square roots of Kahan's formulas, laid out as `result`. */
const s1 = new Float64Array(4);
const s2 = new Float64Array(4);
const sc = new Float64Array(4);

/** Principal √ of (ah + al) + bi (b a double ≠ 0) into out. */
function csqrt(ah: number, al: number, b: number, out: Float64Array): void {
  const a2h = D.mul(ah, al, ah, al);
  const a2l = D.lo;
  const b2h = D.twoProd(b, b);
  const nh = D.add(a2h, a2l, b2h, D.lo);
  const mh = D.sqrt(nh, D.lo);
  const ml = D.lo;
  const sh = ah < 0 ? D.add(-ah, -al, mh, ml) : D.add(ah, al, mh, ml);
  const th = D.sqrt(sh / 2, D.lo / 2);
  const tl = D.lo;
  const oh = D.div(b < 0 ? -b : b, 0, 2 * th, 2 * tl);
  const ol = D.lo;
  if (ah >= 0) D.storePair(out, th, tl, b < 0 ? -oh : oh, b < 0 ? -ol : ol);
  else D.storePair(out, oh, ol, b < 0 ? -th : th, b < 0 ? -tl : tl);
}

/** a·b + sign·c·d for double-doubles given as (hi, lo) pairs. */
function mulAdd(
  ah: number,
  al: number,
  bh: number,
  bl: number,
  ch: number,
  cl: number,
  dh: number,
  dl: number,
  sign: number,
): number {
  const xh = D.mul(ah, al, bh, bl);
  const xl = D.lo;
  const yh = D.mul(ch, cl, dh, dl);
  return D.add(xh, xl, sign * yh, sign * D.lo);
}

/** s1 = √(1 − z) and s2 = √(1 + z) (Kahan's), for asin and acos. */
function kahanRoots(x: number, y: number): void {
  const oh = D.twoSum(1, -x);
  csqrt(oh, D.lo, -y, s1);
  const ph = D.twoSum(1, x);
  csqrt(ph, D.lo, y, s2);
}

/** asin z = atan2(x, Re(s1·s2)) + i·asinh(Im(conj(s1)·s2)). */
function asin(x: number, y: number): void {
  kahanRoots(x, y);
  const rh = mulAdd(s1[0]!, s1[1]!, s2[0]!, s2[1]!, s1[2]!, s1[3]!, s2[2]!, s2[3]!, -1);
  const rl = D.lo;
  const vh = mulAdd(s1[0]!, s1[1]!, s2[2]!, s2[3]!, s1[2]!, s1[3]!, s2[0]!, s2[1]!, -1);
  const imH = R.asinh(vh, D.lo);
  const imL = D.lo;
  const reH = R.atan2(x, 0, rh, rl);
  D.storePair(result, reH, D.lo, imH, imL);
}

/** acos z = 2·atan2(Re s1, Re s2) + i·asinh(Im(conj(s2)·s1)). */
function acos(x: number, y: number): void {
  kahanRoots(x, y);
  const vh = mulAdd(s2[0]!, s2[1]!, s1[2]!, s1[3]!, s2[2]!, s2[3]!, s1[0]!, s1[1]!, -1);
  const imH = R.asinh(vh, D.lo);
  const imL = D.lo;
  const reH = R.atan2(s1[0]!, s1[1]!, s2[0]!, s2[1]!);
  D.storePair(result, 2 * reH, 2 * D.lo, imH, imL);
}

/** acosh z = asinh(Re(conj(s1)·s2)) + 2i·atan2(Im s1, Re s2), s1 = √(z − 1), s2 = √(z + 1). */
function acosh(x: number, y: number): void {
  const mh = D.twoSum(x, -1);
  csqrt(mh, D.lo, y, s1);
  const ph = D.twoSum(x, 1);
  csqrt(ph, D.lo, y, s2);
  const uh = mulAdd(s1[0]!, s1[1]!, s2[0]!, s2[1]!, s1[2]!, s1[3]!, s2[2]!, s2[3]!, 1);
  const reH = R.asinh(uh, D.lo);
  const reL = D.lo;
  const imH = R.atan2(s1[2]!, s1[3]!, s2[0]!, s2[1]!);
  D.storePair(result, reH, reL, 2 * imH, 2 * D.lo);
}

/**
 * atanh z = ¼ log1p(4x/((1 − x)² + y²)) + ½i·atan2(2y, 1 − x² − y²), for x ≥ 0 (atanh is odd).
 * `sign` −1 negates both parts, for x < 0 and for atan.
 */
function atanh(x: number, y: number, sign: number): void {
  if (x < 0) {
    atanh(-x, -y, -sign);
    return;
  }
  const omh = D.twoSum(1, -x);
  const oml = D.lo;
  const y2h = D.twoProd(y, y);
  const y2l = D.lo;
  const o2h = D.mul(omh, oml, omh, oml);
  const denH = D.add(o2h, D.lo, y2h, y2l);
  const denL = D.lo;
  const x2h = D.twoProd(x, x);
  const x2l = D.lo;
  // 1 − x² − y² from exact squares: its error is 2^−106 of the larger term, so decline when it cancels to below 2^−30 of that.
  const ah = D.addCancelling(1, 0, -x2h, -x2l);
  const acrossH = D.addCancelling(ah, D.lo, -y2h, -y2l);
  const acrossL = D.lo;
  if (Math.abs(acrossH) < 2 ** -30 * Math.max(1, x2h + y2h)) {
    result[0] = NaN;
    return;
  }
  const qh = D.div(4 * x, 0, denH, denL);
  const reH = R.log1p(qh, D.lo);
  const reL = D.lo;
  const imH = R.atan2(2 * y, 0, acrossH, acrossL);
  const k = sign / 2;
  D.storePair(result, (k / 2) * reH, (k / 2) * reL, k * imH, k * D.lo);
}

function log(x: number, y: number): void {
  const x2h = D.twoProd(x, x);
  const x2l = D.lo;
  const y2h = D.twoProd(y, y);
  const nh = D.add(x2h, x2l, y2h, D.lo);
  if (Math.abs(nh - 1) < 2 ** -30) {
    result[0] = NaN;
    return;
  }
  const reH = R.log(nh, D.lo);
  const reL = D.lo;
  const imH = R.atan2(y, 0, x, 0);
  D.storePair(result, reH / 2, reL / 2, imH, D.lo);
}

function exp(x: number, y: number): void {
  const mh = R.exp(x);
  const ml = D.lo;
  if (!R.sinCos(y, sc)) {
    result[0] = NaN;
    return;
  }
  const reH = D.mul(mh, ml, sc[2]!, sc[3]!);
  const reL = D.lo;
  const imH = D.mul(mh, ml, sc[0]!, sc[1]!);
  D.storePair(result, reH, reL, imH, D.lo);
}

/** Each function leaves its value in `result`, or NaN in result[0] when it declines. */
// asinh z = i·asin(−iz): from asin(y − ix) = a + bi, asinh z = −b + ai.
function asinh(x: number, y: number): void {
  asin(y, -x);
  D.storePair(result, -result[2]!, -result[3]!, result[0]!, result[1]!);
}

// atan z = −i·atanh(iz): from atanh(−y + ix) = a + bi, atan z = b − ai.
function atan(x: number, y: number): void {
  atanh(-y, x, 1);
  D.storePair(result, result[2]!, result[3]!, -result[0]!, -result[1]!);
}

/** The correctly rounded principal value at x + iy, or null when this tier cannot settle it. */
export function fastPrincipal(fn: string, x: number, y: number): [number, number] | null {
  if (!inRange(x) || !inRange(y)) return null;
  // A switch of direct calls, not a table lookup and one call f(x, y): that one call site saw
  // nine functions, so V8 inlined none of them. Measured on the bench's mixed points (quiet
  // machine): 542-558 ns a point -> 471-525 ns; bench:reference doubles 28-29x -> 31-33x mpmath.
  switch (fn) {
    case 'sqrt':
      csqrt(x, 0, y, result);
      break;
    case 'log':
      log(x, y);
      break;
    case 'exp':
      exp(x, y);
      break;
    case 'asin':
      asin(x, y);
      break;
    case 'acos':
      acos(x, y);
      break;
    case 'asinh':
      asinh(x, y);
      break;
    case 'acosh':
      acosh(x, y);
      break;
    case 'atan':
      atan(x, y);
      break;
    case 'atanh':
      atanh(x, y, 1);
      break;
    default:
      return null;
  }
  const re = settle(result[0]!, result[1]!);
  const im = settle(result[2]!, result[3]!);
  return re !== re || im !== im ? null : [re, im];
}
