import fc from 'fast-check';
import { runIdPrefix } from '../../../shared/schemas/run-id-prefix';

const RULE = 'must be a run id or its first 8 or more characters, as in "Run 37e7ec6f"';
const issues = (value: unknown) => {
  const r = runIdPrefix.safeParse(value);
  return r.success ? [] : r.error.issues.map((i) => i.message);
};

describe('runIdPrefix', () => {
  const SEED = 20261205;

  it(`accepts every start of a run id from its 8th character on, in either case (seed ${SEED})`, () => {
    fc.assert(
      fc.property(fc.uuid(), fc.integer({ min: 8, max: 36 }), fc.boolean(), (id, length, upper) => {
        const typed = upper ? id.slice(0, length).toUpperCase() : id.slice(0, length);
        expect(runIdPrefix.parse(` ${typed} `)).toBe(id.slice(0, length));
      }),
      { seed: SEED, numRuns: 200 },
    );
  });

  it('refuses fewer than 8 digits, other characters, dashes out of place and more than an id, naming the rule', () => {
    for (const bad of ['37e7ec6', '37e7ec6g', '37e7-ec6f', '37e7ec6f1', '37e7ec6f--', '37e7ec6f-1a2-b', 'run 37e7ec6f'])
      expect([bad, issues(bad)]).toEqual([bad, [RULE]]);
    expect(issues('37e7ec6f-1a2b-4c3d-8e9f-0123456789ab0')).toEqual([RULE]);
    expect(issues('37e7ec6f\u0000')).toHaveLength(1);
  });
});
