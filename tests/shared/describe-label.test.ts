import type { Diagnosis } from '../../shared/diagnosis';
import { describeLabel } from '../../shared/describe-label';

// complex.js 2.4.3 at acosh(0.5 − 1e−300i) (a demo run): real part −5.551115123125783e−17 where
// the reference's is +1.1547005383792515e−300, imaginary part one ulp off.
const lostWithFlip: Extract<Diagnosis, { kind: 'inaccurate' }> = {
  kind: 'inaccurate',
  ulps: 1,
  relativeError: 2.2e-16,
  part: 're',
  signDiffers: true,
  parts: { re: { ulps: 4.48e18, absolute: 5.55e-17 }, im: { ulps: 1, absolute: 2.2e-16 } },
  cancellation: { part: 're', absoluteError: 5.55e-17, magnitude: 1.047 },
};

describe('describeLabel', () => {
  it('says a part lost to cancellation has the opposite sign, in both styles', () => {
    expect(describeLabel(lostWithFlip, 'short')).toBe(
      're lost to cancellation, opposite sign: error 5.6e-17 beside |value| 1.0',
    );
    expect(describeLabel(lostWithFlip, 'long')).toContain(
      'the real part is lost to cancellation and has the opposite sign: it is 5.6e-17 off',
    );
  });

  it('does not mention a sign when the lost part keeps it', () => {
    const kept = { ...lostWithFlip, signDiffers: false };
    expect(describeLabel(kept, 'short')).toBe('re lost to cancellation: error 5.6e-17 beside |value| 1.0');
    expect(describeLabel(kept, 'long')).not.toContain('opposite');
  });
});
