import { BigFloat } from '../numbers/big-float';
import { FixedTables } from '../real/fixed-tables';
import { dd } from './double-double';

/**
 * Real kernels in double-double for the fast tier, mirroring the bigint kernels' reductions
 * (tables at j/64, series in |d| ≤ 1/128) with the same tables, converted once from the bigint
 * engine. Each takes and returns double-doubles as `dd` does (the result's hi returned, its lo in
 * `dd.lo`), with a relative error below ~2^−96 for the inputs it accepts, or returns NaN where it
 * cannot promise that (the caller then falls back to the bigint engine):
 * - log: an argument in [2^−1000, 2^1000] (its f − 1 near 1 is exact in its high part);
 * - exp: |x| ≤ 708 (beyond, the result is not a normal double anyway);
 * - sinCos: |x| ≤ 2^20 and x not within 2^−30 of a multiple of π/2.
 *
 * Series: the terms from the first below 2^−44 of the leading one are summed in plain doubles,
 * whose rounding then costs below 2^−97 of the sum; only the leading terms take double-double
 * steps (3 for log, atan, sin and cos, 6 for exp). The term counts are the fewest whose first
 * omitted term is below 2^−100 at |d| = 1/128 (log and atan: 7 terms in t² ≤ 2^−14; exp: 12;
 * sin and cos: 6), against 9–13 before. With the scalar operations of double-double.ts, a warm
 * call on the bench's mix went from 1.20 µs to ~0.6 µs (figures in fast-principal.ts).
 */
/**
 * The operations and kernels as module constants: reached through the import's binding, each
 * `dd.op` went through the module getter, which V8 inlined at every call and charged to the
 * inlining budget, leaving more operations as real calls (with their doubles boxed). Measured on
 * a warm loop: asin 765 → 690 ns, sqrt 172 → 152 ns.
 */
const D = dd;
const F = 192;
const T = FixedTables.at(F);

/** A table of double-doubles, interleaved: entry i is (t[2i], t[2i + 1]). */
function table(values: bigint[]): Float64Array {
  const out = new Float64Array(2 * values.length);
  values.forEach((v, i) => {
    const b = BigFloat.fromBigInt(v, -F);
    const hi = b.toDouble();
    out[2 * i] = hi;
    out[2 * i + 1] = b.sub(BigFloat.fromDouble(hi)).toDouble();
  });
  return out;
}

const LOG = table(T.logTable);
const ATAN = table(T.atanTable);
const SIN = table(T.sinTable);
const COS = table(T.cosTable);
const EXP = table(T.expTable);
const INV_ODD = table(T.inverseOdd.slice(0, 12));
const INV_FACT = table(T.inverseFactorial.slice(0, 20));
const CONSTANTS = table([FixedTables.ln2(F), FixedTables.pi(F)]);
const LN2_HI = CONSTANTS[0] as number;
const LN2_LO = CONSTANTS[1] as number;
const PI_HI = CONSTANTS[2] as number;
const PI_LO = CONSTANTS[3] as number;
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
const SPLIT = 134217729;

/**
 * Σ_{i=0..n} c_i·(±w)^i by Horner's rule, c_i = table[offset + step·i]: the terms from `first`
 * up in plain doubles, then `first` double-double steps, each a Dekker product and an accurate
 * add written out on scalars (this is the hot loop of every kernel).
 */
function series(
  wh: number,
  wl: number,
  c: Float64Array,
  n: number,
  step: number,
  offset: number,
  alternating: boolean,
  first: number,
): number {
  const xh = alternating ? -wh : wh;
  const xl = alternating ? -wl : wl;
  let sh = c[2 * (offset + step * n)] as number;
  for (let i = n - 1; i >= first; i--) sh = (c[2 * (offset + step * i)] as number) + xh * sh;
  let sl = 0;
  let t = SPLIT * xh;
  const xa = t - (t - xh);
  const xb = xh - xa;
  for (let i = first - 1; i >= 0; i--) {
    const p = xh * sh;
    t = SPLIT * sh;
    const sa = t - (t - sh);
    const sb = sh - sa;
    const e = xa * sa - p + xa * sb + xb * sa + xb * sb + (xh * sl + xl * sh);
    const mh = p + e;
    const ml = e - (mh - p);
    const k = 2 * (offset + step * i);
    const ch = c[k] as number;
    const s1 = ch + mh;
    const bb = s1 - ch;
    const s2 = ch - (s1 - bb) + (mh - bb) + ((c[k + 1] as number) + ml);
    sh = s1 + s2;
    sl = s2 - (sh - s1);
  }
  D.lo = sl;
  return sh;
}

/** ln(1 + u) for |u| ≤ 1/128: 2t·Σ t^{2i}/(2i+1), t = u/(2 + u), t² ≤ 2^−16 (7 terms reach 2^−115). */
function log1pSmall(uh: number, ul: number): number {
  const dh = D.add(2, 0, uh, ul);
  const th = D.div(uh, ul, dh, D.lo);
  const tl = D.lo;
  const t2h = D.mul(th, tl, th, tl);
  const sh = series(t2h, D.lo, INV_ODD, 6, 1, 0, false, 3);
  const h = D.mul(th, tl, sh, D.lo);
  D.lo *= 2;
  return 2 * h;
}

/** 2^k for −1022 ≤ k ≤ 1023, indexed k + 1022: `2 ** k` (Math.pow) cost ~15% of a complex log here. */
const POW2 = Float64Array.from({ length: 2046 }, (_, i) => 2 ** (i - 1022));
const scratch = new Float64Array(1);
const words = new Uint32Array(scratch.buffer);
const HIGH = new Uint8Array(new Uint16Array([1]).buffer)[0] === 1 ? 1 : 0;

function log(ah: number, al: number): number {
  if (!(ah >= 2 ** -1000) || !(ah <= 2 ** 1000)) return NaN;
  // The exponent field of a normal double: 2^e ≤ ah < 2^(e+1), read without Math.log2.
  scratch[0] = ah;
  let e = (((words[HIGH] as number) >>> 20) & 0x7ff) - 1023;
  let s = POW2[1022 - e] as number;
  let fh = ah * s;
  if (fh > Math.SQRT2) {
    e += 1;
    s /= 2;
    fh /= 2;
  }
  const fl = al * s;
  // ln f = ln c + 2 atanh((f − c)/(f + c)) with c = 1 + j/64 nearest f: |t| ≤ 2^−7.4, one division
  // (ln(1 + (f − c)/c) took two). f − c is exact in its high part (Sterbenz), so with c = 1 and
  // e = 0 the result stays relatively accurate however near 1 f is.
  const j = Math.round((fh - 1) * 64);
  const c = 1 + j / 64;
  const nh = D.add(fh, fl, -c, 0);
  const nl = D.lo;
  const mh = D.add(fh, fl, c, 0);
  const th = D.div(nh, nl, mh, D.lo);
  const tl = D.lo;
  const t2h = D.mul(th, tl, th, tl);
  const sh = series(t2h, D.lo, INV_ODD, 6, 1, 0, false, 3);
  let h = D.mul(th, tl, sh, D.lo);
  let l = 2 * D.lo;
  h *= 2;
  if (j !== 0) {
    h = D.add(LOG[2 * (j + 32)] as number, LOG[2 * (j + 32) + 1] as number, h, l);
    l = D.lo;
  }
  if (e !== 0) {
    const kh = D.mulDouble(LN2_HI, LN2_LO, e);
    h = D.add(kh, D.lo, h, l);
    l = D.lo;
  }
  D.lo = l;
  return h;
}

/** ln(1 + w) for w ≥ 0 given accurately (relative). */
function log1p(wh: number, wl: number): number {
  if (wh < 1 / 128) return log1pSmall(wh, wl);
  const h = D.add(1, 0, wh, wl);
  return log(h, D.lo);
}

/** e^x for a double x. */
function exp(x: number): number {
  if (!(Math.abs(x) <= 708)) return NaN;
  const k = Math.round(x / LN2_HI);
  const kh = D.mulDouble(LN2_HI, LN2_LO, k);
  const rh = D.add(x, 0, -kh, -D.lo);
  const rl = D.lo;
  const j = Math.max(-32, Math.min(32, Math.round(rh * 64)));
  const dh = D.add(rh, rl, -j / 64, 0);
  const sh = series(dh, D.lo, INV_FACT, 11, 1, 0, false, 6);
  const h = D.mul(EXP[2 * (j + 32)] as number, EXP[2 * (j + 32) + 1] as number, sh, D.lo);
  const scale = POW2[k + 1022] as number;
  D.lo *= scale;
  return h * scale;
}

/**
 * sin x and cos x for a double x into out = [sin hi, sin lo, cos hi, cos lo]; false (out
 * untouched) where the reduction could not promise relative accuracy.
 */
function sinCos(x: number, out: Float64Array): boolean {
  let rh = x;
  let rl = 0;
  let q = 0;
  if (Math.abs(x) > 0.78) {
    if (!(Math.abs(x) <= 2 ** 20)) return false;
    const k = Math.round(x / P1);
    let h = D.twoProd(k, P1);
    rh = D.addCancelling(x, 0, -h, -D.lo);
    rl = D.lo;
    h = D.twoProd(k, P2);
    rh = D.addCancelling(rh, rl, -h, -D.lo);
    rl = D.lo;
    rh = D.addCancelling(rh, rl, -k * P3, 0);
    rl = D.lo;
    if (Math.abs(rh) < TWO_M30) return false;
    q = ((k % 4) + 4) % 4;
  }
  const j = Math.round(rh * 64);
  const dh = D.add(rh, rl, -j / 64, 0);
  const dl = D.lo;
  const d2h = D.mul(dh, dl, dh, dl);
  const d2l = D.lo;
  const fh = series(d2h, d2l, INV_FACT, 5, 2, 1, true, 3);
  const sdh = D.mul(dh, dl, fh, D.lo);
  const sdl = D.lo;
  const cdh = series(d2h, d2l, INV_FACT, 5, 2, 0, true, 3);
  const cdl = D.lo;
  let sh = sdh;
  let sl = sdl;
  let ch = cdh;
  let cl = cdl;
  if (j !== 0) {
    const a = Math.abs(j);
    const sign = j < 0 ? -1 : 1;
    const sjh = sign * (SIN[2 * a] as number);
    const sjl = sign * (SIN[2 * a + 1] as number);
    const cjh = COS[2 * a] as number;
    const cjl = COS[2 * a + 1] as number;
    let ph = D.mul(sjh, sjl, cdh, cdl);
    let pl = D.lo;
    let qh = D.mul(cjh, cjl, sdh, sdl);
    sh = D.add(ph, pl, qh, D.lo);
    sl = D.lo;
    ph = D.mul(cjh, cjl, cdh, cdl);
    pl = D.lo;
    qh = D.mul(sjh, sjl, sdh, sdl);
    ch = D.add(ph, pl, -qh, -D.lo);
    cl = D.lo;
  }
  if (q === 0) D.storePair(out, sh, sl, ch, cl);
  else if (q === 1) D.storePair(out, ch, cl, -sh, -sl);
  else if (q === 2) D.storePair(out, -sh, -sl, -ch, -cl);
  else D.storePair(out, -ch, -cl, sh, sl);
  return true;
}

/**
 * atan(a/b) for 0 < a ≤ b. With c = j/64 nearest a/b, atan(a/b) = atan c + atan d for
 * d = (a − cb)/(b + ca), one division (forming a/b first took two); |d| ≤ 1/128 + 2^−50.
 * a − cb cancels, but only to an absolute error of 2^−106·a/b against atan c ≥ 2^−6.
 */
function atanRatio(ah: number, al: number, bh: number, bl: number): number {
  const j = Math.round((ah / bh) * 64);
  if (j === 0) {
    const th = D.div(ah, al, bh, bl);
    const tl = D.lo;
    const t2h = D.mul(th, tl, th, tl);
    const sh = series(t2h, D.lo, INV_ODD, 6, 1, 0, true, 3);
    return D.mul(th, tl, sh, D.lo);
  }
  const c = j / 64;
  const cbh = D.mulDouble(bh, bl, c);
  const nh = D.add(ah, al, -cbh, -D.lo);
  const nl = D.lo;
  const cah = D.mulDouble(ah, al, c);
  const mh = D.add(bh, bl, cah, D.lo);
  const dh = D.div(nh, nl, mh, D.lo);
  const dl = D.lo;
  const d2h = D.mul(dh, dl, dh, dl);
  const sh = series(d2h, D.lo, INV_ODD, 6, 1, 0, true, 3);
  const ph = D.mul(dh, dl, sh, D.lo);
  return D.add(ATAN[2 * j] as number, ATAN[2 * j + 1] as number, ph, D.lo);
}

/** atan2(y, x) for non-zero y and x. */
function atan2(yh: number, yl: number, xh: number, xl: number): number {
  const ayh = yh < 0 ? -yh : yh;
  const ayl = yh < 0 ? -yl : yl;
  const axh = xh < 0 ? -xh : xh;
  const axl = xh < 0 ? -xl : xl;
  let h: number;
  if (ayh <= axh) {
    const ah = atanRatio(ayh, ayl, axh, axl);
    h = xh > 0 ? ah : D.add(PI_HI, PI_LO, -ah, -D.lo);
  } else {
    const ah = atanRatio(axh, axl, ayh, ayl);
    h = xh > 0 ? D.add(PI_HI / 2, PI_LO / 2, -ah, -D.lo) : D.add(PI_HI / 2, PI_LO / 2, ah, D.lo);
  }
  if (yh < 0) {
    D.lo = -D.lo;
    return -h;
  }
  return h;
}

/**
 * asinh v for v ≠ 0: sign(v) · ln(1 + |v| + v²/(1 + √(1 + v²))), nothing cancelling. From
 * |v| ≥ 1/8 on, ln(|v| + √(1 + v²)) directly (one division and two additions fewer): its
 * argument is ≥ 1.12, so its log (≥ 0.118) keeps the relative error below 2^−100.
 */
function asinh(vh: number, vl: number): number {
  const ah = vh < 0 ? -vh : vh;
  const al = vh < 0 ? -vl : vl;
  const a2h = D.mul(ah, al, ah, al);
  const a2l = D.lo;
  const ph = D.add(1, 0, a2h, a2l);
  const rh = D.sqrt(ph, D.lo);
  const rl = D.lo;
  let h: number;
  if (ah >= 0.125) {
    const wh = D.add(ah, al, rh, rl);
    h = log(wh, D.lo);
  } else {
    const qh = D.add(1, 0, rh, rl);
    const fh = D.div(a2h, a2l, qh, D.lo);
    const wh = D.add(ah, al, fh, D.lo);
    h = log1p(wh, D.lo);
  }
  if (vh < 0) {
    D.lo = -D.lo;
    return -h;
  }
  return h;
}

export const fastReal = { log, log1p, exp, sinCos, atan2, asinh };
