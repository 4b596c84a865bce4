import { readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import { sheetkeeperConfig } from '../../shared/sheetkeeper-config';
import { BadInput } from './bad-input';
import type { ConfiguredSource } from './configured-source';
import { issueField } from './issue-field';

/** A project file naming 64 targets is a few kilobytes; past this it is not one, and is not read into memory. */
const CONFIG_MAX_BYTES = 1_048_576;

/**
 * Reads a project's `sheetkeeper.config.json` (shared/sheetkeeper-config.ts): its target sources,
 * each with where it was named (`file targets[i]`) and the file's folder as the base of relative
 * paths, and its `cacheDir` resolved from that folder. Anything wrong is BadInput naming the file,
 * the field and the rule (`sheetkeeper.config.json: targets[1].version: must be an exact version…`);
 * the file is named relative to `cwd` when it lies under it.
 */
export function readConfigFile(
  file: string,
  cwd: string = process.cwd(),
): { sources: ConfiguredSource[]; cacheDir?: string } {
  // Shown as given from the working folder when it is under it, else in full.
  const relative = path.relative(cwd, file);
  const shown = relative === '' || relative.startsWith('..') ? file : relative;
  let size: number;
  try {
    size = statSync(file).size;
  } catch {
    throw new BadInput(`--config: ${shown} does not exist`);
  }
  if (size > CONFIG_MAX_BYTES)
    throw new BadInput(`${shown}: is ${size} bytes; a project file may be at most ${CONFIG_MAX_BYTES} bytes`);
  let data: unknown;
  try {
    data = JSON.parse(readFileSync(file, 'utf8'));
  } catch (e) {
    throw new BadInput(`${shown}: not JSON: ${e instanceof Error ? e.message : String(e)}`);
  }
  const parsed = sheetkeeperConfig.safeParse(data);
  if (!parsed.success)
    throw new BadInput(
      parsed.error.issues
        .slice(0, 10)
        .map((i) => `${shown}: ${issueField(i.path) || '(file)'}: ${i.message}`)
        .join('\n'),
    );
  const baseDir = path.dirname(path.resolve(file));
  return {
    sources: parsed.data.targets.map((source, i) => ({
      source,
      from: `${shown} targets[${i}]`,
      baseDir,
      byFlag: false,
    })),
    ...(parsed.data.cacheDir !== undefined ? { cacheDir: path.resolve(baseDir, parsed.data.cacheDir) } : {}),
  };
}
