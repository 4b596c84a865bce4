import path from 'node:path';
import { cacheDir } from '../cache-dir';
import { PACKAGE_ROOT } from '../package-root';
import { cAdapterBinary } from './c-adapter-binary';
import { C_COMPLEX_ENTRIES } from './c-complex-entries';
import { OP_ARITY } from './op-arity';
import { stdioTarget, type StdioTarget } from './stdio-target';

/** Where the adapter's source ships with the harness. */
export const C_ADAPTER_SOURCE = path.join(PACKAGE_ROOT, 'harness', 'adapters', 'c', 'complex_adapter.c');

export interface CComplexTargetOptions {
  /** The C library's name and version (systemLibcVersion()), which the adapter's describe repeats. */
  library: string;
  version: string;
  /** Debian's /usr/bin/gcc unless given. */
  compiler?: string;
  /** The adapter's source; another only to test a compile failure. */
  source?: string;
  /** The cache folder (cacheDir()); the binary goes under its c-adapter/. */
  cache?: string;
}

/**
 * The system C library's <complex.h> through the stdio protocol (harness/adapters/c/complex_adapter.c).
 * Opening the target compiles nothing: the first request builds the adapter into the cache when it
 * is not there yet (cAdapterBinary), then starts it. A compile failure is an error answer on every
 * call of this target (naming the compiler's message), never a throw; `supports` still says yes to
 * the catalogue's operations so that the runner asks and the error reaches the results.
 */
export function cComplexTarget(options: CComplexTargetOptions): StdioTarget {
  const compiler = options.compiler ?? '/usr/bin/gcc';
  const source = options.source ?? C_ADAPTER_SOURCE;
  const identity = {
    name: `${options.library}@${options.version}`,
    library: options.library,
    version: options.version,
    settings: {
      protocol: 'stdio',
      language: 'C',
      compiler,
      source: path.relative(PACKAGE_ROOT, source) || source,
    },
    entries: [...C_COMPLEX_ENTRIES],
    // ISO/IEC 9899:2011 Annex G, which <complex.h> implements (G.6: the sign of a zero picks the side of a cut).
    convention: 'signed-zero' as const,
  };
  let ready: Promise<StdioTarget | Error> | null = null;
  let started: StdioTarget | null = null;
  const open = (): Promise<StdioTarget | Error> =>
    (ready ??= cAdapterBinary({ source, compiler, folder: path.join(options.cache ?? cacheDir(), 'c-adapter') }).then(
      (binary) => (started = stdioTarget({ ...identity, command: binary, args: [] })),
      (e: unknown) => (e instanceof Error ? e : new Error(String(e))),
    ));
  return {
    ...identity,
    request: async (op, args, entry) => {
      const target = await open();
      return target instanceof Error ? { error: target.message } : target.request(op, args, entry);
    },
    processId: () => started?.processId() ?? null,
    program: async () => {
      const target = await open();
      if (target instanceof Error) throw target;
      return target.program();
    },
    supports: async (op) => {
      const target = await open();
      return target instanceof Error ? op in OP_ARITY : target.supports(op);
    },
    evaluate: async (op, calls, entry) => {
      const target = await open();
      return target instanceof Error ? calls.map(() => ({ error: target.message })) : target.evaluate(op, calls, entry);
    },
    close: async () => {
      if (!ready) return;
      const target = await ready;
      if (!(target instanceof Error)) await target.close();
    },
  };
}
