import { parentPort, workerData } from 'node:worker_threads';
import type { Target } from '../../adapters/target';
import { installedTargets } from '../../adapters/installed-targets';
import type { TargetDescriptor } from '../../adapters/target-descriptor';
import { mathParse } from '../../expressions/math-parse';
import { evaluatePair } from '../evaluation/evaluate-pair';
import { ReferenceCache } from '../reference-cache/reference-cache';
import type { WorkerReply, WorkerRequest } from './slice-worker-messages';

/**
 * The body of a slice worker thread (worker-lane.ts): takes one slice at a time and evaluates
 * it with evaluatePair — values, property checks when asked, the time limit — with its own
 * read-only view of the reference cache, keeping each target open for later slices (a
 * discovered target by name, or a module's `openTarget(...args)`). It sends the result with
 * the values it computed, which the main thread writes to the cache. On `abort` the slice is
 * cancelled (evaluatePair closes its target, so a hung stdio program is killed).
 */
const port = parentPort;
if (!port) throw new Error('slice-worker.ts runs in a worker thread');
const cache = new ReferenceCache((workerData as { cacheDir: string | null }).cacheDir);
const targets = new Map<string, Target>();
let current: AbortController | null = null;

function openTarget(spec: NonNullable<TargetDescriptor['worker']>): Target {
  if ('discovered' in spec) {
    const found = installedTargets().find((d) => d.name === spec.discovered);
    if (!found) throw new Error(`no installed target named ${spec.discovered}`);
    return found.open();
  }
  // eslint-disable-next-line @typescript-eslint/no-require-imports -- a module named at run time by the slice's target
  const mod = require(spec.module) as { openTarget?: (...args: unknown[]) => Target };
  if (typeof mod.openTarget !== 'function') throw new Error(`${spec.module} has no openTarget export`);
  return mod.openTarget(...(spec.args ?? []));
}

async function closeAll(): Promise<void> {
  const all = [...targets.values()];
  targets.clear();
  await Promise.all(all.map((t) => t.close().catch(() => undefined)));
}

port.on('message', (m: WorkerRequest) => {
  if (m.type === 'abort') {
    current?.abort(new Error(m.reason));
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
      const { spec, ...info } = m.target;
      const { result, target } = await evaluatePair(
        m.suite,
        { ...info, open: () => targets.get(info.name) ?? openTarget(spec) },
        { ...m.evaluation, cache, signal: controller.signal, paths: m.paths, pathPoints: m.pathPoints },
      );
      if (target) targets.set(info.name, target);
      else targets.delete(info.name);
      const records = cache.takePending();
      port.postMessage(
        { type: 'result', slice: m.slice, result, records } satisfies WorkerReply,
        records.map((r) => r.records.buffer as ArrayBuffer),
      );
    } catch (e) {
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
mathParse('z');
port.postMessage({ type: 'ready' } satisfies WorkerReply);
