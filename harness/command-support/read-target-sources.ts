import { existsSync } from 'node:fs';
import path from 'node:path';
import { MAX_CONFIGURED_TARGETS } from '../../shared/max-configured-targets';
import { targetSource } from '../../shared/target-source';
import { cacheDir as userCacheDir } from '../cache-dir';
import { BadInput } from './bad-input';
import type { ConfiguredSource } from './configured-source';
import { issueField } from './issue-field';
import { readConfigFile } from './read-config-file';
import { splitCommandLine } from './split-command-line';

/** The flags every target-taking command reads here (docs/target-sources.md), each taking a value. */
export const TARGET_SOURCE_FLAGS = ['--config', '--npm', '--local', '--program', '--target-cache'] as const;

/** The project file a command reads when no `--config` is given and it exists in the working directory. */
const DEFAULT_CONFIG = 'sheetkeeper.config.json';

export interface TargetSourceFlags {
  /** The arguments left for the command's own parser, in order. */
  rest: string[];
  /** The project file's sources first, then the flags' in the order given. */
  sources: ConfiguredSource[];
  /** Where npm versions and tarballs are cached: `--target-cache`, else the file's `cacheDir`, else the user's (harness/cache-dir.ts). */
  cacheDir: string;
}

/**
 * Takes the target-source flags out of a command's arguments: `--config FILE` (default
 * `./sheetkeeper.config.json` when present), `--npm PACKAGE@VERSION` (comma-separated or repeated),
 * `--local PATH` and `--program "COMMAND ARGS"` (repeated; a path or a command line may hold a
 * comma), and `--target-cache DIR`; each as `--flag value` or `--flag=value`. Every flag's source is
 * validated with the one schema of shared/target-source.ts, so a bad one is BadInput naming the
 * flag, the field and the rule. Relative paths start from `cwd`.
 */
export function readTargetSources(argv: readonly string[], cwd: string = process.cwd()): TargetSourceFlags {
  const rest: string[] = [];
  const given: { flag: string; value: string }[] = [];
  for (let i = 0; i < argv.length; i++) {
    const raw = argv[i]!;
    const eq = raw.indexOf('=');
    const flag = raw.startsWith('--') && eq > 0 ? raw.slice(0, eq) : raw;
    if (!(TARGET_SOURCE_FLAGS as readonly string[]).includes(flag)) {
      rest.push(raw);
      continue;
    }
    const value = eq > 0 ? raw.slice(eq + 1) : argv[++i];
    if (value === undefined || value === '') throw new BadInput(`${flag} needs a value`);
    given.push({ flag, value });
  }
  const configs = given.filter((g) => g.flag === '--config');
  if (configs.length > 1) throw new BadInput('--config may be given once');
  const configFile = configs[0]
    ? path.resolve(cwd, configs[0].value)
    : existsSync(path.join(cwd, DEFAULT_CONFIG))
      ? path.join(cwd, DEFAULT_CONFIG)
      : null;
  const config = configFile ? readConfigFile(configFile, cwd) : { sources: [] };
  const sources = [...config.sources];
  for (const { flag, value } of given) {
    const candidates =
      flag === '--npm'
        ? value
            .split(',')
            .map((s) => s.trim())
            .filter(Boolean)
            .map((spec) => {
              // The last @ separates the version; a scoped name starts with one of its own.
              const at = spec.lastIndexOf('@');
              return at > 0
                ? { text: spec, data: { kind: 'npm', package: spec.slice(0, at), version: spec.slice(at + 1) } }
                : { text: spec, data: { kind: 'npm', package: spec, version: '' } };
            })
        : flag === '--local'
          ? [{ text: value, data: { kind: 'local', path: value } }]
          : flag === '--program'
            ? [{ text: value, data: { kind: 'program', command: splitCommandLine(value) } }]
            : [];
    for (const { text, data } of candidates) {
      const parsed = targetSource.safeParse(data);
      if (!parsed.success)
        throw new BadInput(
          parsed.error.issues.map((i) => `${flag} ${text}: ${issueField(i.path) || '?'}: ${i.message}`).join('; '),
        );
      sources.push({ source: parsed.data, from: `${flag} ${text}`, baseDir: cwd, byFlag: true });
    }
  }
  if (sources.length > MAX_CONFIGURED_TARGETS)
    throw new BadInput(
      `${sources.length} target sources given; a command takes at most ${MAX_CONFIGURED_TARGETS} (project file and flags together)`,
    );
  const cacheFlag = given.filter((g) => g.flag === '--target-cache').at(-1);
  return {
    rest,
    sources,
    cacheDir: cacheFlag ? path.resolve(cwd, cacheFlag.value) : (config.cacheDir ?? userCacheDir()),
  };
}
