import type { FailureView } from '../../shared/failure-view';

/** `n` failure rows as GET /api/failures sends them, numbered from `from`, alternating zero-sign and cut-side. */
export function failureRows(n: number, from = 1): FailureView[] {
  return Array.from({ length: n }, (_, k) => {
    const i = from + k;
    const diagnosis: FailureView['diagnosis'] & object =
      i % 2 ? { kind: 'zero-sign', part: 'im', of: 'input' } : { kind: 'cut-side' };
    return {
      id: String(i),
      runId: '11111111-1111-4111-8111-111111111111',
      suiteSlug: 'sqrt-principal-sz',
      suiteVersion: 1,
      targetName: 'complex.js@2.4.3',
      convention: 'signed-zero',
      pathName: 'straddle cut 1',
      pointIndex: i,
      t: 0.5,
      label: 'on -0',
      z: { re: '-4', im: '-0' },
      zHex: { re: '-0x1p+2', im: '-0x0p+0' },
      expected: { re: '0', im: '-2' },
      actual: { re: '0', im: '2' },
      outcomeKind: 'fail',
      diagnosis,
      ulps: i % 2 ? null : 1e18,
      relativeError: 2,
      isRegression: i === 1,
      labels: [diagnosis],
      findingClass: 'branch',
    };
  });
}
