import { existsSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import { installedVersion } from '../adapters/installed-version';
import type { Target } from '../adapters/target';
import type { TargetDescriptor } from '../adapters/target-descriptor';
import { ADAPTED_LIBRARIES } from './adapted-libraries';
import { configuredTarget } from './configured-target';
import { noAdapterError } from './no-adapter-error';

/** mathjs's package.json is 6 kB; one past this is not a library's and is not read into memory. */
const MANIFEST_MAX_BYTES = 1_048_576;

/** The complex.js a mathjs folder loads: Node looks in each folder's node_modules from the package up. */
function complexJsBeside(folder: string): string {
  for (let dir = folder; ; dir = path.dirname(dir)) {
    const found = installedVersion(dir, 'complex.js');
    if (found) return found.version;
    if (path.dirname(dir) === dir) return 'unknown';
  }
}

/**
 * The targets of one JavaScript library's package folder (a working copy, or a package installed
 * into the cache): its package.json's `name` picks the adapter (complex.js, or mathjs four ways:
 * complex and number entries, predictable off and on) and its `version` names the target;
 * `nameFor` gives the name before any entry. Nothing is loaded: the folder is required on first
 * use, where it is, so a working copy's edits show on the next run. Throws naming the folder when
 * it is no package or a package the harness has no adapter for.
 */
export function packageFolderTargets(
  folder: string,
  settings: Target['settings'],
  nameFor: (library: string, version: string) => string,
): TargetDescriptor[] {
  const manifestFile = path.join(folder, 'package.json');
  if (!existsSync(manifestFile)) throw new Error(`${folder} has no package.json (a library's folder is needed)`);
  if (statSync(manifestFile).size > MANIFEST_MAX_BYTES)
    throw new Error(`${manifestFile} is over ${MANIFEST_MAX_BYTES} bytes; not a library's package.json`);
  let manifest: { name?: unknown; version?: unknown };
  try {
    manifest = JSON.parse(readFileSync(manifestFile, 'utf8')) as typeof manifest;
  } catch (e) {
    throw new Error(`${manifestFile} is not JSON: ${e instanceof Error ? e.message : String(e)}`);
  }
  const { name: library, version } = manifest;
  if (typeof library !== 'string' || typeof version !== 'string')
    throw new Error(`${manifestFile} has no "name" and "version"`);
  if ((ADAPTED_LIBRARIES as readonly string[]).includes(library)) {
    // Found now, loaded on first use: a working copy whose build output is missing is named here,
    // before a run, rather than as an error on every point.
    try {
      require.resolve(folder);
    } catch (e) {
      const why = (e instanceof Error ? e.message : String(e)).split('\n')[0];
      throw new Error(
        `${folder}: Node finds no file to load for ${library} ${version} (${why}); is the library built?`,
      );
    }
  }
  if (library === 'complex.js')
    return [configuredTarget({ kind: 'complex.js', folder, version, name: nameFor(library, version), settings })];
  if (library === 'mathjs') {
    const complexJs = complexJsBeside(folder);
    return (['complex', 'number'] as const).flatMap((entry) =>
      [false, true].map((predictable) =>
        configuredTarget({
          kind: 'mathjs',
          folder,
          version,
          base: nameFor(library, version),
          settings,
          entry,
          predictable,
          complexJs,
        }),
      ),
    );
  }
  throw noAdapterError(library, folder);
}
