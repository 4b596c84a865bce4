import { checkValue } from '../../../harness/checks/check-value';
import type { ComplexDouble } from '../../../harness/checks/complex-double';
import { diagnoseFailure } from '../../../harness/checks/diagnose-failure';
import { referenceDouble } from './reference-double';

const TOL = { ulps: 4 };
const rotate = (v: ComplexDouble, angle: number): ComplexDouble => [
  v[0] * Math.cos(angle) - v[1] * Math.sin(angle),
  v[0] * Math.sin(angle) + v[1] * Math.cos(angle),
];
const labelsOf = (
  actual: ComplexDouble,
  expected: ComplexDouble,
  extra: Omit<Parameters<typeof diagnoseFailure>[0], 'actual' | 'expected' | 'check' | 'tolerance'> = {},
  zeroSigns = true,
) =>
  diagnoseFailure({ actual, expected, check: checkValue(actual, expected, TOL, zeroSigns), tolerance: TOL, ...extra });
/** The leading label, for points that have one label. */
const diagnose = (...args: Parameters<typeof labelsOf>) => {
  const labels = labelsOf(...args);
  expect(labels).toHaveLength(1);
  return labels[0]!;
};

describe('diagnoseFailure', () => {
  it('calls 0 + 2i for sqrt(−4 − 0i) an ignored −0 of the input', () => {
    // ISO/IEC 9899:2011 G.6.4.2: csqrt(−4 − 0i) = +0 − 2i, csqrt(−4 + 0i) = +0 + 2i.
    const expected = referenceDouble('sqrt', [-4, -0]);
    const flipped = referenceDouble('sqrt', [-4, 0]);
    expect(diagnose([0, 2], expected, { flippedZero: { part: 'im', value: flipped }, otherSide: flipped })).toEqual({
      kind: 'zero-sign',
      part: 'im',
      of: 'input',
    });
  });

  it('calls the upper-side value just below the cut of log the wrong side', () => {
    // DLMF 4.2.3: Im log z ∈ (−π, π]; just below the negative real axis Im log z → −π.
    const expected = referenceDouble('log', [-2, -1e-300]);
    const otherSide = referenceDouble('log', [-2, 1e-300]);
    expect(diagnose(otherSide, expected, { otherSide })).toEqual({ kind: 'cut-side' });
  });

  it('calls a cube root turned by 2π/3 the sheet k = 1', () => {
    // cbrt(8) = 2 on the principal branch (common practice); the next sheet is 2·e^{2πi/3}.
    const expected = referenceDouble('cbrt', [8, 0]);
    const sheets = [-1, 1].map((k) => ({ k, value: rotate(expected, (2 * Math.PI * k) / 3) }));
    expect(diagnose(rotate(expected, (2 * Math.PI) / 3), expected, { otherSheets: sheets })).toEqual({
      kind: 'other-sheet',
      k: 1,
    });
  });

  it('calls log z + 2πi the sheet k = 1', () => {
    const expected = referenceDouble('log', [0.5, 0.5]);
    const sheets = [-2, -1, 1, 2].map((k) => ({
      k,
      value: [expected[0], expected[1] + 2 * Math.PI * k] as ComplexDouble,
    }));
    expect(diagnose([expected[0], expected[1] + 2 * Math.PI], expected, { otherSheets: sheets })).toEqual({
      kind: 'other-sheet',
      k: 1,
    });
  });

  it('calls a right-branch value 1e-10 off inaccurate, with its ulps', () => {
    const expected = referenceDouble('asin', [0.3, 0.2]);
    const d = diagnose([expected[0] * (1 + 1e-10), expected[1]], expected, { otherSide: [-expected[0], expected[1]] });
    expect(d.kind).toBe('inaccurate');
    if (d.kind === 'inaccurate') expect(d.ulps).toBeGreaterThan(4);
    expect(d).toMatchObject({ part: 're', signDiffers: false });
  });

  it('calls a tiny real part of asech lost to cancellation inaccurate in re, with the opposite sign', () => {
    // mpmath, 60 digits: asech(1000001 + 1e−9i) = 9.99998000003500056e−22 − 1.5707953267958966i.
    // −5.551115123125783e−17 is the real part complex.js 2.4.3 returned there in our demo runs:
    // the whole value is within 4e−17 relative, the real part 8.7e18 ulps off.
    const expected = referenceDouble('asech', [1000001, 1e-9]);
    expect(expected[0]).toBeCloseTo(9.99998000003500056e-22, 36);
    const d = diagnose([-5.551115123125783e-17, expected[1]], expected);
    expect(d).toMatchObject({ kind: 'inaccurate', part: 're', signDiffers: true });
    if (d.kind === 'inaccurate') {
      expect(d.ulps).toBeGreaterThan(1e18);
      expect(d.relativeError).toBeLessThan(1e-16);
    }
  });

  it('reports a part lost to cancellation with its absolute error and |value|, not only its ulps', () => {
    // The same asech point: the real part is 1e−21 beside |value| ≈ 1.5708, far below 2^−26 of it.
    const expected = referenceDouble('asech', [1000001, 1e-9]);
    const d = diagnose([-5.551115123125783e-17, expected[1]], expected);
    expect(d).toMatchObject({ kind: 'inaccurate', cancellation: { part: 're' } });
    if (d.kind !== 'inaccurate' || !d.cancellation) throw new Error('no cancellation');
    expect(d.cancellation.absoluteError).toBeCloseTo(5.551115123125783e-17 + 9.99998000003500056e-22, 30);
    expect(d.cancellation.magnitude).toBeCloseTo(1.5707953267958966, 15);
    expect(d.parts).toEqual({
      re: { ulps: d.ulps, absolute: d.cancellation.absoluteError },
      im: { ulps: 0, absolute: 0 },
    });
  });

  it('tells the part further off absolutely when the part further off in ulps is lost to cancellation', () => {
    // mpmath, 40 digits: acos(1000001 + 1e−300i) = 9.99999000001500e−307 − 14.508658738523469…i.
    // complex.js 2.4.3 answered 0 − 14.50865012405984i there in our demo runs: its real part is
    // 2.9e16 ulps off but 1e−306 absolutely, its imaginary part 4.8e9 ulps and 8.6e−6 off.
    const expected = referenceDouble('acos', [1000001, 1e-300]);
    const d = diagnose([0, -14.50865012405984], expected);
    expect(d).toMatchObject({ kind: 'inaccurate', part: 'im', ulps: 4849511899, signDiffers: false });
    expect(d).not.toHaveProperty('cancellation');
    if (d.kind === 'inaccurate') expect(d.parts!.re.ulps).toBeGreaterThan(1e16);
  });

  it('tells a tiny part of the opposite sign even when the other part is further off absolutely', () => {
    // acosh(0.5 + 1e−300i): Im = acos(0.5) = π/3 = 1.0471975511965977…, Re = 1e−300/√(1 − 0.25) =
    // 1.1547e−300 to first order (the derivative of acosh is (z² − 1)^(−1/2); mpmath at 40 digits
    // loses this real part to cancellation itself). complex.js 2.4.3 answered
    // −5.551115123125783e−17 + 1.0471975511965976i in our demo runs: the imaginary part 1 ulp
    // (2.2e−16) off, further than the real part's 5.6e−17, but the real part has the wrong sign.
    const expected = referenceDouble('acosh', [0.5, 1e-300]);
    expect(expected[0]).toBeCloseTo(1e-300 / Math.sqrt(0.75), 310);
    const d = diagnose([-5.551115123125783e-17, 1.0471975511965976], expected);
    expect(d).toMatchObject({
      kind: 'inaccurate',
      part: 're',
      signDiffers: true,
      cancellation: { part: 're', absoluteError: 5.551115123125783e-17 },
      parts: { im: { ulps: 1 } },
    });
  });

  it('gives each part its ulps and absolute error, and no cancellation when both parts are of a size', () => {
    const expected = referenceDouble('asin', [0.3, 0.2]);
    const actual: ComplexDouble = [expected[0] + 8 * 2 ** -54, expected[1]];
    const d = diagnose(actual, expected);
    expect(d).toMatchObject({
      kind: 'inaccurate',
      part: 're',
      parts: { re: { ulps: 8 }, im: { ulps: 0, absolute: 0 } },
    });
    expect(d).not.toHaveProperty('cancellation');
  });

  it('labels a right value with a wrong output zero sign and a real part 104,212 ulps off both zero-sign and inaccurate', () => {
    // ISO/IEC 9899:2011 G.6.4.2: csqrt(4 + 0i) = 2 + 0i. One ulp of 2 is 2^−51.
    const expected = referenceDouble('sqrt', [4, 0]);
    const labels = labelsOf([2 + 104212 * 2 ** -51, -0], expected);
    expect(labels).toEqual([
      { kind: 'zero-sign', part: 'im', of: 'output' },
      expect.objectContaining({ kind: 'inaccurate', ulps: 104212, part: 're' }),
    ]);
  });

  it('labels the flipped-zero value of sqrt(−4 − 0i) 1,000 ulps off zero-sign of the input and inaccurate against that value', () => {
    // ISO/IEC 9899:2011 G.6.4.2: csqrt(−4 ± 0i) = +0 ± 2i. One ulp of 2 is 2^−51.
    const expected = referenceDouble('sqrt', [-4, -0]);
    const flipped = referenceDouble('sqrt', [-4, 0]);
    const labels = labelsOf([0, 2 + 1000 * 2 ** -51], expected, { flippedZero: { part: 'im', value: flipped } });
    expect(labels).toEqual([
      { kind: 'zero-sign', part: 'im', of: 'input' },
      expect.objectContaining({ kind: 'inaccurate', ulps: 1000, part: 'im' }),
    ]);
  });

  it('adds no accuracy label to a zero-sign finding within the tolerance', () => {
    // ISO/IEC 9899:2011 G.6.4.2: csqrt(4 + 0i) = 2 + 0i; 3 ulps are within the suite's 4.
    expect(labelsOf([2 + 3 * 2 ** -51, -0], referenceDouble('sqrt', [4, 0]))).toEqual([
      { kind: 'zero-sign', part: 'im', of: 'output' },
    ]);
  });

  it('names the imaginary part when it is the one further off', () => {
    const expected = referenceDouble('asin', [0.3, 0.2]);
    expect(diagnose([expected[0], expected[1] * (1 + 1e-9)], expected)).toMatchObject({
      kind: 'inaccurate',
      part: 'im',
      signDiffers: false,
    });
  });

  it('calls NaN where the reference is finite not-finite', () => {
    expect(diagnose([NaN, 0], referenceDouble('acos', [2, 0]))).toEqual({ kind: 'not-finite' });
  });

  it('calls a right value with a wrong output zero sign a zero-sign of the output', () => {
    // ISO/IEC 9899:2011 G.6.4.2: csqrt(4 + 0i) = 2 + 0i.
    expect(diagnose([2, -0], referenceDouble('sqrt', [4, 0]))).toEqual({ kind: 'zero-sign', part: 'im', of: 'output' });
  });

  it('says unexplained for a value far from every candidate', () => {
    expect(diagnose([42, 42], referenceDouble('atan', [0.5, 0]), { otherSide: [1, 1] }).kind).toBe('unexplained');
  });

  it('ignores the zero-sign candidate when it is the expected value too', () => {
    // sqrt(4 ± 0i) differ only in the sign of a zero; a value that is far off is not a zero-sign failure.
    const expected = referenceDouble('sqrt', [4, 0]);
    expect(
      diagnose([3, 0], expected, { flippedZero: { part: 'im', value: referenceDouble('sqrt', [4, -0]) } }).kind,
    ).toBe('unexplained');
  });
});
