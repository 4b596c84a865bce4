import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { User } from '../../server/entities/user';
import { PlanService } from '../../server/plans/plan-service';
import { RunService } from '../../server/runs/run-service';
import { SqlShardQueue } from '../../server/runs/sql-shard-queue';
import type { RunMatrixCell } from '../../shared/run-matrix-cell';
import type { WorkerView } from '../../shared/worker-view';
import { approvedSuite } from '../setup/approved-suite';
import { signInAs } from '../setup/sign-in-as';
import { startTestApp, type TestApp } from '../setup/test-app';
import { until } from '../setup/until';

const ROOT = path.join(__dirname, '..', '..');
const SUITES = ['machines-sqrt', 'machines-log'];
// A's and B's targets are disjoint; nobody has LATE until the third worker starts.
const A = 'complex.js@2.4.3';
const B = 'mathjs@15.2.0/complex';
const LATE = 'complex.js@2.3.0';

/**
 * The whole test, processes started and stopped included, measured on the shared 2-core machine:
 * 5.5–8.8 s (9.9–15.2 s wall for the file, ~9 s of CPU, three worker processes of ~1.2 s each to
 * start) at load average 7, 23.5 s at 12; the limit leaves room for a loaded machine and still
 * stops a hang.
 */
const TEST_LIMIT_MS = 60_000;

describe('workers on separate machines, each with its own targets and caches', () => {
  let t: TestApp;
  let scratch: string;
  const processes: ChildProcess[] = [];
  /** What each worker wrote to stderr (the last 4 KB), printed if the test fails. */
  const stderr = new Map<string, string>();

  /** `npm run worker` as its own process, with its own target narrowing and cache folders, as on another machine. */
  const startWorker = (name: string, targets: string) => {
    const child = spawn(process.execPath, ['--import', 'tsx', 'server/worker-main.ts'], {
      cwd: ROOT,
      env: {
        ...process.env,
        DATABASE_URL: t.db.url,
        SESSION_SECRET: 'test-secret',
        SHEETKEEPER_FAKE_SMTP: '0',
        SHEETKEEPER_WORKERS: '1',
        SHEETKEEPER_WORKER_TARGETS: targets,
        SHEETKEEPER_REFERENCE_CACHE: path.join(scratch, name, 'reference'),
        SHEETKEEPER_CACHE_DIR: path.join(scratch, name, 'cache'),
      },
      stdio: ['ignore', 'ignore', 'pipe'],
    });
    child.stderr?.on('data', (chunk: Buffer) => stderr.set(name, `${stderr.get(name) ?? ''}${chunk}`.slice(-4096)));
    processes.push(child);
    return child;
  };
  /** Runs `body`; if it fails, the error carries what the workers wrote to stderr. */
  const withWorkerLogs = async (body: () => Promise<void>) => {
    try {
      await body();
    } catch (err) {
      const logs = [...stderr].map(([name, text]) => `worker ${name} wrote:\n${text}`).join('\n');
      if (err instanceof Error && logs) err.message += `\n${logs}`;
      throw err;
    }
  };
  /** The label a process announced ("host:pid"), once it has. */
  const announced = (child: ChildProcess) =>
    until(
      `worker ${child.pid} to announce itself`,
      async () => {
        const [row] = await t.db.dataSource.query(`SELECT label, targets FROM workers WHERE label LIKE $1`, [
          `%:${child.pid}`,
        ]);
        return (row as { label: string; targets: string[] } | undefined) ?? null;
      },
      30_000,
    );

  beforeAll(async () => {
    t = await startTestApp();
    scratch = mkdtempSync(path.join(tmpdir(), 'sheetkeeper-machines-'));
    await approvedSuite(t.db.dataSource, SUITES[0]!, 'sqrt-principal-sz');
    await approvedSuite(t.db.dataSource, SUITES[1]!, 'log-principal-sz');
  }, 60_000);

  afterAll(async () => {
    for (const child of processes) if (child.exitCode === null) child.kill('SIGKILL');
    await t.stop();
    rmSync(scratch, { recursive: true, force: true });
  });

  it(
    'runs every shard on the worker that has its target, and leaves a shard nobody can run waiting, visibly, until a worker that has it starts',
    () =>
      withWorkerLogs(async () => {
        const first = startWorker('a', A);
        const second = startWorker('b', B);
        const [a, b] = await Promise.all([announced(first), announced(second)]);
        expect(a.targets).toEqual([A]);
        expect(b.targets).toEqual([B, `${B}/predictable`]);

        const kwame = await t.db.dataSource.getRepository(User).findOneByOrFail({ email: 'kwame@sheetkeeper.test' });
        const plan = await new PlanService(t.db.dataSource).save(
          kwame,
          { name: 'two machines', description: '', recipients: [], suites: SUITES, targets: [A, B, LATE] },
          null,
        );
        const sender = new SqlShardQueue(t.db.url);
        const runs = new RunService(t.db.dataSource, sender);
        const reader = await signInAs(t.app, 'reviewer');
        const matrix = async (id: string): Promise<RunMatrixCell[]> =>
          (await reader.get(`/api/runs/${id}/matrix`)).body.cells;
        try {
          const { run } = await runs.start(plan.id, 'manual', kwame);
          // A's and B's pairs finish; LATE's stay queued, and the run page says why.
          const partway = await until(
            "A's and B's pairs to finish",
            async () => {
              const cells = await matrix(run.id);
              return cells.filter((c) => c.status === 'done').length === 4 ? cells : null;
            },
            30_000,
          );
          const waiting = partway.filter((c) => c.target === LATE);
          expect(waiting.map((c) => [c.status, c.noWorkerHasTarget, c.worker])).toEqual([
            ['queued', true, null],
            ['queued', true, null],
          ]);
          expect((await runs.get(run.id)).waitingFor).toEqual([LATE]);
          const live: WorkerView[] = (await reader.get('/api/workers')).body.workers;
          expect(live.map((w) => w.label).sort()).toEqual([a.label, b.label].sort());

          const third = startWorker('c', LATE);
          const c = await announced(third);
          const done = await until(
            'the run to complete',
            async () => {
              const view = await runs.get(run.id);
              return view.status === 'completed' ? view : null;
            },
            30_000,
          );
          expect(done.waitingFor).toEqual([]);
          const cells = await matrix(run.id);
          const ranOn: Record<string, string> = { [A]: a.label, [B]: b.label, [LATE]: c.label };
          expect(cells.map((cell) => [cell.suite, cell.target, cell.worker, cell.status])).toEqual(
            [...SUITES]
              .sort()
              .flatMap((suite) => [A, LATE, B].sort().map((target) => [suite, target, ranOn[target], 'done'])),
          );
          expect(cells.flatMap((cell) => cell.errors)).toEqual([]);
          expect(cells.filter((cell) => cell.outcome === 'error')).toEqual([]);

          // Each machine filled its own reference cache; none took another's folder.
          for (const name of ['a', 'b', 'c'])
            expect({ name, files: readdirSync(path.join(scratch, name, 'reference')).length > 0 }).toEqual({
              name,
              files: true,
            });

          // A stopped worker says so at once: its target is then waited for again.
          first.kill('SIGTERM');
          await until(
            'worker A to record its stop',
            async () =>
              (await t.db.dataSource.query(`SELECT stopped_at FROM workers WHERE label = $1`, [a.label]))[0]
                ?.stopped_at ?? null,
            15_000,
          );
          const after: WorkerView[] = (await reader.get('/api/workers')).body.workers;
          expect(after.map((w) => w.label).sort()).toEqual([b.label, c.label].sort());
        } finally {
          await sender.stop();
        }
      }),
    TEST_LIMIT_MS,
  );
});
