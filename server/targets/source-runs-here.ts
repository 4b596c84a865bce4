import { existsSync } from 'node:fs';
import path from 'node:path';
import type { TargetSource } from '../../shared/target-source';

/**
 * Whether this machine can resolve an added source without asking anyone: an npm version always
 * (it is installed into this machine's cache on first use); a local folder or tarball when its
 * path exists here; a program when its command is found (a path, or a name on PATH) and its cwd
 * exists. Checks files only: starts and installs nothing.
 */
export function sourceRunsHere(source: TargetSource, baseDir: string): boolean {
  if (source.kind === 'npm') return true;
  if (source.kind === 'local') return existsSync(path.resolve(baseDir, source.path));
  const cwd = source.cwd === undefined ? baseDir : path.resolve(baseDir, source.cwd);
  if (!existsSync(cwd)) return false;
  const command = source.command[0]!;
  if (command.includes('/')) return existsSync(path.resolve(cwd, command));
  return (process.env.PATH ?? '')
    .split(path.delimiter)
    .some((dir) => dir !== '' && existsSync(path.join(dir, command)));
}
