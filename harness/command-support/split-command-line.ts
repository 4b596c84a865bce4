import { BadInput } from './bad-input';

/**
 * Splits `--program "COMMAND ARGS"` into the program and its arguments, the way a POSIX shell
 * splits words and nothing more: blanks separate words; '…' keeps everything inside as it is;
 * "…" too, except that \" and \\ stand for " and \; outside quotes a backslash keeps the next
 * character. No variables, globs, pipes or redirections: no shell runs the program, so `$HOME`,
 * `*` and `|` reach it as written. (shell-quote, which is in node_modules, was not used: its type
 * declarations change Array.prototype.join's type for the whole project.) Throws BadInput for an
 * unclosed quote or an empty command line.
 */
export function splitCommandLine(line: string): string[] {
  const words: string[] = [];
  let word: string | null = null;
  for (let i = 0; i < line.length; i++) {
    const c = line[i]!;
    if (c === ' ' || c === '\t' || c === '\n') {
      if (word !== null) words.push(word);
      word = null;
    } else if (c === "'") {
      const end = line.indexOf("'", i + 1);
      if (end < 0) throw new BadInput(`--program: unclosed ' in "${line}"`);
      word = (word ?? '') + line.slice(i + 1, end);
      i = end;
    } else if (c === '"') {
      word ??= '';
      for (i += 1; ; i++) {
        if (i >= line.length) throw new BadInput(`--program: unclosed " in "${line}"`);
        const d = line[i]!;
        if (d === '"') break;
        if (d === '\\' && (line[i + 1] === '"' || line[i + 1] === '\\')) word += line[++i];
        else word += d;
      }
    } else if (c === '\\' && i + 1 < line.length) {
      word = (word ?? '') + line[++i];
    } else {
      word = (word ?? '') + c;
    }
  }
  if (word !== null) words.push(word);
  if (words.length === 0) throw new BadInput('--program: needs a command (the program and its arguments)');
  return words;
}
