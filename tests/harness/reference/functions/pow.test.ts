import { Decimal as DecimalJs } from 'decimal.js';
import { BigComplex } from '../../../../harness/reference/complex/big-complex';
import { pow } from '../../../../harness/reference/functions/pow';
import { Rational } from '../../../../harness/reference/numbers/rational';
import { askPython } from '../../../external/python-oracle';
import { unhex } from '../../../external/unhex';

/** The working precision principalValue starts at for the double and 40 digits: ⌈40·log2 10⌉ + 4 + 8. */
const FIRST_BITS = 145;
const Decimal = DecimalJs.clone({ precision: 60 });
const WANT_BITS = 137;

describe('pow', () => {
  it('settles a tiny imaginary part at the first working precision when w is real and the angle small', () => {
    // z = 8.132015127667118e307 + 1.5275982464249347e−108i, w = −2^−1022 (the least normal double):
    // z^w = 1 − 4.18e−724i. Bounded by |z^w| the imaginary part needed 4,096 bits.
    const z = BigComplex.fromDoubles(8.132015127667118e307, 1.5275982464249347e-108);
    const w = Rational.fromDouble(-2.2250738585072014e-308);
    const a = pow(z, { kind: 'rational', value: w }, FIRST_BITS);
    expect(a.decided(true, WANT_BITS)).toBe(true);
    // mpmath, 60 digits on 720 working digits (Debian python3-mpmath): the same value to 38 digits.
    const [m] = askPython<{ re: string; im: string; im_rounded: string }>('mpmath', [
      { fn: 'pow', z: ['8.132015127667118e307', '1.5275982464249347e-108'], w: `${w.num}/${w.den}` },
    ]);
    const ours = a.im.toDecimal(60);
    const theirs = m!.im;
    // The first 30 significant digits and the power of ten (the last digits differ by rounding).
    expect([ours.slice(0, 32), ours.split('e')[1]]).toEqual([theirs.slice(0, 32), theirs.split('e')[1]]);
    expect(Object.is(a.im.toDouble(), unhex(m!.im_rounded))).toBe(true);
  });

  it('settles at the first working precision when w·Arg z is whole turns of π plus a tiny angle', () => {
    // z = −8.644005954005547e−309 − 1.8194185087661534e171i, w = −MAX: Arg z = −π/2 − 4.75e−480,
    // and −MAX·(−π/2) is an even multiple of π, so z^w is real up to a factor of 2^−568 in its
    // imaginary part. Reducing the angle whole, the rounding loop needed 1,160 bits.
    const z = BigComplex.fromDoubles(-8.644005954005547e-309, -1.8194185087661534e171);
    const w = Rational.fromDouble(-Number.MAX_VALUE);
    const a = pow(z, { kind: 'rational', value: w }, FIRST_BITS);
    expect(a.decided(true, WANT_BITS)).toBe(true);
    // mpmath, 60 digits on 720 working digits: the same angle. |z^w| is far below every double
    // (ours is realExp's stand-in there), so compare Im/Re = tan(8.5e−172) to 25 digits.
    const [m] = askPython<{ re: string; im: string }>('mpmath', [
      { fn: 'pow', z: ['-8.644005954005547e-309', '-1.8194185087661534e171'], w: `${w.num}/${w.den}` },
    ]);
    const split = (t: string): [DecimalJs, bigint] => {
      const [mantissa, exponent] = t.split('e') as [string, string];
      return [new Decimal(mantissa), BigInt(exponent)];
    };
    const [mr, er] = split(m!.re);
    const [mi, ei] = split(m!.im);
    const theirs = mi.div(mr).times(new Decimal(10).pow(Number(ei - er)));
    const ours = new Decimal(a.im.div(a.re, 200).toDecimal(40));
    expect(ours.minus(theirs).abs().lte(theirs.abs().times(1e-25))).toBe(true);
    expect(theirs.toExponential(3)).toMatch(/e-172$/);
  });

  it('settles at the first working precision when w·Arg z is whole quarter turns plus a tiny angle', () => {
    // nthroot(z, 2) = z^(1/2) at z = −1.580157016298496e308 − 2.923296446697851e−297i: Arg z is
    // −π plus 1.85e−605, half of it three quarter turns plus 9.2e−606, so the real part is about
    // 1.2e−451 beside an imaginary part near −1.26e154.
    const z = BigComplex.fromDoubles(-1.580157016298496e308, -2.923296446697851e-297);
    const a = pow(z, { kind: 'rational', value: new Rational(1n, 2n) }, FIRST_BITS);
    expect(a.decided(true, WANT_BITS)).toBe(true);
    // mpmath, 60 digits on 720 + 2·605 working digits (Debian python3-mpmath), each part rounded
    // by the oracle from mpmath's binary value: the real part underflows to +0.
    const [m] = askPython<{ re_rounded: string; im_rounded: string; re: string }>('mpmath', [
      { fn: 'pow', z: ['-1.580157016298496e308', '-2.923296446697851e-297'], w: '1/2', work_dps: 1930 },
    ]);
    expect([a.re.toDouble(), a.im.toDouble()]).toEqual([unhex(m!.re_rounded), unhex(m!.im_rounded)]);
    expect(a.re.toDecimal(25).slice(0, 20)).toBe(m!.re.slice(0, 20));
  });
});
