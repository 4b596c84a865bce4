import { parentPort, workerData } from 'node:worker_threads';
import type { Target } from '../../adapters/target';
import { discoverTargets } from '../../adapters/discover-targets';
import { parseSubject } from '../../expressions/parse-subject';
import { evaluateSuite } from '../evaluation/evaluate-suite';
import { ReferenceCache } from '../reference-cache/reference-cache';
import type { WorkerReply, WorkerRequest } from './slice-worker-messages';
import type { TargetDescriptor } from '../../adapters/target-descriptor';

/**
 * The body of a slice worker thread (run-plan.ts): takes one slice at a time, opens its
 * target once per worker (a discovered target by name, or a module's `openTarget(...args)`),
 * evaluates the slice's paths with its own read-only view of the reference cache, and sends
 * the result with the values it computed, which the main thread writes to the cache. On
 * `abort` it stops the slice and closes its targets (so a hung stdio program is killed).
 */
const port = parentPort;
if (!port) throw new Error('slice-worker.ts runs in a worker thread');
const cache = new ReferenceCache((workerData as { cacheDir: string | null }).cacheDir);
const targets = new Map<string, Target>();
let current: AbortController | null = null;

function openTarget(name: string, spec: NonNullable<TargetDescriptor['worker']>): Target {
  const known = targets.get(name);
  if (known) return known;
  let target: Target;
  if ('discovered' in spec) {
    const found = discoverTargets().find((d) => d.name === spec.discovered);
    if (!found) throw new Error(`no installed target named ${spec.discovered}`);
    target = found.open();
  } else {
    // eslint-disable-next-line @typescript-eslint/no-require-imports
    const mod = require(spec.module) as { openTarget?: (...args: unknown[]) => Target };
    if (typeof mod.openTarget !== 'function') throw new Error(`${spec.module} has no openTarget export`);
    target = mod.openTarget(...(spec.args ?? []));
  }
  targets.set(name, target);
  return target;
}

async function closeAll(): Promise<void> {
  const all = [...targets.values()];
  targets.clear();
  await Promise.all(all.map((t) => t.close().catch(() => undefined)));
}

port.on('message', (m: WorkerRequest) => {
  if (m.type === 'abort') {
    current?.abort(new Error('aborted by the runner'));
    void closeAll().then(() => port.postMessage({ type: 'aborted' } satisfies WorkerReply));
    return;
  }
  if (m.type === 'close') {
    void closeAll().then(() => process.exit(0));
    return;
  }
  const controller = new AbortController();
  current = controller;
  void (async () => {
    try {
      const target = openTarget(m.target.name, m.target.spec);
      const result = await evaluateSuite(m.suite, target, {
        cache,
        signal: controller.signal,
        paths: m.paths,
        maxFindings: m.maxFindings,
      });
      if (controller.signal.aborted) return;
      const records = cache.takePending();
      port.postMessage(
        { type: 'result', slice: m.slice, result, records } satisfies WorkerReply,
        records.map((r) => r.records.buffer as ArrayBuffer),
      );
    } catch (e) {
      if (!controller.signal.aborted)
        port.postMessage({
          type: 'failed',
          slice: m.slice,
          error: e instanceof Error ? e.message : String(e),
        } satisfies WorkerReply);
    } finally {
      if (current === controller) current = null;
    }
  })();
});

// Load the subject parser (mathjs, ~1 s) before saying ready, so a slice's time limit measures its work, not start-up.
parseSubject('z');
port.postMessage({ type: 'ready' } satisfies WorkerReply);
