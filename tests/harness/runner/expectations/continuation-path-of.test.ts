import type { SuitePath } from '../../../../shared/schemas/suite-path-schema';
import { suitePathSchema } from '../../../../shared/schemas/suite-path-schema';
import { continuationPathOf } from '../../../../harness/runner/expectations/continuation-path-of';
import { parseSubject } from '../../../../harness/expressions/parse-subject';
import { continueRegularBranch } from '../../../../harness/reference/continuation/continue-regular-branch';
import { FactoredFunction } from '../../../../harness/reference/continuation/factored-function';
import { Rational } from '../../../../harness/reference/numbers/rational';

const circle = (start_angle: string, turns = '1'): SuitePath =>
  suitePathSchema.parse({
    kind: 'circle',
    name: 'c',
    center: { re: '0.1', im: '0' },
    radius: '2',
    start_angle,
    turns,
    samples: 9,
  });

describe('continuationPathOf', () => {
  it.each([
    ['pi/2', '1/4'],
    ['-3pi/4', '-3/8'],
    ['0.5*pi', '1/4'],
    ['pi', '1/2'],
  ])('passes a start angle of %s to the engine as exactly %s turn', (angle, turns) => {
    const spec = continuationPathOf(circle(angle));
    expect(spec?.kind === 'circle' && spec.startAngle.kind === 'turns' && spec.startAngle.turns.toString()).toBe(turns);
  });

  it('carries "pi/4" and 3/8 turn from the suite to the engine exactly: the arc ends on the cut at −1, from above', () => {
    // √z, k = 0 at z0 = 1, on the plane cut along (−∞, 0]. In doubles π/4 + 3π/4 lands past π, below
    // the cut; exactly, the arc ends on it and keeps the upper side's value, csqrt(−1 + i0) = +i
    // (ISO/IEC 9899:2011 G.6.4.2).
    const path = suitePathSchema.parse({
      kind: 'circle',
      name: 'c',
      center: { re: '0', im: '0' },
      radius: '1',
      start_angle: 'pi/4',
      turns: '3/8',
      samples: 9,
    });
    const spec = continuationPathOf(path);
    if (!spec) throw new Error('no path');
    const result = continueRegularBranch({
      g: FactoredFunction.fromSubject(parseSubject('z')),
      nu: { re: new Rational(1n, 2n), im: Rational.ZERO },
      z0: [Rational.ONE, Rational.ZERO],
      start: { kind: 'sheet', k: 0 },
      path: spec,
      at: [Rational.ONE],
      cuts: [
        {
          points: [
            [Rational.ZERO, Rational.ZERO],
            [new Rational(-1n), Rational.ZERO],
          ],
          toInfinity: true,
        },
      ],
    });
    if (result.kind !== 'continued') throw new Error(result.reason);
    const { z, f } = result.values[0]!;
    expect([z.re.toDecimal(40), z.im.toDecimal(40), f.re.toDecimal(40), f.im.toDecimal(40)]).toEqual([
      '-1',
      '0',
      '0',
      '1',
    ]);
  });

  it('passes a start angle in radians as those exact radians, and the centre and turns as written', () => {
    const spec = continuationPathOf(circle('1.5', '1/3'));
    if (spec?.kind !== 'circle') throw new Error('not a circle');
    expect(spec.startAngle.kind === 'radians' && spec.startAngle.radians.toString()).toBe('3/2');
    expect(spec.center[0].toString()).toBe('1/10');
    expect(spec.turns.toString()).toBe('1/3');
  });

  it('gives a segment as a two-point polyline and no path for a grid', () => {
    const segment = suitePathSchema.parse({
      kind: 'segment',
      name: 's',
      from: { re: '1', im: '0' },
      to: { re: '0x1.8p1', im: '-1/3' },
      samples: 3,
    });
    const spec = continuationPathOf(segment);
    expect(spec?.kind === 'polyline' && spec.points.map((p) => p.map(String))).toEqual([
      ['1', '0'],
      ['3', '-1/3'],
    ]);
    const grid = suitePathSchema.parse({
      kind: 'grid',
      name: 'g',
      min: { re: '-1', im: '-1' },
      max: { re: '1', im: '1' },
      columns: 2,
      rows: 2,
    });
    expect(continuationPathOf(grid)).toBeNull();
  });
});
