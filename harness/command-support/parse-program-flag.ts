import { programTargetSource, type ProgramTargetSource } from '../../shared/target-source';
import { BadInput } from './bad-input';
import { issueField } from './issue-field';
import { splitCommandLine } from './split-command-line';

/**
 * `--program "COMMAND ARGS"` as a `program` target source (shared/target-source.ts), with the time
 * limit given: the command line split as every command splits it (split-command-line.ts), the
 * source validated with the one schema. Unlike the shared target-source flags, the program is not
 * started to describe itself first: adapter-check reports a program that cannot do that.
 */
export function parseProgramFlag(text: string, timeLimitMs?: number): ProgramTargetSource {
  const command = splitCommandLine(text);
  const parsed = programTargetSource.safeParse({
    kind: 'program',
    command,
    ...(timeLimitMs === undefined ? {} : { timeLimitMs }),
  });
  if (!parsed.success) {
    const issue = parsed.error.issues[0]!;
    if (issue.path[0] === 'timeLimitMs') throw new BadInput(`--time-limit: ${issue.message}`);
    throw new BadInput(`--program ${text}: ${issueField(issue.path) || '?'}: ${issue.message}`);
  }
  return parsed.data;
}
