import { programTargetSource, type ProgramTargetSource } from '../../shared/target-source';
import { BadInput } from './bad-input';

/**
 * `--program "COMMAND ARGS"` as a `program` target source (shared/target-source.ts). The command is
 * split into words as a POSIX shell would split it, without running one: whitespace separates words,
 * single quotes keep everything literally, double quotes and a backslash keep spaces and quotes
 * ("python3 'my adapter.py'"). Nothing is expanded ($, *, ~ stay as written). Relative paths are read
 * from the working directory when the program starts. Kept to this one function so the shared
 * `--program` reader of the other commands can replace it.
 */
export function parseProgramFlag(text: string, timeLimitMs?: number): ProgramTargetSource {
  const words: string[] = [];
  let word: string | null = null;
  let quote: "'" | '"' | null = null;
  for (let i = 0; i < text.length; i += 1) {
    const c = text[i]!;
    if (quote === "'") {
      if (c === "'") quote = null;
      else word += c;
    } else if (c === '\\' && i + 1 < text.length && (quote === null || '"\\$`'.includes(text[i + 1]!))) {
      word = (word ?? '') + text[i + 1];
      i += 1;
    } else if (quote === '"') {
      if (c === '"') quote = null;
      else word += c;
    } else if (c === "'" || c === '"') {
      quote = c;
      word ??= '';
    } else if (/\s/.test(c)) {
      if (word !== null) words.push(word);
      word = null;
    } else word = (word ?? '') + c;
  }
  if (quote !== null) throw new BadInput(`--program: a ${quote} quote is not closed`);
  if (word !== null) words.push(word);
  const parsed = programTargetSource.safeParse({
    kind: 'program',
    command: words,
    ...(timeLimitMs === undefined ? {} : { timeLimitMs }),
  });
  if (!parsed.success) {
    const issue = parsed.error.issues[0]!;
    if (issue.path[0] === 'timeLimitMs') throw new BadInput(`--time-limit: ${issue.message}`);
    const word = issue.path[1];
    if (typeof word === 'number')
      throw new BadInput(`--program: word ${word + 1} ${words[word] === '' ? 'is empty' : issue.message}`);
    throw new BadInput(`--program: ${words.length === 0 ? 'names no command' : issue.message}`);
  }
  return parsed.data;
}
