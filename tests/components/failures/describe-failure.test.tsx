import { describeFailure } from '../../../components/failures/describe-failure';

describe('describeFailure', () => {
  it('gives an inaccurate value its ulps, the part they are in and a flipped sign', () => {
    // mpmath, 60 digits: Re asech(1000001 + 1e−9i) = 9.99998e−22; −5.55e−17 is what complex.js 2.4.3 returned in our demo runs.
    expect(
      describeFailure({
        outcomeKind: 'fail',
        ulps: 8.7e18,
        diagnosis: {
          kind: 'inaccurate',
          ulps: 8.656731785528058e18,
          relativeError: 3.5e-17,
          part: 're',
          signDiffers: true,
        },
      }),
    ).toEqual({
      tone: 'inaccurate',
      detail: '8.7e+18 ulps in re, opposite sign',
    });
    expect(
      describeFailure({
        outcomeKind: 'fail',
        ulps: 9,
        diagnosis: { kind: 'inaccurate', ulps: 9, relativeError: 1e-15, part: 'im', signDiffers: false },
      }).detail,
    ).toBe('9 ulps in im');
  });

  it('keeps to the ulps for a diagnosis stored before the part was recorded', () => {
    expect(
      describeFailure({
        outcomeKind: 'fail',
        ulps: 9,
        diagnosis: { kind: 'inaccurate', ulps: 9, relativeError: 1e-15 },
      }).detail,
    ).toBe('9 ulps');
  });
});
