import { statSync } from 'node:fs';
import path from 'node:path';
import type { TargetSource } from '../../shared/target-source';
import { ADAPTED_LIBRARIES } from '../sources/adapted-libraries';
import { configuredTarget } from '../sources/configured-target';
import { fileSha256 } from '../sources/file-sha256';
import { installIntoCache } from '../sources/install-into-cache';
import { noAdapterError } from '../sources/no-adapter-error';
import { packageFolderTargets } from '../sources/package-folder-targets';
import { tarballManifest } from '../sources/tarball-manifest';
import { describeProgram } from './describe-program';
import { installedTargets } from './installed-targets';
import type { TargetDescriptor } from './target-descriptor';

export interface ResolveSourceOptions {
  /** The folder relative paths in the source are read from (the config file's, or the working directory). */
  baseDir: string;
  /** Where npm versions and unpacked tarballs are kept, one folder per package and version. */
  cacheDir: string;
  /**
   * The installed targets, when the caller has its own list; absent, installedTargets() (discovered
   * once per process: discovery starts Python, 131 ms here).
   */
  installed?: readonly TargetDescriptor[];
}

/** Hex digits of a tarball's SHA-256 in its cache folder's name: 128 bits, no collision by chance. */
const HASH_DIGITS = 32;

const adapted = (name: string): boolean => (ADAPTED_LIBRARIES as readonly string[]).includes(name);

/**
 * The targets one target source names (shared/target-source.ts), each openable in a worker thread
 * too (configured-target.ts). A `program` is described by starting it once. An `npm` version is
 * installed into `cacheDir/npm/<package>@<version>` on first use (install-into-cache.ts) — unless
 * it is a version installed with Sheetkeeper and no `name` is given, which is the same code under
 * the same name: the installed target answers. A `local` folder is loaded where it is; a packed
 * `.tgz` is installed into `cacheDir/tarballs/<sha-256>`. A local copy whose version is also
 * installed is named `<library>@<version>+local` unless it has a `name`, so the working copy and the
 * release can run side by side (a program keeps the name it describes, `<library>@<version>`: one
 * that clashes needs a `name`, which the caller asks for). Rejects with an Error whose message names
 * the source and what is wrong with it.
 */
export async function resolveTargetSource(
  source: TargetSource,
  options: ResolveSourceOptions,
): Promise<TargetDescriptor[]> {
  let installed = options.installed;
  /** The installed targets of one library version (installed-targets.ts). */
  const installedAs = (library: string, version: string): TargetDescriptor[] =>
    (installed ??= installedTargets()).filter((t) => t.library === library && t.version === version);
  const baseDir = path.resolve(options.baseDir);
  const cacheDir = path.resolve(options.cacheDir);
  if (source.kind === 'program') {
    return [configuredTarget({ kind: 'program', source, baseDir, identity: await describeProgram(source, baseDir) })];
  }
  if (source.kind === 'npm') {
    const spec = `${source.package}@${source.version}`;
    if (!adapted(source.package)) throw noAdapterError(source.package);
    if (source.name === undefined) {
      const release = installedAs(source.package, source.version);
      if (release.length > 0) return release;
    }
    const folder = path.join(cacheDir, 'npm', spec);
    await installIntoCache(spec, folder);
    return packageFolderTargets(
      path.join(folder, 'node_modules', source.package),
      { source: 'npm', package: spec },
      (library, version) => source.name ?? `${library}@${version}`,
    );
  }
  const full = path.resolve(baseDir, source.path);
  const nameFor = (library: string, version: string): string =>
    source.name ?? (installedAs(library, version).length > 0 ? `${library}@${version}+local` : `${library}@${version}`);
  let stat;
  try {
    stat = statSync(full);
  } catch {
    throw new Error(`${full} does not exist (a library's folder or a packed .tgz is needed)`);
  }
  if (stat.isDirectory()) return packageFolderTargets(full, { source: 'local', path: full }, nameFor);
  if (!/\.(tgz|tar\.gz)$/.test(full)) throw new Error(`${full} is neither a folder nor a packed .tgz`);
  const manifest = await tarballManifest(full);
  if (!adapted(manifest.name)) throw noAdapterError(manifest.name, full);
  const hash = (await fileSha256(full)).slice(0, HASH_DIGITS);
  const folder = path.join(cacheDir, 'tarballs', hash);
  await installIntoCache(full, folder);
  return packageFolderTargets(
    path.join(folder, 'node_modules', manifest.name),
    { source: 'local', path: full, sha256: hash },
    nameFor,
  );
}
