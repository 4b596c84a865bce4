import { countFindings } from '../../../scripts/findings-figures/count-findings';
import type { Diagnosis } from '../../../shared/diagnosis';
import type { PointFinding, RunResult } from '../../../shared/run-result';

const finding = (expected: [string, string], actual: [string, string], labels: Diagnosis[]): PointFinding =>
  ({
    path: 'p',
    index: 0,
    t: 0,
    z: { re: '1', im: '0' },
    expected: { re: expected[0], im: expected[1] },
    actual: { re: actual[0], im: actual[1] },
    outcome: { kind: 'fail', diagnosis: labels[0]!, labels, ulps: 1, relativeError: 1 },
  }) as PointFinding;
const inaccurate: Diagnosis = { kind: 'inaccurate', ulps: 3, relativeError: 6.7e-16 };
const zeroSign: Diagnosis = { kind: 'zero-sign', part: 'im', of: 'output' };

describe('countFindings', () => {
  it('counts classes, every label and the leading one, and the noise recomputed from the values', () => {
    const findings = [
      // 3 ulps of 1: within 4 eps normwise, zero signs right: noise.
      finding(['1', '0'], ['1.0000000000000007', '0'], [inaccurate]),
      // Within 4 eps too, but a zero of the other sign: not noise under signed-zero.
      finding(['1', '0'], ['1.0000000000000007', '-0'], [zeroSign, inaccurate]),
      // A tiny part of the opposite sign within 4 eps normwise: noise, but not with every sign right.
      finding(['1e-21', '1.5'], ['-5.551115123125783e-17', '1.5'], [inaccurate]),
      // Far off: not noise.
      finding(['1', '0'], ['1.001', '0'], [inaccurate]),
    ];
    const result = {
      counts: { pass: 0, fail: 4, error: 0, skipped: 0, notApplicable: 0 },
      results: [{ suite: { id: 's' }, checked: { convention: 'signed-zero' }, paths: [{ name: 'p', findings }] }],
    } as unknown as RunResult;
    const f = countFindings(result);
    expect(f).toMatchObject({
      failures: 4,
      listed: 4,
      byClass: { branch: 1, accuracy: 3 },
      byLabel: { inaccurate: 4, 'zero-sign': 1 },
      byLeading: { inaccurate: 3, 'zero-sign': 1 },
      noise: 2,
      noiseSameSigns: 1,
    });
    expect(f.noiseExamples).toHaveLength(2);
  });
});
