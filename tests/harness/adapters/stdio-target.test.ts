import childProcess, { type ChildProcess } from 'node:child_process';
import path from 'node:path';
import { stdioTarget, type StdioTarget } from '../../../harness/adapters/stdio-target';
import type { ComplexPair } from '../../../harness/adapters/complex-pair';

const FIXTURE = path.join(__dirname, 'fixtures', 'misbehaving-adapter.ts');

/** One node process running the TypeScript fixture (docs/conventions.md: killing `npx tsx` would leave its child). */
function misbehaving(timeLimitMs = 5000): StdioTarget {
  return stdioTarget({
    name: 'misbehaving@0.0.1',
    library: 'misbehaving',
    version: '0.0.1',
    settings: {},
    command: process.execPath,
    args: ['--import', 'tsx', FIXTURE],
    timeLimitMs,
  });
}

const alive = (pid: number): boolean => {
  try {
    process.kill(pid, 0);
    return true;
  } catch {
    return false;
  }
};

describe('stdioTarget', () => {
  let target: StdioTarget;
  afterEach(async () => {
    await target.close();
  });

  it('names the program behind it as a program target source, starting nothing', async () => {
    target = misbehaving(700);
    expect(await target.program()).toEqual({
      kind: 'program',
      command: [process.execPath, '--import', 'tsx', FIXTURE],
      timeLimitMs: 700,
    });
    expect(target.processId()).toBeNull();
  });

  it('starts no program before it is first used', async () => {
    target = misbehaving();
    expect(target.processId()).toBeNull();
    expect(await target.supports('sqrt')).toBe(true);
    expect(target.processId()).not.toBeNull();
  });

  it('sends numbers as strings so −0, ±inf and NaN survive the round trip, in batch order', async () => {
    target = misbehaving();
    const points: ComplexPair[] = [
      [-0, 0],
      [0, -0],
      [Infinity, -Infinity],
      [NaN, 5e-324],
      [0.1, -1.7976931348623157e308],
      ...Array.from({ length: 200 }, (_, k): ComplexPair => [k, -k / 7]),
    ];
    const results = await target.evaluate(
      'sqrt',
      points.map((p) => [p]),
    );
    expect(results).toEqual(points.map((p) => ({ value: p })));
    // toEqual treats −0 and +0 as different (Object.is), so the signs were checked; say so for the first two.
    expect(Object.is((results[0] as { value: ComplexPair }).value[0], -0)).toBe(true);
    expect(Object.is((results[1] as { value: ComplexPair }).value[1], -0)).toBe(true);
  });

  it('answers batches asked for at once one after another, each with its own results', async () => {
    target = misbehaving();
    const batches = Array.from({ length: 5 }, (_, b) => Array.from({ length: 20 }, (__, k): ComplexPair[] => [[b, k]]));
    const answers = await Promise.all(batches.map((batch) => target.evaluate('sqrt', batch)));
    expect(answers).toEqual(batches.map((batch) => batch.map(([p]) => ({ value: p }))));
  });

  it('turns a crash into error results quoting stderr, and starts a fresh program for the next batch', async () => {
    target = misbehaving();
    const crashed = await target.evaluate('exp', [[[1, 0]], [[2, 0]]]);
    expect(crashed).toHaveLength(2);
    for (const r of crashed)
      expect(r).toEqual({ error: expect.stringMatching(/exited with code 3.*crashing on purpose/) });
    expect(await target.evaluate('sqrt', [[[4, 0]]])).toEqual([{ value: [4, 0] }]);
  });

  it('turns a hang into error results after the time limit and kills the program', async () => {
    // The program itself, to see how it ends: killed by the target, not exited on its own.
    const spawned = jest.spyOn(childProcess, 'spawn');
    target = misbehaving(400);
    await target.supports('log');
    const proc = spawned.mock.results[0]?.value as ChildProcess;
    spawned.mockRestore();
    const ended = new Promise<NodeJS.Signals | null>((resolve) =>
      proc.once('exit', (_code, signal) => resolve(signal)),
    );
    const hung = await target.evaluate('log', [[[1, 0]]]);
    // Only the time limit's timer writes this message, so the batch ended on the timeout path.
    expect(hung).toEqual([{ error: 'no answer within 400 ms' }]);
    expect(await ended).toBe('SIGKILL');
    expect(alive(proc.pid as number)).toBe(false);
    expect(await target.evaluate('sqrt', [[[9, 0]]])).toEqual([{ value: [9, 0] }]);
    expect(target.processId()).not.toBe(proc.pid);
  }, 20_000);

  it('stops a program that writes more than 16 MB without ending the line, long before the time limit', async () => {
    target = misbehaving(60_000);
    const started = Date.now();
    expect(await target.evaluate('acosh', [[[2, 0]]])).toEqual([
      { error: 'program wrote more than 16 MB without ending the line' },
    ]);
    expect(Date.now() - started).toBeLessThan(30_000);
    expect(await target.evaluate('sqrt', [[[9, 0]]])).toEqual([{ value: [9, 0] }]);
  }, 40_000);

  it('turns a line that is not JSON, a wrong id and a short result list into error results', async () => {
    target = misbehaving();
    expect(await target.evaluate('asin', [[[0, 0]]])).toEqual([
      { error: 'program wrote a line that is not JSON: this is not JSON' },
    ]);
    expect(await target.evaluate('acos', [[[0, 0]]])).toEqual([
      { error: expect.stringMatching(/^program answered id \d+ while \d+ was pending$/) },
    ]);
    expect(await target.evaluate('atan', [[[0, 0]], [[1, 0]]])).toEqual([
      { error: 'program answered 1 results for 2 calls' },
      { error: 'program answered 1 results for 2 calls' },
    ]);
    expect(await target.evaluate('sqrt', [[[1, 0]]])).toEqual([{ value: [1, 0] }]);
  }, 20_000);

  it('answers an op the program does not list as unsupported without sending it', async () => {
    target = misbehaving();
    expect(await target.supports('pow')).toBe(false);
    expect(
      await target.evaluate('pow', [
        [
          [1, 0],
          [2, 0],
        ],
      ]),
    ).toEqual([{ error: 'misbehaving has no pow' }]);
  });

  it('gives a call with the wrong number of arguments its own error and sends the rest', async () => {
    target = misbehaving();
    expect(
      await target.evaluate('sqrt', [
        [
          [1, 0],
          [2, 0],
        ],
        [[3, 0]],
      ]),
    ).toEqual([{ error: 'sqrt takes 1 argument(s), got 2' }, { value: [3, 0] }]);
  });

  it('reports a program that cannot start as error results', async () => {
    target = stdioTarget({
      name: 'none',
      library: 'none',
      version: '0',
      settings: {},
      command: '/nonexistent/program',
      args: [],
    });
    expect(await target.evaluate('sqrt', [[[1, 0]]])).toEqual([
      { error: expect.stringMatching(/could not run.*ENOENT/) },
    ]);
  });

  it('answers a batch still waiting at close with an error at once, so no time limit outlives the target', async () => {
    // The limit is a minute: before, close() left the pending batch to its timer, which kept
    // `sheetkeeper run` alive for the rest of the limit after its report was written.
    target = misbehaving(60_000);
    await target.supports('log');
    const hung = target.evaluate('log', [[[1, 0]]]);
    await new Promise((resolve) => setTimeout(resolve, 100));
    const started = Date.now();
    await target.close();
    expect(await hung).toEqual([{ error: 'the target was closed before the program answered' }]);
    expect(Date.now() - started).toBeLessThan(5000);
    expect(await target.evaluate('sqrt', [[[9, 0]]])).toEqual([{ value: [9, 0] }]);
  }, 20_000);

  it('ends the program on close', async () => {
    target = misbehaving();
    await target.supports('sqrt');
    const pid = target.processId() as number;
    expect(alive(pid)).toBe(true);
    await target.close();
    expect(alive(pid)).toBe(false);
    expect(target.processId()).toBeNull();
  });
});
