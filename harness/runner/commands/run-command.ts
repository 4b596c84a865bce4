import { mkdirSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { BadInput } from '../../command-support/bad-input';
import { commandTargets, type CommandTargets } from '../../command-support/command-targets';
import { PACKAGE_ROOT } from '../../package-root';
import { buildPlan } from '../plan/build-plan';
import { formatJson } from '../formats/format-json';
import { formatJunit } from '../formats/format-junit';
import { formatSummary } from '../formats/format-summary';
import { formatTable } from '../formats/format-table';
import { loadSuites } from '../plan/load-suites';
import { resolveTargets } from '../plan/resolve-targets';
import { runPlan } from '../plan/run-plan';
import { describeCounts } from '../formats/describe-counts';
import { parseRunArgs } from './parse-run-args';
import { runExitCode } from './run-exit-code';

/** Below this many points, starting worker threads (~1 s each to load tsx and the engine) costs more than it saves. */
const WORKER_THRESHOLD = 50_000;

const USAGE = [
  'usage: sheetkeeper run --suite FILE|ID|FOLDER --target NAME@VERSION [--format table|json|junit|summary] [--out FILE] [--seed N] [--workers N|auto] [--slice-time-limit MS] [--cache DIR | --no-cache] [--max-findings N] [--progress]',
  '       [--config FILE] [--npm PACKAGE@VERSION] [--local PATH] [--program "COMMAND ARGS"] [--target-cache DIR]: targets beyond the installed ones (docs/target-sources.md); with exactly one of --npm/--local/--program and no --target, that one is the target',
  'exit: 0 pass; 1 branch findings, errors or failed checks; 2 bad input; 3 accuracy findings only',
].join('\n');

/**
 * `sheetkeeper run` (docs/suite-format.md): loads and validates the suites, resolves the targets
 * (installed, and configured by the project file or the source flags: docs/target-sources.md), runs
 * the plan and writes the result as a table, JSON or JUnit XML (to --out or stdout). Exit 0
 * when nothing failed, 3 when the only failures are accuracy findings, 1 for a branch finding, an
 * error, a failed monodromy or property check or a cancelled run (Ctrl-C) (runExitCode), 2 for
 * bad input: unknown flags, suites or targets, and invalid suite files (each issue printed as
 * `suite: field rule`).
 */
export async function runCommand(argv: string[]): Promise<number> {
  let known: CommandTargets;
  try {
    known = await commandTargets(argv, { targetFlag: '--target' });
  } catch (e) {
    if (!(e instanceof BadInput)) throw e;
    process.stderr.write(`sheetkeeper run: ${e.message}\n`);
    return 2;
  }
  const args = parseRunArgs(known.rest);
  if ('error' in args) {
    process.stderr.write(`sheetkeeper run: ${args.error}\n${USAGE}\n`);
    return 2;
  }
  const loaded = loadSuites(args.suites, path.join(PACKAGE_ROOT, 'suites'));
  if (!loaded.ok) {
    for (const i of loaded.issues) process.stderr.write(`sheetkeeper run: ${i.suite}: ${i.field} ${i.rule}\n`);
    return 2;
  }
  const targets = resolveTargets(args.targets, known.known);
  if (!targets.ok) {
    process.stderr.write(`sheetkeeper run: ${targets.message}\n`);
    return 2;
  }
  const plan = buildPlan(loaded.suites, targets.targets);
  const points = plan.slices.reduce((s, sh) => s + sh.points, 0);
  const workers =
    args.workers === 'auto' ? (points >= WORKER_THRESHOLD ? Math.min(4, os.availableParallelism()) : 0) : args.workers;
  const controller = new AbortController();
  const onSigint = () => controller.abort(new Error('interrupted (SIGINT)'));
  process.once('SIGINT', onSigint);
  const result = await runPlan(plan, {
    workers,
    signal: controller.signal,
    seed: args.seed,
    ...(args.cacheDir !== undefined ? { cacheDir: args.cacheDir === null ? null : path.resolve(args.cacheDir) } : {}),
    ...(args.sliceTimeLimitMs !== null ? { sliceTimeLimitMs: args.sliceTimeLimitMs } : {}),
    ...(args.maxFindings !== null ? { maxFindings: args.maxFindings } : {}),
    // Property checks run with each suite's pinned seeds; `--seed N` replaces them all, to explore.
    properties: true,
    onEvent: args.progress
      ? (e) => {
          if (e.type === 'progress') process.stderr.write(`sheetkeeper run: ${e.done}/${e.total} points\n`);
          else if (e.type === 'slice-end')
            process.stderr.write(
              `sheetkeeper run: slice ${e.slice} ${e.suite} × ${e.target}: ${e.status} (${e.durationMs} ms)\n`,
            );
          else if (e.type === 'cancelled') process.stderr.write(`sheetkeeper run: ${e.reason}\n`);
        }
      : undefined,
  });
  process.off('SIGINT', onSigint);
  const text =
    args.format === 'json'
      ? formatJson(result)
      : args.format === 'junit'
        ? formatJunit(result)
        : args.format === 'summary'
          ? formatSummary(result)
          : formatTable(result);
  if (args.out) {
    mkdirSync(path.dirname(path.resolve(args.out)), { recursive: true });
    writeFileSync(args.out, text);
    process.stderr.write(
      `sheetkeeper run: ${result.status}; ${describeCounts(result.counts, result.byClass, result.byDiagnosis, ', ')}; written to ${args.out}\n`,
    );
  } else {
    process.stdout.write(text);
  }
  return runExitCode(result);
}
