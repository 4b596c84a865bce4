import { writeFileSync } from 'node:fs';

/** Writes a command's output to `out` when given (the file is replaced), else to stdout. */
export function writeOutput(text: string, out: string | undefined): void {
  const body = text.endsWith('\n') ? text : `${text}\n`;
  if (out) writeFileSync(out, body, 'utf8');
  else process.stdout.write(body);
}
