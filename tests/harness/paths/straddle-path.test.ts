import fc from 'fast-check';
import { straddlePath } from '../../../harness/paths/straddle-path';
import { nextDouble } from '../../../harness/paths/next-double';

import { zeroText as show } from './zero-text';

describe('straddlePath', () => {
  // The principal cut of sqrt and log: the negative real axis (ISO/IEC 9899:2011 G.6.4.2, G.6.3.2).
  const negativeRealAxis = { kind: 'ray', from: { re: 0, im: 0 }, through: { re: -1, im: 0 } } as const;

  it('puts the default offsets 1e-3, 1e-9, 1e-300 and 5e-324 on both sides of a cut on the real axis, ordered across it', () => {
    const points = straddlePath({ kind: 'straddle', cut: negativeRealAxis, along: [2] });
    expect(points.map((p) => `${p.label}: ${show(p.z.re)} ${show(p.z.im)}`)).toEqual([
      'below 1e-3: -2 -0.001',
      'below 1e-9: -2 -1e-9',
      'below 1e-300: -2 -1e-300',
      'below 5e-324: -2 -5e-324',
      'on +0: -2 +0',
      'on -0: -2 -0',
      'above 5e-324: -2 5e-324',
      'above 1e-300: -2 1e-300',
      'above 1e-9: -2 1e-9',
      'above 1e-3: -2 0.001',
    ]);
  });

  it('keeps the least subnormal 5e-324 = 2^-1074 as the offset next to zero', () => {
    const points = straddlePath({ kind: 'straddle', cut: negativeRealAxis, along: [1], offsets: ['5e-324'] });
    expect(points.map((p) => p.z.im)).toEqual([-(2 ** -1074), 0, -0, 2 ** -1074]);
  });

  it('straddles a cut on the imaginary axis with ±0 in the real part, labelled right and left', () => {
    // asin's cuts lie on the real axis; atan's lie on the imaginary axis beyond ±i (ISO/IEC 9899:2011 G.6.2.3 by conjugation from catanh).
    const points = straddlePath({
      kind: 'straddle',
      cut: { kind: 'ray', from: { re: 0, im: 1 }, through: { re: 0, im: 2 } },
      along: ['0.5'],
      offsets: [1e-9],
    });
    expect(points.map((p) => `${p.label}: ${show(p.z.re)} ${show(p.z.im)}`)).toEqual([
      'left 1e-9: -1e-9 1.5',
      'on +0: +0 1.5',
      'on -0: -0 1.5',
      'right 1e-9: 1e-9 1.5',
    ]);
  });

  it('replaces an offset that rounds back onto an off-axis cut by the next double on that side', () => {
    const points = straddlePath({
      kind: 'straddle',
      cut: { kind: 'segment', from: { re: -1, im: 1 }, to: { re: 1, im: 1 } },
      along: [0.5],
      offsets: ['1e-300'],
    });
    // The midpoint of −1 … 1 is reached from the left, so its real part is −0 (lerp-component.ts).
    expect(points.map((p) => [p.label, p.z.re, p.z.im])).toEqual([
      ['below 1e-300 (nearest double)', -0, nextDouble(1, -1)],
      ['on', -0, 1],
      ['above 1e-300 (nearest double)', -0, nextDouble(1, 1)],
    ]);
  });

  it('takes t as the fraction along a cut segment and of the sampled distances along a ray', () => {
    const seg = straddlePath({
      kind: 'straddle',
      cut: { kind: 'segment', from: { re: 1, im: 0 }, to: { re: 3, im: 0 } },
      along: [0, 0.5, 1],
      offsets: [1e-3],
    });
    expect([...new Set(seg.map((p) => `${p.t}@${p.z.re}`))]).toEqual(['0@1', '0.5@2', '1@3']);
    const ray = straddlePath({ kind: 'straddle', cut: negativeRealAxis, along: [1, 2, 5], offsets: [1e-3] });
    expect([...new Set(ray.map((p) => `${p.t}@${p.z.re}`))]).toEqual(['0@-1', '0.25@-2', '1@-5']);
  });

  it('labels the sides of an oblique cut left and right as seen walking from its start', () => {
    const points = straddlePath({
      kind: 'straddle',
      cut: { kind: 'segment', from: { re: 0, im: 0 }, to: { re: 1, im: 1 } },
      along: [0.5],
      offsets: [0.25],
    });
    const left = points.find((p) => p.label === 'left 0.25');
    const right = points.find((p) => p.label === 'right 0.25');
    // Left of the direction (1, 1) is where im − re > 0.
    expect((left?.z.im as number) - (left?.z.re as number)).toBeGreaterThan(0);
    expect((right?.z.im as number) - (right?.z.re as number)).toBeLessThan(0);
    expect(points.filter((p) => p.label === 'on')).toHaveLength(1);
  });

  it('puts every "above" point strictly above a horizontal cut and every "below" point strictly below it (seed 7501)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -1e6, max: 1e6, noNaN: true }),
        fc.double({ min: -1e6, max: 1e6, noNaN: true }),
        fc.array(fc.double({ min: 5e-324, max: 1, noNaN: true }), { minLength: 1, maxLength: 6 }),
        (height, start, offsets) => {
          const points = straddlePath({
            kind: 'straddle',
            cut: { kind: 'ray', from: { re: start, im: height }, through: { re: start - 1, im: height } },
            along: [0, 3],
            offsets,
          });
          return points.every((p) => {
            const side = p.label?.split(' ')[0];
            if (side === 'above') return p.z.im > height;
            if (side === 'below') return p.z.im < height;
            return side === 'on' && p.z.im === height;
          });
        },
      ),
      { seed: 7501, numRuns: 1000 },
    );
  });

  it('refuses a degenerate cut, a non-positive offset and a position off the segment', () => {
    expect(() =>
      straddlePath({
        kind: 'straddle',
        cut: { kind: 'segment', from: { re: 1, im: 0 }, to: { re: 1, im: 0 } },
        along: [0],
      }),
    ).toThrow(RangeError);
    expect(() => straddlePath({ kind: 'straddle', cut: negativeRealAxis, along: [1], offsets: [0] })).toThrow(
      RangeError,
    );
    expect(() =>
      straddlePath({
        kind: 'straddle',
        cut: { kind: 'segment', from: { re: 1, im: 0 }, to: { re: 2, im: 0 } },
        along: [2],
      }),
    ).toThrow(RangeError);
  });
});
