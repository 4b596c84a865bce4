import { formatSummary } from '../../../../harness/runner/formats/format-summary';
import { buildPlan } from '../../../../harness/runner/plan/build-plan';
import { runPlan } from '../../../../harness/runner/plan/run-plan';
import type { TargetDescriptor } from '../../../../harness/adapters/target-descriptor';
import { seededReferenceCache } from '../../../setup/seeded-reference-cache';
import { loadDemoSuite } from '../support/load-demo-suite';
import { referenceTarget } from '../support/reference-target';

const cache = seededReferenceCache();

describe('formatSummary', () => {
  it('counts every finding by class and label and lists only the first branch findings, saying how many more there are', async () => {
    // The reference's own values, except sqrt's imaginary parts negated (the other sheet: branch
    // findings) and exp's real parts 2^-40 too large (accuracy findings only).
    const target: TargetDescriptor = {
      name: 'flipped@1',
      library: 'flipped',
      version: '1',
      settings: {},
      open: () =>
        referenceTarget('flipped@1', (op, _args, v) =>
          op === 'sqrt' ? [v[0], -v[1]] : op === 'exp' ? [v[0] * (1 + 2 ** -40), v[1]] : v,
        ),
    };
    const result = await runPlan(
      buildPlan([loadDemoSuite('exp-principal-sz'), loadDemoSuite('sqrt-principal-sz')], [target]),
      { cache, properties: false },
    );
    expect(result.byClass.branch).toBeGreaterThan(3);
    expect(result.byClass.accuracy).toBeGreaterThan(0);
    const lines = formatSummary(result, 3).trimEnd().split('\n');
    expect(lines[0]).toMatch(
      /^sheetkeeper run: FAIL; 2 suite\(s\) × 1 target\(s\); \d+ pass · \d+ fail \(\d+ branch, \d+ accuracy\)/,
    );
    expect(lines[0]).toContain('[branch: ');
    expect(lines[0]).toContain('; accuracy: inaccurate ');
    expect(lines[1]).toBe('first branch findings:');
    expect(lines.slice(2, 5)).toEqual([
      expect.stringMatching(/^ {2}sqrt-principal-sz × flipped@1, "[^"]+" .*: z = .* expected .* got .* → /),
      expect.stringMatching(/^ {2}sqrt-principal-sz × flipped@1, /),
      expect.stringMatching(/^ {2}sqrt-principal-sz × flipped@1, /),
    ]);
    expect(lines[5]).toBe(
      `  … ${result.byClass.branch - 3} more branch finding(s): the JUnit file and --format json list every point`,
    );
    expect(lines).toHaveLength(6);
  });
});
