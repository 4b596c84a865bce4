import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { monitorEventLoopDelay } from 'node:perf_hooks';
import { validateSuite } from '../../../shared/validate-suite';
import { FINDINGS_THREADS, FindingsPool } from '../../../server/findings/findings-pool';
import { HttpError } from '../../../server/http/http-error';
import { InputError } from '../../../server/http/input-error';

jest.setTimeout(60_000);

const DEMO_DIR = path.join(__dirname, '..', '..', '..', 'suites', 'demo');

describe('FindingsPool', () => {
  const thread = new FindingsPool();
  afterAll(() => thread.close());

  it('runs the library on its own thread, so the server’s thread is free meanwhile', async () => {
    // Opening mathjs is a synchronous require of ~1 s (library-findings.ts), then the fingerprint of √.
    const fresh = new FindingsPool();
    try {
      const lag = monitorEventLoopDelay({ resolution: 10 });
      lag.enable();
      const started = performance.now();
      const answer = await fresh.ask({ kind: 'fingerprint', target: 'mathjs@15.2.0/complex', functions: ['sqrt'] });
      const took = performance.now() - started;
      lag.disable();
      expect(answer).toBeDefined();
      expect(took).toBeGreaterThan(300);
      // Had it run here, the event loop would have stalled for about the whole computation.
      expect(lag.max / 1e6).toBeLessThan(took / 2);
    } finally {
      await fresh.close();
    }
  });

  it('brings back the answers a service decides: 404 for a target that is not installed, 400 naming the field', async () => {
    await expect(
      thread.ask({ kind: 'fingerprint', target: 'no-such-library@1.0.0', functions: ['sqrt'] }),
    ).rejects.toMatchObject({ status: 404, body: { kind: 'not-found' } });
    const refused = thread.ask({
      kind: 'cut-map',
      target: 'complex.js@2.4.3',
      fn: 'no-such-function',
      box: [-1, -1, 1, 1],
      grid: [3, 3],
    });
    await expect(refused).rejects.toBeInstanceOf(InputError);
  });

  it('stops a request that passes its time limit with 503, and answers the next on a fresh thread', async () => {
    const hasty = new FindingsPool(1);
    try {
      const late = hasty.ask({ kind: 'fingerprint', target: 'complex.js@2.4.3', functions: ['sqrt'] });
      await expect(late).rejects.toBeInstanceOf(HttpError);
      await expect(late).rejects.toMatchObject({ status: 503, body: { kind: 'unavailable' } });
    } finally {
      await hasty.close();
    }
    await thread.close();
    await expect(
      thread.ask({ kind: 'fingerprint', target: 'complex.js@2.4.3', functions: ['sqrt'] }),
    ).resolves.toBeDefined();
  });
});

describe('FindingsPool concurrency', () => {
  it('runs a cut map beside another instead of behind it', async () => {
    const pool = new FindingsPool(120_000, 2, 4);
    try {
      const ask = (fn: string) =>
        pool.ask({ kind: 'cut-map', target: 'complex.js@2.4.3', fn, box: [-2, -2, 2, 2], grid: [81, 81] });
      // Two requests at once start two threads; wait until both have loaded the harness.
      await Promise.all([ask('sqrt'), ask('log')]);
      for (let i = 0; i < 200 && pool.ready < 2; i += 1) await new Promise((r) => setTimeout(r, 50));
      const both = Promise.all([ask('asin'), ask('acos')]);
      // With one thread the second waited in line (a reviewer waited 13.3 s behind 12 cut maps).
      expect(pool.busy).toBe(2);
      await expect(both).resolves.toHaveLength(2);
    } finally {
      await pool.close();
    }
  });

  it('has at least two threads on any machine', () => {
    expect(FINDINGS_THREADS).toBeGreaterThanOrEqual(2);
  });
});

describe('FindingsPool lanes', () => {
  it('answers a fingerprint asked behind three version matrices on a thread no matrix holds', async () => {
    // The library screen asks for a matrix in groups of four suites; before the lanes, the first
    // two held both threads and a fingerprint asked after three waited for two to finish (13.9 s
    // behind the demo catalogue's eleven groups).
    const demo = readdirSync(DEMO_DIR)
      .filter((f) => f.endsWith('.json'))
      .sort();
    const suites = demo.map((f) => {
      const checked = validateSuite(JSON.parse(readFileSync(path.join(DEMO_DIR, f), 'utf8')), f);
      if (!checked.ok) throw new Error(`${f} is not a valid suite`);
      return checked.suite;
    });
    const pool = new FindingsPool(60_000, 2, 16);
    try {
      // Both threads started and warm (a thread loads tsx and the harness in 0.5–3 s), so what is timed is the wait.
      const warm = () => pool.ask({ kind: 'fingerprint', target: 'complex.js@2.4.3', functions: ['sqrt'] });
      await Promise.all([warm(), warm()]);
      for (let i = 0; i < 200 && pool.ready < 2; i += 1) await new Promise((r) => setTimeout(r, 50));
      const started = performance.now();
      let matricesDone = 0;
      const matrices = [0, 3, 6].map((i) =>
        pool
          .ask({ kind: 'version-matrix', library: 'complex.js', suites: suites.slice(i, i + 3) })
          .then(() => (matricesDone += 1)),
      );
      const fingerprint = pool
        .ask({ kind: 'fingerprint', target: 'complex.js@2.4.3', functions: ['sqrt', 'log'] })
        .then(() => ({ ms: Math.round(performance.now() - started), matricesDone }));
      const [answer] = await Promise.all([fingerprint, ...matrices]);
      const all = Math.round(performance.now() - started);
      if (process.env.SHEETKEEPER_BENCH) console.log(`fingerprint ${answer.ms} ms, all ${all} ms`, answer);
      // At most the one matrix that started beside it can finish first; in one queue two did.
      expect({ matricesDone: answer.matricesDone, fingerprintMs: answer.ms, allMs: all }).toEqual({
        matricesDone: answer.matricesDone <= 1 ? answer.matricesDone : '0 or 1',
        fingerprintMs: answer.ms,
        allMs: all,
      });
    } finally {
      await pool.close();
    }
  });
});
