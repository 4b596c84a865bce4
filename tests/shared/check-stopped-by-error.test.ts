import { checkStoppedByError } from '../../shared/check-stopped-by-error';
import type { OutcomeCounts } from '../../shared/run-result';

const counts = (over: Partial<OutcomeCounts>): OutcomeCounts => ({
  pass: 0,
  fail: 0,
  error: 0,
  skipped: 0,
  notApplicable: 0,
  ...over,
});

describe('checkStoppedByError', () => {
  it('stops a done check that judged no point, whatever its outcome says', () => {
    // A library without the function: every point skipped.
    expect(checkStoppedByError({ status: 'done', outcome: 'error', counts: counts({ skipped: 154 }) })).toBe(true);
    // Every point not applicable to the entry, or a suite with no point at all.
    expect(checkStoppedByError({ status: 'done', outcome: 'pass', counts: counts({ notApplicable: 12 }) })).toBe(true);
    expect(checkStoppedByError({ status: 'done', outcome: 'pass', counts: counts({}) })).toBe(true);
  });

  it('stops a check with an error outcome even when it judged points', () => {
    expect(checkStoppedByError({ status: 'done', outcome: 'error', counts: counts({ pass: 40, error: 2 }) })).toBe(
      true,
    );
  });

  it('does not stop a check that judged points and ended in a pass or a failure', () => {
    expect(checkStoppedByError({ status: 'done', outcome: 'pass', counts: counts({ pass: 49 }) })).toBe(false);
    expect(checkStoppedByError({ status: 'done', outcome: 'fail', counts: counts({ pass: 40, fail: 3 }) })).toBe(false);
  });

  it('does not stop a check that has not run or was cancelled before it ran', () => {
    for (const status of ['queued', 'running', 'cancelled'] as const)
      expect(checkStoppedByError({ status, outcome: null, counts: null })).toBe(false);
  });
});
