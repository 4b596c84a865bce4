import { adapterCheckRequest } from '../../shared/schemas/adapter-check-request';
import type { StdioTarget } from '../adapters/stdio-target';
import { BadInput } from '../command-support/bad-input';
import { commandTargets } from '../command-support/command-targets';
import { findTarget } from '../command-support/find-target';
import { parseProgramFlag } from '../command-support/parse-program-flag';
import { readFlags } from '../command-support/read-flags';
import { writeOutput } from '../command-support/write-output';
import { adapterCheckTable } from './adapter-check-table';
import { runAdapterChecks } from './run-adapter-checks';

/**
 * `sheetkeeper adapter-check --program "COMMAND ARGS" | --target NAME [--config FILE] [--time-limit MS] [--format table|json] [--out FILE]`:
 * checks a stdio program against the protocol (docs/adapter-check.md). `--target` names an installed
 * stdio target or one the project file names (`--config`, docs/target-sources.md). Exits 0 when
 * every check passed (a check that could not be made is not a failure), 1 when any failed, 2 for
 * bad input, a JavaScript target included.
 */
export async function adapterCheckCommand(argv: readonly string[]): Promise<number> {
  // `--program` is checked as given. The shared target-source flags would start it to describe
  // itself first and refuse it if it could not, which is what this command is to report on.
  const byProgram = argv.some((a) => a === '--program' || a.startsWith('--program='));
  const { rest, known } = byProgram ? { rest: [...argv], known: undefined } : await commandTargets(argv);
  const request = readFlags(rest, ['program', 'target', 'time-limit', 'format', 'out'], adapterCheckRequest);
  const timeLimitMs = request['time-limit'];
  let source;
  if (request.program !== undefined) source = parseProgramFlag(request.program, timeLimitMs);
  else {
    const descriptor = findTarget(request.target!, known);
    // Opening a target starts and loads nothing; a stdio target names its program (the C target
    // builds it first: a compiler error ends the command with its message, exit 2).
    const target = descriptor.open() as Partial<StdioTarget>;
    let program;
    try {
      program = await target.program?.();
    } finally {
      await target.close?.();
    }
    if (!program) throw new BadInput(`adapter-check checks stdio programs; ${descriptor.name} runs in process`);
    source = timeLimitMs === undefined ? program : { ...program, timeLimitMs };
  }
  const report = await runAdapterChecks(source, process.cwd());
  writeOutput(request.format === 'json' ? JSON.stringify(report, null, 2) : adapterCheckTable(report), request.out);
  return report.failed > 0 ? 1 : 0;
}
