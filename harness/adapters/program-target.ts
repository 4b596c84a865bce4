import path from 'node:path';
import type { ProgramTargetSource } from '../../shared/target-source';
import type { Convention } from '../../shared/schemas/convention-schema';
import type { TargetEntry } from '../../shared/target-entry';
import { stdioTarget, type StdioTarget } from './stdio-target';

/** What a program's `describe` answered (or a placeholder before it has). */
export interface ProgramIdentity {
  name: string;
  library: string;
  version: string;
  entries?: TargetEntry[];
  /** The convention its `describe` declared, if any. */
  convention?: Convention;
}

/**
 * A `program` target source as a stdio target with the given identity, not started yet: the
 * command runs without a shell, in the source's `cwd` read from `baseDir`. The one place a program
 * source becomes a process, for describeProgram and for a worker thread that reopens it.
 */
export function programTarget(source: ProgramTargetSource, baseDir: string, identity: ProgramIdentity): StdioTarget {
  const [command, ...args] = source.command as [string, ...string[]];
  return stdioTarget({
    ...identity,
    settings: { protocol: 'stdio', command: source.command.join(' ') },
    command,
    args,
    cwd: source.cwd === undefined ? baseDir : path.resolve(baseDir, source.cwd),
    ...(source.timeLimitMs !== undefined ? { timeLimitMs: source.timeLimitMs } : {}),
  });
}
