import type { DecisionView } from '../../shared/decision-view';

/**
 * Decisions as GET /api/deviations gives them, for screen tests: an accepted deviation in force on
 * one path of complex.js 2.4.3 only, a bug verdict on a whole suite for every version, and an
 * accepted deviation that expired. Invented for the tests.
 */
export function decisionViews(): DecisionView[] {
  const base = {
    targetKey: 'complex.js',
    targetVersion: '2.4.3',
    pointKey: null,
    diagnosisKind: null,
    createdBy: 'Hanne Lindqvist',
    createdAt: '2026-12-05T08:00:00.000Z',
    revokedAt: null,
  };
  return [
    {
      ...base,
      id: 'aaaaaaaa-0000-4000-8000-000000000001',
      classification: 'accepted',
      scope: 'path',
      versions: 'this-version',
      suiteSlug: 'sqrt-principal',
      pathName: 'along the cut',
      reason: 'complex.js documents that it drops the sign of zero',
      expiresAt: '2099-01-31T00:00:00.000Z',
      failureId: '7',
      state: 'in-force',
    },
    {
      ...base,
      id: 'aaaaaaaa-0000-4000-8000-000000000002',
      classification: 'bug',
      scope: 'suite',
      versions: 'every-version',
      suiteSlug: 'acos-principal',
      pathName: null,
      reason: 'reported upstream',
      expiresAt: null,
      failureId: '9',
      state: 'in-force',
    },
    {
      ...base,
      id: 'aaaaaaaa-0000-4000-8000-000000000003',
      classification: 'accepted',
      scope: 'suite',
      versions: 'this-and-later',
      targetKey: 'mathjs/number',
      targetVersion: '15.2.0',
      suiteSlug: 'log-principal',
      pathName: null,
      reason: 'lived with it until the fix',
      expiresAt: '2026-11-30T00:00:00.000Z',
      failureId: '11',
      state: 'expired',
    },
  ];
}
