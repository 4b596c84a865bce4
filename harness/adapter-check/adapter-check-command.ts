import { adapterCheckRequest } from '../../shared/schemas/adapter-check-request';
import type { StdioTarget } from '../adapters/stdio-target';
import { BadInput } from '../command-support/bad-input';
import { findTarget } from '../command-support/find-target';
import { parseProgramFlag } from '../command-support/parse-program-flag';
import { readFlags } from '../command-support/read-flags';
import { writeOutput } from '../command-support/write-output';
import { adapterCheckTable } from './adapter-check-table';
import { runAdapterChecks } from './run-adapter-checks';

/**
 * `sheetkeeper adapter-check --program "COMMAND ARGS" | --target NAME [--time-limit MS] [--format table|json] [--out FILE]`:
 * checks a stdio program against the protocol (docs/adapter-check.md). Exits 0 when every check
 * passed (a check that could not be made is not a failure), 1 when any failed, 2 for bad input,
 * a JavaScript target included.
 */
export async function adapterCheckCommand(argv: readonly string[]): Promise<number> {
  const request = readFlags(argv, ['program', 'target', 'time-limit', 'format', 'out'], adapterCheckRequest);
  const timeLimitMs = request['time-limit'];
  let source;
  if (request.program !== undefined) source = parseProgramFlag(request.program, timeLimitMs);
  else {
    const descriptor = findTarget(request.target!);
    // Opening a target starts and loads nothing (discover-targets.ts); a stdio target names its program
    // (the C target builds it first: a compiler error ends the command with its message, exit 2).
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
