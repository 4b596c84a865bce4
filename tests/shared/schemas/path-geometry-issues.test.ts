import fc from 'fast-check';
import { buildPath } from '../../../harness/paths/build-path';
import { regionArbitrary } from '../../../harness/properties/region-arbitrary';
import { toPathSpec } from '../../../harness/runner/evaluation/to-path-spec';
import { suitePathSchema } from '../../../shared/schemas/suite-path-schema';
import { suiteSchema } from '../../../shared/schemas/suite-schema';
import { propertyCheckSchema } from '../../../shared/schemas/property-check-schema';

const SEED = 20261205;
const z = (re: string, im: string) => ({ re, im });
const O = z('0', '0');

/** Every way a path of the suite format can check nothing (docs/suite-format.md, "Paths that check nothing"). */
const CHECKS_NOTHING: [string, object, string][] = [
  ['a circle of radius -1', { kind: 'circle', center: O, radius: '-1', samples: 8 }, 'radius'],
  ['a circle of radius 0', { kind: 'circle', center: O, radius: '0', samples: 8 }, 'radius'],
  ['a circle of radius -0', { kind: 'circle', center: O, radius: '-0', samples: 8 }, 'radius'],
  ['a radius that reads as 0', { kind: 'circle', center: O, radius: '1e-400', samples: 8 }, 'radius'],
  ['a radius past the largest double', { kind: 'circle', center: O, radius: '1e400', samples: 8 }, 'radius'],
  ['an infinite radius', { kind: 'circle', center: O, radius: 'inf', samples: 8 }, 'radius'],
  ['a NaN radius', { kind: 'circle', center: O, radius: 'nan', samples: 8 }, 'radius'],
  ['0 turns', { kind: 'circle', center: O, radius: '1', turns: '0', samples: 8 }, 'turns'],
  ['negative turns', { kind: 'circle', center: O, radius: '1', turns: '-1/2', samples: 8 }, 'turns'],
  ['a start angle over 0', { kind: 'circle', center: O, radius: '1', start_angle: 'pi/0', samples: 8 }, 'start_angle'],
  ['a NaN centre', { kind: 'circle', center: z('nan', '0'), radius: '1', samples: 8 }, 'center.re'],
  ['an infinite centre', { kind: 'circle', center: z('0', '-inf'), radius: '1', samples: 8 }, 'center.im'],
  ['a ratio over 0', { kind: 'segment', from: z('1/0', '0'), to: O, samples: 8 }, 'from.re'],
  ['no samples', { kind: 'segment', from: O, to: z('1', '0'), samples: 0 }, 'samples'],
  ['NaN samples', { kind: 'segment', from: O, to: z('1', '0'), samples: NaN }, 'samples'],
  ['infinite samples', { kind: 'segment', from: O, to: z('1', '0'), samples: Infinity }, 'samples'],
  ['an empty list of t', { kind: 'segment', from: O, to: z('1', '0'), at: [] }, 'at'],
  ['a t past the end', { kind: 'segment', from: O, to: z('1', '0'), at: ['0', '1.5'] }, 'at.1'],
  ['a negative t', { kind: 'circle', center: O, radius: '1', at: ['-0.25'] }, 'at.0'],
  ['a polyline of one point twice', { kind: 'polyline', points: [z('1', '1'), z('1', '1')], samples: 4 }, 'points'],
  [
    'a polyline longer than any double',
    { kind: 'polyline', points: [z('-1e308', '0'), z('1e308', '0')], samples: 4 },
    'points',
  ],
  [
    'a straddle of width 0',
    { kind: 'straddle', cut: { kind: 'segment', from: O, to: z('1', '0') }, along: ['0.5'], offsets: ['0'] },
    'offsets.0',
  ],
  [
    'a straddle offset that reads as 0',
    { kind: 'straddle', cut: { kind: 'segment', from: O, to: z('1', '0') }, along: ['0.5'], offsets: ['1e-330'] },
    'offsets.0',
  ],
  [
    'a cut of no length',
    { kind: 'straddle', cut: { kind: 'segment', from: z('-1', '0'), to: z('-1', '-0') }, along: ['0.5'] },
    'cut.to',
  ],
  [
    'a ray through its own start',
    { kind: 'straddle', cut: { kind: 'ray', from: O, through: O }, along: ['1'] },
    'cut.through',
  ],
  [
    'a place past the end of a cut segment',
    { kind: 'straddle', cut: { kind: 'segment', from: O, to: z('1', '0') }, along: ['2'] },
    'along.0',
  ],
  [
    'a negative distance along a ray',
    { kind: 'straddle', cut: { kind: 'ray', from: O, through: z('-1', '0') }, along: ['-1'] },
    'along.0',
  ],
  [
    'a straddle with no places',
    { kind: 'straddle', cut: { kind: 'ray', from: O, through: z('-1', '0') }, along: [] },
    'along',
  ],
  ['an empty list of points', { kind: 'points', points: [] }, 'points'],
  ['a point at infinity', { kind: 'points', points: [z('inf', '0')] }, 'points.0.re'],
  ['a grid of no width', { kind: 'grid', min: z('1', '0'), max: z('1', '1'), columns: 2, rows: 2 }, 'max.re'],
  ['a grid upside down', { kind: 'grid', min: z('0', '1'), max: z('1', '0'), columns: 2, rows: 2 }, 'max.im'],
  ['a grid of one column', { kind: 'grid', min: O, max: z('1', '1'), columns: 1, rows: 2 }, 'columns'],
];

/** The points the harness builds of a path as written (the schema's defaults filled in), 0 when it throws. */
function builtPoints(path: object): number {
  const loose = { name: 'p', direction: 'ccw', start_angle: '0', turns: '1', offsets: ['1e-3'], both_zero_signs: true };
  try {
    return buildPath(toPathSpec({ ...loose, ...path } as never)).length;
  } catch {
    return 0;
  }
}

const suite = (path: object) => ({
  id: 'checks-nothing',
  version: 1,
  title: 'A path that checks nothing',
  subject: 'sqrt(z)',
  branch: { kind: 'principal' },
  convention: 'signed-zero',
  tolerances: { values: { ulps: 4 } },
  paths: [{ name: 'p', ...path }],
});

describe('paths that check nothing', () => {
  it.each(CHECKS_NOTHING)('refuses %s beside the field', (_what, path, field) => {
    const parsed = suiteSchema.safeParse(suite(path));
    expect(parsed.success).toBe(false);
    expect(parsed.error!.issues.map((i) => i.path.join('.'))).toContain(`paths.0.${field}`);
  });

  it.each(CHECKS_NOTHING)('agrees with the harness, which cannot build %s', (_what, path) => {
    // Sample counts and empty lists are cut off by the schema's own bounds; the rest throw in the builder.
    expect(builtPoints(path)).toBe(0);
  });

  it('accepts exactly the paths the harness builds into at least one point', () => {
    // Law: suitePathSchema accepts a path ⇔ buildPath makes at least one point of it without
    // throwing, over paths of every kind whose numbers come from a pool of edge values.
    const n = fc.constantFrom(
      '-1',
      '0',
      '-0',
      '1',
      '2',
      '0.5',
      '1/3',
      '1/0',
      '1e-400',
      '5e-324',
      '1e308',
      '-1e308',
      'inf',
      'nan',
      '0x1p-1080',
      '0x1.8p1',
    );
    const pt = fc.record({ re: n, im: n });
    const sampling = fc.oneof(
      fc.record({ samples: fc.integer({ min: 2, max: 5 }) }),
      fc.record({ at: fc.array(n, { minLength: 1, maxLength: 3 }) }),
    );
    const path = fc.oneof(
      fc
        .tuple(
          fc.record({
            kind: fc.constant('circle'),
            center: pt,
            radius: n,
            turns: n,
            start_angle: fc.constantFrom('0', 'pi/2', '3pi/0', '1e400', 'nan'),
          }),
          sampling,
        )
        .map(([p, s]) => ({ ...p, ...s })),
      fc
        .tuple(fc.record({ kind: fc.constant('segment'), from: pt, to: pt }), sampling)
        .map(([p, s]) => ({ ...p, ...s })),
      fc
        .tuple(
          fc.record({ kind: fc.constant('polyline'), points: fc.array(pt, { minLength: 2, maxLength: 3 }) }),
          sampling,
        )
        .map(([p, s]) => ({ ...p, ...s })),
      fc.record({
        kind: fc.constant('straddle'),
        cut: fc.oneof(
          fc.record({ kind: fc.constant('segment'), from: pt, to: pt }),
          fc.record({ kind: fc.constant('ray'), from: pt, through: pt }),
        ),
        along: fc.array(n, { minLength: 1, maxLength: 2 }),
        offsets: fc.array(n, { minLength: 1, maxLength: 2 }),
      }),
      fc.record({ kind: fc.constant('points'), points: fc.array(pt, { minLength: 1, maxLength: 3 }) }),
      fc.record({ kind: fc.constant('grid'), min: pt, max: pt, columns: fc.constant(2), rows: fc.constant(3) }),
    );
    fc.assert(
      fc.property(path, (written) => {
        const parsed = suitePathSchema.safeParse({ name: 'p', ...written });
        const built = builtPoints(written);
        return parsed.success === built > 0;
      }),
      { seed: SEED, numRuns: 2000, verbose: true },
    );
  });
});

describe('property regions that hold no point', () => {
  const check = (region: object) => ({ law: 'range', region, seed: 1 });
  it.each([
    ['a disc of radius 0', { kind: 'disc', center: O, radius: '0' }, 'region.radius'],
    ['a disc of radius -1', { kind: 'disc', center: O, radius: '-1' }, 'region.radius'],
    ['a disc around NaN', { kind: 'disc', center: z('nan', '0'), radius: '1' }, 'region.center.re'],
    ['a box of no width', { kind: 'box', min: O, max: z('0', '1') }, 'region.max.re'],
    ['a box of no height', { kind: 'box', min: O, max: z('1', '-1') }, 'region.max.im'],
    ['near-cuts at distance 0', { kind: 'near-cuts', distance: '0' }, 'region.distance'],
    ['near-cuts at an infinite distance', { kind: 'near-cuts', distance: 'inf' }, 'region.distance'],
  ])('refuses %s beside the field, as the harness’s region sampler does', (_what, region, field) => {
    const parsed = propertyCheckSchema.safeParse(check(region));
    expect(parsed.success).toBe(false);
    expect(parsed.error!.issues.map((i) => i.path.join('.'))).toContain(field);
    expect(regionArbitrary(region as never, [])).toHaveProperty('reason');
  });
});
