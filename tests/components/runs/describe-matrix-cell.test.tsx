import { describeMatrixCell } from '../../../components/runs/describe-matrix-cell';
import type { RunMatrixCell } from '../../../shared/run-matrix-cell';

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
  worker: null,
  noWorkerHasTarget: false,
  ...over,
});

describe('describeMatrixCell and the workers', () => {
  it('says a pair waits for a worker that has its target when none is running, not merely that it is queued', () => {
    const words = describeMatrixCell(cell({ noWorkerHasTarget: true }));
    expect(words.headline).toBe('… waiting for a worker');
    expect(words.details).toEqual([
      'Waiting for a worker that has complex.js@2.5.0; none is running. These pairs start once such a worker starts (npm run worker on a machine that has it).',
    ]);
    expect(words.label).toMatch(
      /^sqrt-principal-sz on complex\.js@2\.5\.0: Waiting for a worker that has complex\.js@2\.5\.0; none is running/,
    );
    expect(words.tone).toBe('live');
  });

  it('calls a pair queued while a worker that has its target is running just queued', () => {
    const words = describeMatrixCell(cell({}));
    expect([words.headline, words.details, words.label]).toEqual([
      '… queued',
      [],
      'sqrt-principal-sz on complex.js@2.5.0: queued',
    ]);
  });

  it('names the worker running a pair, and the last one that took a pair queued again after its worker died', () => {
    expect(describeMatrixCell(cell({ status: 'running', worker: 'build-7:4121' })).details).toEqual([
      'on build-7:4121',
    ]);
    const again = describeMatrixCell(cell({ worker: 'build-7:4121' }));
    expect([again.headline, again.details]).toEqual(['… queued', ['last taken by build-7:4121']]);
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
    );
    expect(words.details).toEqual(['ran on ci-runner-2:88']);
    expect(words.label).toBe('sqrt-principal-sz on complex.js@2.5.0: 120 passed, none failed, ran on ci-runner-2:88');
  });
});
