import fc from 'fast-check';
import { circlePath } from '../../../harness/paths/circle-path';

import { zeroText as sign } from './zero-text';

describe('circlePath', () => {
  it('puts quarter-turn points exactly on the axes', () => {
    const points = circlePath({
      kind: 'circle',
      center: { re: 0, im: 0 },
      radius: 2,
      startAngle: 0,
      turns: 1,
      direction: 'ccw',
      samples: 5,
    });
    expect(points.map((p) => [p.t, Math.abs(p.z.re), Math.abs(p.z.im)])).toEqual([
      [0, 2, 0],
      [0.25, 0, 2],
      [0.5, 2, 0],
      [0.75, 0, 2],
      [1, 2, 0],
    ]);
  });

  it('returns −2 + 0i on the negative real axis reached from above, counter-clockwise', () => {
    const [, , half] = circlePath({
      kind: 'circle',
      center: { re: 0, im: 0 },
      radius: 2,
      startAngle: 0,
      turns: 1,
      direction: 'ccw',
      samples: 5,
    });
    expect([half?.z.re, sign(half?.z.im as number)]).toEqual([-2, '+0']);
  });

  it('returns −2 − 0i on the negative real axis reached from below, clockwise', () => {
    const [, , half] = circlePath({
      kind: 'circle',
      center: { re: 0, im: 0 },
      radius: 2,
      startAngle: 0,
      turns: 1,
      direction: 'cw',
      samples: 5,
    });
    expect([half?.z.re, sign(half?.z.im as number)]).toEqual([-2, '-0']);
  });

  it('gives each zero part the sign of the side the circle comes from, and the side it leaves into at t = 0', () => {
    const ccw = circlePath({
      kind: 'circle',
      center: { re: 0, im: 0 },
      radius: 1,
      startAngle: 0,
      turns: 1,
      direction: 'ccw',
      samples: 5,
    });
    // t=0 leaves into the upper half plane; t=¼ comes from re > 0; t=¾ from re < 0; t=1 from below.
    expect(ccw.map((p) => `${sign(p.z.re)} ${sign(p.z.im)}`)).toEqual(['1 +0', '+0 1', '-1 +0', '-0 -1', '1 -0']);
    const cw = circlePath({
      kind: 'circle',
      center: { re: 0, im: 0 },
      radius: 1,
      startAngle: 0,
      turns: 1,
      direction: 'cw',
      samples: 5,
    });
    expect(cw.map((p) => `${sign(p.z.re)} ${sign(p.z.im)}`)).toEqual(['1 -0', '+0 -1', '-1 -0', '-0 1', '1 +0']);
  });

  it('gives a point where the circle only touches an axis the sign of the side of its center', () => {
    // Center i, radius 1, starting at −π/2: the circle touches the real axis at 0 and stays above it.
    const [touch] = circlePath({
      kind: 'circle',
      center: { re: 0, im: 1 },
      radius: 1,
      startAngle: '-pi/2',
      turns: 1,
      direction: 'ccw',
      samples: 3,
    });
    expect(sign(touch?.z.re as number)).toBe('+0');
    expect(sign(touch?.z.im as number)).toBe('+0');
    const [below] = circlePath({
      kind: 'circle',
      center: { re: 0, im: -1 },
      radius: 1,
      startAngle: 'pi/2',
      turns: 1,
      direction: 'ccw',
      samples: 3,
    });
    expect(sign(below?.z.im as number)).toBe('-0');
  });

  it('maps t to the angle start + s·2π·turns·t: a half turn clockwise from π/2 at t = ½ of one turn ends at −π/2', () => {
    const points = circlePath({
      kind: 'circle',
      center: { re: 1, im: 1 },
      radius: 1,
      startAngle: 'pi/2',
      turns: 1,
      direction: 'cw',
      at: [0, 0.25, 0.5],
    });
    expect(points.map((p) => [p.z.re, p.z.im])).toEqual([
      [1, 2],
      [2, 1],
      [1, 0],
    ]);
  });

  it('winds twice when turns is 2', () => {
    const points = circlePath({
      kind: 'circle',
      center: { re: 0, im: 0 },
      radius: 1,
      startAngle: 0,
      turns: 2,
      direction: 'ccw',
      samples: 9,
    });
    expect(points.map((p) => Math.abs(p.z.re) + Math.abs(p.z.im))).toEqual(Array(9).fill(1));
    expect(points[4]?.z.re).toBe(1);
    expect(points[2]?.z.re).toBe(-1);
  });

  it('reads center and radius from decimal strings as the nearest doubles', () => {
    const [p] = circlePath({
      kind: 'circle',
      center: { re: '0.1', im: '-0' },
      radius: '0.2',
      startAngle: '0',
      turns: '1',
      direction: 'ccw',
      samples: 2,
    });
    expect(p?.z.re).toBe(0.1 + 0.2);
    expect(sign(p?.z.im as number)).toBe('+0');
  });

  it('lies on the circle and at the angle start + s·2π·turns·t for any t (seed 7201)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.constantFrom<'ccw' | 'cw'>('ccw', 'cw'),
        fc.integer({ min: 1, max: 3 }),
        (t, direction, turns) => {
          const [p] = circlePath({
            kind: 'circle',
            center: { re: 0.5, im: -0.25 },
            radius: 3,
            startAngle: 'pi/3',
            turns,
            direction,
            at: [t],
          });
          const dx = (p?.z.re as number) - 0.5;
          const dy = (p?.z.im as number) + 0.25;
          const angle = Math.PI / 3 + (direction === 'ccw' ? 1 : -1) * 2 * Math.PI * turns * t;
          return (
            Math.abs(Math.hypot(dx, dy) - 3) < 1e-14 &&
            Math.abs(dx - 3 * Math.cos(angle)) < 1e-13 &&
            Math.abs(dy - 3 * Math.sin(angle)) < 1e-13
          );
        },
      ),
      { seed: 7201, numRuns: 1000 },
    );
  });

  it('refuses a non-positive radius, non-positive turns and an unknown direction', () => {
    const base = {
      kind: 'circle',
      center: { re: 0, im: 0 },
      radius: 1,
      startAngle: 0,
      turns: 1,
      direction: 'ccw',
      samples: 3,
    } as const;
    expect(() => circlePath({ ...base, radius: 0 })).toThrow(RangeError);
    expect(() => circlePath({ ...base, turns: -1 })).toThrow(RangeError);
    expect(() => circlePath({ ...base, direction: 'up' as 'ccw' })).toThrow(RangeError);
  });
});
