import { checkValue } from '../../../harness/checks/check-value';
import { relativeError } from '../../../harness/checks/relative-error';
import { referenceDouble } from './reference-double';

const up = (x: number, n: number) => {
  const b = new Float64Array([x]);
  const i = new BigInt64Array(b.buffer);
  i[0] = i[0]! + BigInt(n);
  return b[0]!;
};

describe('checkValue', () => {
  // ISO/IEC 9899:2011 G.6.4.2: csqrt(conj(z)) = conj(csqrt(z)), and csqrt(−4 − 0i) = +0 − 2i.
  const expected = referenceDouble('sqrt', [-4, -0]);

  it('takes the reference value +0 − 2i for sqrt(−4 − 0i)', () => {
    expect(Object.is(expected[0], 0)).toBe(true);
    expect(expected[1]).toBe(-2);
  });

  it('fails a zero part of the wrong sign under signed zeros, and lets it pass under counter-clockwise continuity', () => {
    expect(checkValue([-0, -2], expected, { ulps: 0 }, true)).toMatchObject({ pass: false, zeroSignDiffers: ['re'] });
    expect(checkValue([-0, -2], expected, { ulps: 0 }, false)).toMatchObject({ pass: true, zeroSignDiffers: [] });
  });

  it('passes NaN only where the reference is NaN', () => {
    // ISO/IEC 9899:2011 G.6.4.2: csqrt(NaN + iy) = NaN + iNaN for finite y.
    const nanValue = referenceDouble('sqrt', [NaN, 1]);
    expect(nanValue.every(Number.isNaN)).toBe(true);
    expect(checkValue([NaN, NaN], nanValue, { ulps: 0 }, true).pass).toBe(true);
    expect(checkValue([NaN, NaN], expected, { ulps: 1e9 }, true)).toMatchObject({
      pass: false,
      finitenessDiffers: true,
    });
    expect(checkValue([0, -2], nanValue, { relative: 1 }, true)).toMatchObject({
      pass: false,
      finitenessDiffers: true,
    });
  });

  it('holds the larger part to the ulp tolerance', () => {
    const e = referenceDouble('log', [-1, 1]);
    expect(checkValue([up(e[0], 4), e[1]], e, { ulps: 4 }, true)).toMatchObject({ pass: true, ulps: 4 });
    expect(checkValue([e[0], up(e[1], -5)], e, { ulps: 4 }, true)).toMatchObject({ pass: false, ulps: 5 });
  });

  it('holds the whole value to a relative tolerance', () => {
    const e = referenceDouble('asin', [2, 0]);
    expect(checkValue([e[0] * (1 + 1e-13), e[1]], e, { relative: 1e-12 }, true).pass).toBe(true);
    expect(checkValue([e[0] * (1 + 1e-11), e[1]], e, { relative: 1e-12 }, true).pass).toBe(false);
  });

  it('measures relative error near the overflow threshold without overflowing', () => {
    expect(relativeError([1.7e308, -1.7e308], [-1.7e308, 1.7e308])).toBeCloseTo(2, 12);
    expect(relativeError([0, 0], [0, 0])).toBe(0);
    expect(relativeError([Infinity, 0], [Infinity, 0])).toBe(0);
  });

  describe('with both bounds, {ulps, relative}', () => {
    const EITHER = { ulps: 4, relative: 4 * Number.EPSILON };
    // mpmath, 60 digits: asech(1000001 + 1e−9i) = 9.99998000003500056e−22 − 1.5707953267958966i.
    const asech = referenceDouble('asech', [1000001, 1e-9]);

    it('passes a tiny part lost to cancellation with the right sign on the normwise bound', () => {
      const v: [number, number] = [5.551115123125783e-17, asech[1]];
      expect(checkValue(v, asech, { ulps: 4 }, true).pass).toBe(false);
      expect(checkValue(v, asech, EITHER, true).pass).toBe(true);
    });

    it('does not forgive a tiny part of the opposite sign, which the normwise bound alone would', () => {
      // complex.js 2.4.3 returned −5.551115123125783e−17 for this real part in the demo runs.
      const v: [number, number] = [-5.551115123125783e-17, asech[1]];
      expect(relativeError(v, asech)).toBeLessThan(4 * Number.EPSILON);
      expect(checkValue(v, asech, EITHER, true).pass).toBe(false);
      expect(checkValue(v, asech, { relative: 4 * Number.EPSILON }, true).pass).toBe(true);
    });

    it('passes a subnormal result 2 ulps off on the ulps bound though its relative error is 2/3', () => {
      const e: [number, number] = [1.5e-323, 1e-310];
      const v: [number, number] = [up(e[0], 2), e[1]];
      expect(relativeError([v[0], 0], [e[0], 0])).toBeCloseTo(2 / 3, 5);
      expect(checkValue(v, e, EITHER, true).pass).toBe(true);
      expect(checkValue(v, e, { relative: 4 * Number.EPSILON }, true).pass).toBe(false);
    });

    it('fails a value outside both bounds', () => {
      const v: [number, number] = [asech[0], asech[1] * (1 + 1e-14)];
      expect(checkValue(v, asech, EITHER, true).pass).toBe(false);
    });
  });
});
