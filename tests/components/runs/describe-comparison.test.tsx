import { describeComparison } from '../../../components/runs/describe-comparison';
import type { RunComparison } from '../../../shared/run-comparison';

const none = { fail: 0, error: 0 };
const base: RunComparison = {
  previous: { id: 'p', finishedAt: null },
  common: { ...none, pairs: 0 },
  targetsAdded: { ...none, targets: [] },
  targetsRemoved: { ...none, targets: [] },
  suitesAdded: { ...none, slugs: [] },
  suitesRemoved: { ...none, slugs: [] },
};

describe('describeComparison', () => {
  it('says failure counts are not compared when the runs share no pair, without denying regressions', () => {
    const [first] = describeComparison(base);
    expect(first).toBe(
      'Failure counts are not compared: the two runs checked no suite × target pair in common (regressions are matched point by point, per library).',
    );
    expect(first).not.toMatch(/nothing to compare/);
  });

  it('compares the common pairs and names the targets that brought the other failures', () => {
    const lines = describeComparison({
      ...base,
      common: { fail: 12, error: -3, pairs: 19 },
      targetsAdded: { fail: 604, error: 0, targets: ['a@1', 'b@2', 'c@3'] },
    });
    expect(lines).toEqual([
      'On the 19 suite × target pairs both runs checked, since the previous completed run: ↑ 12 more failed, ↓ 3 fewer in error.',
      '3 targets added since the previous run (a@1, b@2, c@3): 604 more failures come from them.',
    ]);
  });
});
