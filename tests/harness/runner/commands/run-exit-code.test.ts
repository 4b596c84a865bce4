import { runExitCode } from '../../../../harness/runner/commands/run-exit-code';
import type { PathResult, RunResult, SuiteTargetResult } from '../../../../shared/run-result';

type Pair = Pick<SuiteTargetResult, 'status' | 'properties'> & { paths: Pick<PathResult, 'monodromy'>[] };
const run = (status: RunResult['status'], byClass: RunResult['byClass'], pairs: Pair[]): RunResult =>
  ({ status, byClass, results: pairs }) as unknown as RunResult;
const failingPair = (extra: Partial<Pair> = {}): Pair => ({ status: 'fail', properties: [], paths: [], ...extra });

describe('runExitCode', () => {
  it('is 0 for a pass', () => {
    expect(runExitCode(run('pass', { branch: 0, accuracy: 0 }, []))).toBe(0);
  });

  it('is 3 when every failing point is an accuracy finding and nothing else failed', () => {
    expect(
      runExitCode(run('fail', { branch: 0, accuracy: 12 }, [failingPair(), { ...failingPair(), status: 'pass' }])),
    ).toBe(3);
  });

  it('is 1 for any branch finding, even among accuracy findings', () => {
    expect(runExitCode(run('fail', { branch: 1, accuracy: 12 }, [failingPair()]))).toBe(1);
  });

  it('is 1 when a monodromy or a property check fails beside accuracy findings', () => {
    const monodromy = failingPair({
      paths: [{ monodromy: { expected: { re: '1', im: '0' }, library: null, relativeError: null, pass: false } }],
    });
    const property = failingPair({ properties: [{ kind: 'failed' } as NonNullable<Pair['properties']>[number]] });
    expect(runExitCode(run('fail', { branch: 0, accuracy: 3 }, [monodromy]))).toBe(1);
    expect(runExitCode(run('fail', { branch: 0, accuracy: 3 }, [property]))).toBe(1);
  });

  it('is 1 for a run with errors or one cancelled, whatever the classes say', () => {
    expect(runExitCode(run('error', { branch: 0, accuracy: 3 }, [{ ...failingPair(), status: 'error' }]))).toBe(1);
    expect(runExitCode(run('cancelled', { branch: 0, accuracy: 0 }, []))).toBe(1);
  });
});
