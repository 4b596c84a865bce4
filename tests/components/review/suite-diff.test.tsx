import { render, screen } from '@testing-library/react';
import { diffSuiteBodies } from '../../../components/review/diff-suite-bodies';
import { SuiteDiff } from '../../../components/review/suite-diff';
import type { SuiteVersionView } from '../../../shared/suite-version-view';

const body = (over: Record<string, unknown> = {}) => ({
  id: 'cube-root-demo',
  version: 1,
  title: 'Cube root of z(z−1)',
  story: '',
  subject: 'cbrt(z*(z - 1))',
  branch: {
    kind: 'regular',
    g: 'z*(z - 1)',
    nu: '1/3',
    z0: { re: '2', im: '0' },
    k: 0,
    cuts: [
      {
        points: [
          { re: '0', im: '0' },
          { re: '1', im: '0' },
        ],
        to_infinity: true,
      },
    ],
  },
  convention: 'signed-zero',
  paths: [
    {
      kind: 'circle',
      name: 'wide',
      center: { re: '0', im: '0' },
      radius: '2',
      start_angle: '0',
      turns: '1',
      direction: 'ccw',
      samples: 65,
    },
  ],
  tolerances: { values: { ulps: 2 } },
  properties: [],
  ...over,
});

const view = (version: number, b: unknown, status: SuiteVersionView['status']): SuiteVersionView =>
  ({
    id: `v${version}`,
    suiteId: 's',
    slug: 'cube-root-demo',
    version,
    status,
    body: b,
    author: { id: 'a', displayName: 'Ravi Dutta' },
    reviewer: null,
    reviewComment: null,
    createdAt: '2026-12-01T00:00:00Z',
    submittedAt: null,
    reviewedAt: null,
  }) as SuiteVersionView;

describe('diffSuiteBodies', () => {
  it('lists changed, added and removed leaves by dotted field, ignoring the version number', () => {
    const before = body();
    const after = body({
      version: 2,
      title: 'Cube root of z(z−1), one cut to infinity',
      paths: [
        {
          kind: 'circle',
          name: 'wide',
          center: { re: '0', im: '0' },
          radius: '3',
          start_angle: '0',
          turns: '1',
          direction: 'ccw',
          samples: 65,
        },
        { kind: 'segment', name: 'across', from: { re: '2', im: '1' }, to: { re: '2', im: '-1' }, samples: 9 },
      ],
      tolerances: {},
    });
    const changes = diffSuiteBodies(before, after);
    expect(changes).toContainEqual({
      field: 'title',
      change: 'changed',
      before: 'Cube root of z(z−1)',
      after: 'Cube root of z(z−1), one cut to infinity',
    });
    expect(changes).toContainEqual({ field: 'paths.0.radius', change: 'changed', before: '2', after: '3' });
    expect(changes).toContainEqual({ field: 'paths.1.name', change: 'added', before: null, after: 'across' });
    expect(changes).toContainEqual({ field: 'tolerances.values.ulps', change: 'removed', before: '2', after: null });
    expect(changes.some((c) => c.field === 'version')).toBe(false);
    expect(changes.some((c) => c.field.startsWith('branch'))).toBe(false);
  });

  it('counts an empty list the older version predates as no change, and a list that gains items as added', () => {
    expect(diffSuiteBodies(body(), body({ version: 2, counterparts: [] }))).toEqual([]);
    expect(diffSuiteBodies(body(), body({ version: 2, counterparts: [{ subject: 'z^(1/2)' }] }))).toEqual([
      { field: 'counterparts.0.subject', change: 'added', before: null, after: 'z^(1/2)' },
    ]);
  });

  it('finds nothing between equal bodies', () => {
    expect(diffSuiteBodies(body(), body({ version: 7 }))).toEqual([]);
  });
});

describe('SuiteDiff', () => {
  it('shows each change with its old and new value in words and glyphs', () => {
    render(
      <SuiteDiff
        previous={view(1, body(), 'approved')}
        current={view(2, body({ version: 2, branch: { ...body().branch, k: 1 } }), 'submitted')}
      />,
    );
    expect(screen.getByText('Against version 1 (approved): 1 changed, 0 added, 0 removed.')).toBeTruthy();
    expect(screen.getByLabelText('branch.k changed')).toBeTruthy();
    expect(screen.getByText('− was 0')).toBeTruthy();
    expect(screen.getByText('+ now 1')).toBeTruthy();
  });

  it('says when there is no previous version to compare with', () => {
    render(<SuiteDiff previous={null} current={view(1, body(), 'submitted')} />);
    expect(screen.getByTestId('suite-diff').textContent).toMatch(/first version: there is nothing to compare/);
  });
});
