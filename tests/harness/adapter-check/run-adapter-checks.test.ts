import path from 'node:path';
import type { ProgramTargetSource } from '../../../shared/target-source';
import type { AdapterCheckReport } from '../../../harness/adapter-check/adapter-check-report';
import { ADAPTER_CHECKS } from '../../../harness/adapter-check/adapter-checks';
import { runAdapterChecks } from '../../../harness/adapter-check/run-adapter-checks';

const ROOT = path.join(__dirname, '..', '..', '..');
const PYTHON = '/usr/bin/python3';
const BROKEN = path.join(ROOT, 'tests', 'fixtures', 'adapter-check', 'broken_adapter.py');
const CMATH = path.join(ROOT, 'harness', 'adapters', 'python', 'cmath_adapter.py');

/**
 * The fixture with one fault switched on; a time limit of 1 s, so the hang costs about a second
 * while a single call (under 1 ms) keeps a wide margin on a loaded machine.
 */
const broken = (...faults: string[]): ProgramTargetSource => ({
  kind: 'program',
  command: [PYTHON, BROKEN, ...faults],
  timeLimitMs: 1000,
});

/** The checks that failed, in report order; each fault's test lists them all, so every other check passed. */
const failed = (report: AdapterCheckReport) => report.checks.filter((c) => c.status === 'fail').map((c) => c.name);
const check = (report: AdapterCheckReport, name: keyof typeof ADAPTER_CHECKS) =>
  report.checks.find((c) => c.name === name)!;

describe('runAdapterChecks', () => {
  it("passes every check on Python's cmath adapter, the −0 round trip through its echo", async () => {
    const report = await runAdapterChecks({ kind: 'program', command: [PYTHON, CMATH] }, ROOT);
    expect(report.checks.map((c) => `${c.name}: ${c.status}`)).toEqual(
      Object.keys(ADAPTER_CHECKS).map((name) => `${name}: pass`),
    );
    expect(report).toMatchObject({ library: 'cmath', failed: 0, notChecked: 0, timeLimitMs: 10_000 });
    expect(check(report, 'number-round-trip').found).toBe('13 pairs through echo, every bit kept');
  });

  it('names a dropped −0 in the round trip, value by value, with how to fix it', async () => {
    const report = await runAdapterChecks(broken('--drop-negative-zero'), ROOT);
    expect(failed(report)).toEqual(['number-round-trip']);
    const { found, advice } = check(report, 'number-round-trip');
    expect(found).toMatch(/^through echo, 4 of 13 pairs changed: /);
    expect(found).toContain('−0 in both parts: sent ["-0","-0"], expected ["-0","-0"], got ["0.0","0.0"]');
    expect(found).toContain('−0 in the imaginary part: sent ["0","-0"]');
    expect(advice).toBe(ADAPTER_CHECKS['number-round-trip'].advice);
  });

  it('names an answer carrying the wrong id as an answer out of order', async () => {
    const report = await runAdapterChecks(broken('--wrong-id'), ROOT);
    expect(failed(report)).toEqual(['ids-echoed']);
    expect(check(report, 'ids-echoed').found).toMatch(/^answered id 2 while 1 was pending \(describe\); /);
    expect(check(report, 'ids-echoed').advice).toMatch(/^answers must come in request order, one line per request/);
  });

  it('names swapped results by the slots that hold each other’s answers', async () => {
    const report = await runAdapterChecks(broken('--swap-results'), ROOT);
    // Every check that sends a batch of two or more sees the swap.
    expect(failed(report)).toEqual(['batch-order', 'batch-of-1000', 'error-in-its-slot', 'number-round-trip']);
    expect(check(report, 'batch-order').found).toBe(
      'in a batch of 8 sqrt calls, slot 0 holds the answer to item 1; slot 1 holds the answer to item 0',
    );
    expect(check(report, 'batch-of-1000').found).toMatch(
      /^2 of 1,000 slots differ .* \(seed 20261205\); first, slot 0/,
    );
  });

  it('names a request that hangs, kills the program and goes on with a fresh one', async () => {
    const began = performance.now();
    // A program that never answers an op it does not know, the way a read loop with no else branch does.
    const report = await runAdapterChecks(broken('--hang-on', 'sheetkeeper-no-such-op'), ROOT);
    expect(failed(report)).toEqual(['unknown-op', 'answers-in-time']);
    expect(check(report, 'answers-in-time').found).toBe(
      'no answer to id 3 (sheetkeeper-no-such-op, 0 items) within 1000 ms; adapter-check killed the program and a fresh one answered the next request (id 4, sqrt)',
    );
    expect(check(report, 'unknown-op').found).toBe(
      'sent the unknown op "sheetkeeper-no-such-op": no answer to id 3 (sheetkeeper-no-such-op) within 1000 ms',
    );
    // The checks after the hang ran on the fresh program; its refusal of an unknown entry is its own.
    expect(check(report, 'unknown-entry').status).toBe('pass');
    expect(check(report, 'number-round-trip').status).toBe('pass');
    // The time limit given, not the 10 s default (measured: 1.5–1.7 s in all).
    expect(performance.now() - began).toBeLessThan(10_000);
  });

  it('kills a program writing a line without end at 16 MB and goes on with a fresh one', async () => {
    const report = await runAdapterChecks(broken('--endless-line', 'echo'), ROOT);
    expect(failed(report)).toEqual(['number-round-trip']);
    expect(check(report, 'number-round-trip').found).toMatch(
      /^echo: the program wrote more than 16 MB without ending the line instead of answering id \d+ \(echo\)$/,
    );
    expect(check(report, 'batch-of-1000').status).toBe('pass');
  });

  it('checks the round trip through neg when the program has no echo, and leaves it unchecked without neg', async () => {
    const throughNeg = await runAdapterChecks(broken('--without', 'echo'), ROOT);
    expect(check(throughNeg, 'number-round-trip')).toEqual({
      name: 'number-round-trip',
      status: 'pass',
      found: '13 pairs through neg, every bit kept',
    });
    const dropped = await runAdapterChecks(broken('--without', 'echo', '--drop-negative-zero'), ROOT);
    // −(−0) is +0: a parser that reads "-0" as +0 answers −0, which the sign of each part shows.
    expect(check(dropped, 'number-round-trip').found).toContain(
      '−0 in both parts: sent ["-0","-0"], expected ["0","0"], got ["-0.0","-0.0"]',
    );
    const neither = await runAdapterChecks(broken('--without', 'echo', '--without', 'neg'), ROOT);
    expect(check(neither, 'number-round-trip')).toEqual({
      name: 'number-round-trip',
      status: 'not-checked',
      found: `the program has no echo (it answered "unsupported op 'echo'") and describe lists no neg`,
    });
    expect(neither).toMatchObject({ failed: 0, notChecked: 1 });
  });

  it('names every problem of a describe answer at once', async () => {
    const report = await runAdapterChecks(broken('--bad-describe'), ROOT);
    expect(failed(report)).toEqual(['describe']);
    // echo is a protocol op: listing it is no fault.
    expect(check(report, 'describe').found).toBe(
      'describe answered no "library" string; ops outside the catalogue: frobnicate; 2 entries marked default (one must be)',
    );
    expect(report.library).toBeNull();
  });

  it('names a line written beside an answer', async () => {
    const report = await runAdapterChecks(broken('--extra-line'), ROOT);
    expect(check(report, 'one-line-per-request').found).toBe(
      'wrote 2 lines in answer to id 1 (describe); the extra one: "log: answered"',
    );
  });

  it('names a program that keeps running after its stdin closes', async () => {
    const report = await runAdapterChecks(broken('--linger'), ROOT);
    expect(failed(report)).toEqual(['exits-on-stdin-close']);
    expect(check(report, 'exits-on-stdin-close').found).toBe(
      'the program was still running 1 s after its stdin closed',
    );
  });

  it('reports a program that cannot start and checks nothing else', async () => {
    const report = await runAdapterChecks({ kind: 'program', command: ['/nonexistent/adapter'] }, ROOT);
    expect(failed(report)).toEqual(['starts']);
    expect(check(report, 'starts').found).toMatch(/could not run: spawn \/nonexistent\/adapter ENOENT/);
    expect(report.notChecked).toBe(Object.keys(ADAPTER_CHECKS).length - 1);
  });
});
