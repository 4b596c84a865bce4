import { describeMatrixCell } from '../../../components/runs/describe-matrix-cell';
import type { RunMatrixCell } from '../../../shared/run-matrix-cell';

const RUN = '7d3f9a52-1c4e-4b8a-9f10-2a6c5e8d4b31';

const cell = (over: Partial<RunMatrixCell>): RunMatrixCell => ({
  suite: 'sqrt-principal-sz',
  target: 'complex.js@2.5.0',
  status: 'queued',
  outcome: null,
  counts: null,
  byClass: null,
  byDiagnosis: null,
  checked: null,
  errors: [],
  skipReasons: [],
  worker: null,
  noWorkerHasTarget: false,
  lawsFailed: 0,
  loopsFailed: [],
  ...over,
});

describe('describeMatrixCell and the workers', () => {
  it('says a pair waits for a worker that has its target when none is running, not merely that it is queued', () => {
    const words = describeMatrixCell(cell({ noWorkerHasTarget: true }), RUN);
    expect(words.headline).toBe('… waiting for a worker');
    expect(words.details).toEqual([
      'Waiting for a worker that has complex.js@2.5.0; none is running. These checks start once such a worker starts (npm run worker on a machine that has it).',
    ]);
    expect(words.label).toMatch(
      /^sqrt-principal-sz on complex\.js@2\.5\.0: Waiting for a worker that has complex\.js@2\.5\.0; none is running/,
    );
    expect(words.tone).toBe('live');
  });

  it('says a pair queued while a worker that has its target is running waits its turn', () => {
    const words = describeMatrixCell(cell({}), RUN);
    expect([words.headline, words.details, words.label]).toEqual([
      '… waiting its turn',
      [],
      'sqrt-principal-sz on complex.js@2.5.0: waiting its turn',
    ]);
  });

  it('names the worker running a pair, and the last one that took a pair queued again after its worker died', () => {
    expect(describeMatrixCell(cell({ status: 'running', worker: 'build-7:4121' }), RUN).details).toEqual([
      'on build-7:4121',
    ]);
    const again = describeMatrixCell(cell({ worker: 'build-7:4121' }), RUN);
    expect([again.headline, again.details]).toEqual([
      '… waiting its turn',
      ['started before on build-7:4121, which stopped'],
    ]);
  });

  it('names the worker that ran a finished pair, in its lines and in what a screen reader hears', () => {
    const words = describeMatrixCell(
      cell({
        status: 'done',
        outcome: 'pass',
        counts: { pass: 120, fail: 0, error: 0, skipped: 0, notApplicable: 0 },
        byClass: { branch: 0, accuracy: 0 },
        byDiagnosis: {},
        worker: 'ci-runner-2:88',
      }),
      RUN,
    );
    expect(words.details).toEqual(['ran on ci-runner-2:88']);
    expect(words.label).toBe('sqrt-principal-sz on complex.js@2.5.0: 120 passed, none failed, ran on ci-runner-2:88');
  });
});

describe('describeMatrixCell and an error cell', () => {
  const skippedEverywhere = (over: Partial<RunMatrixCell>) =>
    cell({
      suite: 'acsch-principal-sz',
      status: 'done',
      outcome: 'error',
      counts: { pass: 0, fail: 0, error: 0, skipped: 154, notApplicable: 0 },
      byClass: { branch: 0, accuracy: 0 },
      byDiagnosis: {},
      errors: [
        'nothing was checked: every point was skipped or not applicable to the entry (see the reasons per path)',
      ],
      ...over,
    });

  it('says why nothing was checked and leads to the page of the functions the target has, never to an empty table', () => {
    const words = describeMatrixCell(
      skippedEverywhere({
        skipReasons: [{ reason: 'complex.js@2.5.0 has no acsch', count: 154, lacks: ['acsch'] }],
      }),
      RUN,
    );
    expect(words.tone).toBe('error');
    expect(words.details).toEqual(['nothing was checked', '− 154 skipped: complex.js@2.5.0 has no acsch']);
    expect(words.link).toEqual({
      href: '/libraries/target?name=complex.js%402.5.0',
      words: 'what complex.js@2.5.0 has →',
      said: 'Open the functions complex.js@2.5.0 has (it has no acsch)',
    });
    expect(words.label).toBe(
      'acsch-principal-sz on complex.js@2.5.0: error, nothing was checked, 154 skipped because complex.js@2.5.0 has no acsch',
    );
  });

  it('is no link when the reason is not a missing function and no point is a row of the failure table', () => {
    const words = describeMatrixCell(
      skippedEverywhere({ skipReasons: [{ reason: 'no reference value there', count: 154 }] }),
      RUN,
    );
    expect(words.link).toBeNull();
    expect(words.details).toContain('− 154 skipped: no reference value there');
  });

  it('leads to the failure table when the pair has failing or errored points there', () => {
    const words = describeMatrixCell(
      skippedEverywhere({
        counts: { pass: 10, fail: 0, error: 2, skipped: 0, notApplicable: 0 },
        errors: ['path "circle r=2" threw: RangeError'],
      }),
      RUN,
    );
    expect(words.link?.href).toBe(`/failures?run=${RUN}&suite=acsch-principal-sz&target=complex.js%402.5.0`);
  });
});

describe('describeMatrixCell and the checks beyond the points', () => {
  const allPointsPassed = (over: Partial<RunMatrixCell>) =>
    cell({
      suite: 'log-principal-sz',
      target: 'complex.js@2.3.0',
      status: 'done',
      outcome: 'fail',
      counts: { pass: 154, fail: 0, error: 0, skipped: 0, notApplicable: 0 },
      byClass: { branch: 0, accuracy: 0 },
      byDiagnosis: {},
      ...over,
    });

  it('never shows a pair as passed when a property law failed with every point passed', () => {
    // The demo's log-principal-sz on complex.js@2.3.0: every point passed, exp(log z) = z did not.
    const words = describeMatrixCell(allPointsPassed({ lawsFailed: 1 }), RUN);
    expect(words.tone).toBe('fail');
    expect(words.headline).toBe('❌ 1 property law failed');
    expect(words.details).toEqual(['✓ 154 points passed']);
    expect(words.label).toBe('log-principal-sz on complex.js@2.3.0: 1 property law failed, 154 points passed');
    // No row of the failure table holds a law: the property checks below say which and where.
    expect(words.link).toBeNull();
  });

  it('names each path whose monodromy check failed', () => {
    const words = describeMatrixCell(allPointsPassed({ loopsFailed: ['around branch point 1'] }), RUN);
    expect(words.tone).toBe('fail');
    expect(words.headline).toBe('❌ 1 monodromy check failed');
    expect(words.details).toEqual(['✓ 154 points passed', 'monodromy around “around branch point 1” failed']);
    expect(words.label).toContain('the monodromy check around around branch point 1 failed');
  });

  it('adds failed laws beside failing points', () => {
    const words = describeMatrixCell(
      allPointsPassed({
        counts: { pass: 150, fail: 4, error: 0, skipped: 0, notApplicable: 0 },
        byClass: { branch: 4, accuracy: 0 },
        byDiagnosis: { 'zero-sign': 4 },
        lawsFailed: 2,
      }),
      RUN,
    );
    expect(words.headline).toBe('❌ 4 · 4 branch');
    expect(words.details).toContain('2 property laws failed');
    expect(words.link?.href).toBe(`/failures?run=${RUN}&suite=log-principal-sz&target=complex.js%402.3.0`);
  });
});
