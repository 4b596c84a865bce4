import { describeLabel } from '../../../../harness/runner/formats/describe-label';
import { describeOutcome } from '../../../../harness/runner/formats/describe-outcome';

describe('describeLabel', () => {
  it('gives a part lost to cancellation as its absolute error beside |value|, not as its ulps', () => {
    // complex.js 2.4.3's acosh(0.5 + 1e−300i) in the demo runs: real part −5.6e−17 for +1.2e−300.
    const text = describeLabel({
      kind: 'inaccurate',
      ulps: 4372995238176751616,
      relativeError: 2.19e-16,
      part: 're',
      signDiffers: true,
      parts: { re: { ulps: 4372995238176751616, absolute: 5.551115123125783e-17 }, im: { ulps: 1, absolute: 2.2e-16 } },
      cancellation: { part: 're', absoluteError: 5.551115123125783e-17, magnitude: 1.0471975511965979 },
    });
    expect(text).toBe(
      'inaccurate, re lost to cancellation: absolute error 5.55e-17 beside |value| 1.05, opposite sign; im 1 ulp, relative error 2.19e-16',
    );
    expect(text).not.toMatch(/e18|4372995238176751616/);
  });

  it('joins every label of a point, leading first', () => {
    expect(
      describeOutcome({
        kind: 'fail',
        diagnosis: { kind: 'zero-sign', part: 're', of: 'input' },
        labels: [
          { kind: 'zero-sign', part: 're', of: 'input' },
          { kind: 'inaccurate', ulps: 104212, relativeError: 1.2177349587384315e-11, part: 'im', signDiffers: false },
        ],
        ulps: 104212,
        relativeError: 1.2177349587384315e-11,
      }),
    ).toBe('zero-sign (input re) + inaccurate, 104212 ulps in im, relative error 1.22e-11');
  });
});
