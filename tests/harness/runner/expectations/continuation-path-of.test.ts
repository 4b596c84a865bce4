import type { SuitePath } from '../../../../shared/schemas/suite-path-schema';
import { suitePathSchema } from '../../../../shared/schemas/suite-path-schema';
import { continuationPathOf } from '../../../../harness/runner/expectations/continuation-path-of';

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
