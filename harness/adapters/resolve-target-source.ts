import type { TargetSource } from '../../shared/target-source';
import { describeProgram } from './describe-program';
import type { TargetDescriptor } from './target-descriptor';

export interface ResolveSourceOptions {
  /** The folder relative paths in the source are read from (the config file's, or the working directory). */
  baseDir: string;
  /** Where npm versions and unpacked tarballs are kept, one folder per package and version. */
  cacheDir: string;
}

/**
 * The targets one target source names (shared/target-source.ts). A `program` is described by
 * starting it once; an `npm` version missing from the cache is installed there on first use;
 * a `local` folder or tarball is read where it is. Rejects with an Error whose message names the
 * source and what is wrong with it. CONTRACT: npm and local are filled in by the "sources" part.
 */
export async function resolveTargetSource(
  source: TargetSource,
  options: ResolveSourceOptions,
): Promise<TargetDescriptor[]> {
  if (source.kind === 'program') return [await describeProgram(source, options.baseDir)];
  throw new Error(`${source.kind} target sources are not resolved yet`);
}
