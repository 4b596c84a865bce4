import type { Diagnosis } from '../../../shared/diagnosis';
import { misplacedCutGroups } from '../../../harness/checks/misplaced-cut-groups';

const bad: Diagnosis = { kind: 'unexplained', relativeError: 1 };
/** Points 3..6 fail; step i joins points i and i + 1. */
const failing = [null, null, null, [bad], [bad], [bad], [bad], null, null];
const none = new Array(8).fill(0);
const jumpAt = (i: number) => none.map((_, k) => (k === i ? 1 : 0));

describe('misplacedCutGroups', () => {
  it('puts the whole run beyond a library jump on the step entering it, or before one on the step leaving it', () => {
    expect(misplacedCutGroups(failing, none, jumpAt(2))).toEqual([{ from: 3, to: 6, steps: [2] }]);
    expect(misplacedCutGroups(failing, none, jumpAt(6))).toEqual([{ from: 3, to: 6, steps: [6] }]);
  });

  it('reaches from an unpaired mismatch inside the run to the nearer end, and pairs two mismatches', () => {
    expect(misplacedCutGroups(failing, none, jumpAt(5))).toEqual([{ from: 6, to: 6, steps: [5] }]);
    expect(misplacedCutGroups(failing, jumpAt(5), jumpAt(3))).toEqual([{ from: 4, to: 5, steps: [3, 5] }]);
  });
});
