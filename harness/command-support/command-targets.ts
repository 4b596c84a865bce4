import { defaultVariant } from '../adapters/default-variant';
import { installedTargets } from '../adapters/installed-targets';
import { resolveTargetSource } from '../adapters/resolve-target-source';
import type { TargetDescriptor } from '../adapters/target-descriptor';
import { BadInput } from './bad-input';
import { readTargetSources } from './read-target-sources';

export interface CommandTargets {
  /** The command's own arguments, with `--target NAME` added when one flag source names the target. */
  rest: string[];
  /** Every target the command may name: the installed ones, then the configured ones (with `from`). */
  known: TargetDescriptor[];
  /** The configured targets alone. */
  configured: TargetDescriptor[];
}

/** Sources resolved at once (npm installs and program descriptions run side by side, the rest waits). */
const RESOLVING_AT_ONCE = 4;

const sameTarget = (a: TargetDescriptor, b: TargetDescriptor): boolean =>
  a.name === b.name && JSON.stringify(a.settings) === JSON.stringify(b.settings);

/**
 * The targets a command knows (docs/target-sources.md): the installed ones and those named by the
 * project file and the `--config`/`--npm`/`--local`/`--program` flags (read-target-sources.ts),
 * each resolved by resolveTargetSource (an npm version installed on demand, a program described)
 * and marked with where it was named. When exactly one source came from the flags and the
 * arguments name no target, `--target` is added for it (its default variant for mathjs), so
 * `sheetkeeper run --suite S --local ../complex.js` needs no name. A source that cannot be resolved,
 * or two targets with one name, is BadInput naming the source.
 */
export async function commandTargets(
  argv: readonly string[],
  options: { targetFlag?: string; cwd?: string } = {},
): Promise<CommandTargets> {
  const { rest, sources, cacheDir } = readTargetSources(argv, options.cwd);
  const installed = installedTargets();
  // A few at a time: each npm install is a process of its own, and 64 at once would swamp the machine.
  const settled: PromiseSettledResult<TargetDescriptor[]>[] = [];
  for (let i = 0; i < sources.length; i += RESOLVING_AT_ONCE)
    settled.push(
      ...(await Promise.allSettled(
        sources
          .slice(i, i + RESOLVING_AT_ONCE)
          .map((s) => resolveTargetSource(s.source, { baseDir: s.baseDir, cacheDir, installed })),
      )),
    );
  const failures = settled.flatMap((r, i) =>
    r.status === 'rejected'
      ? [`${sources[i]!.from}: ${r.reason instanceof Error ? r.reason.message : String(r.reason)}`]
      : [],
  );
  if (failures.length > 0) throw new BadInput(failures.join('\n'));
  const configured: TargetDescriptor[] = [];
  const known: TargetDescriptor[] = [...installed];
  let flagDefault: string | undefined;
  settled.forEach((r, i) => {
    const source = sources[i]!;
    const resolved = (r as PromiseFulfilledResult<TargetDescriptor[]>).value;
    if (source.byFlag && sources.filter((s) => s.byFlag).length === 1) flagDefault = defaultVariant(resolved)?.name;
    for (const d of resolved) {
      // An npm version installed with Sheetkeeper resolves to the installed target itself.
      if (installed.some((t) => sameTarget(t, d))) continue;
      const taken = known.find((t) => t.name === d.name);
      if (taken)
        throw new BadInput(
          `${source.from}: the target name "${d.name}" is already ${taken.from ? `named by ${taken.from}` : 'an installed target'}; give this source a "name"${source.byFlag ? ' (in a project file: a flag cannot carry one)' : ''}`,
        );
      const marked = { ...d, from: source.from };
      configured.push(marked);
      known.push(marked);
    }
  });
  const named =
    options.targetFlag !== undefined &&
    rest.some((a) => a === options.targetFlag || a.startsWith(`${options.targetFlag}=`));
  return {
    rest: options.targetFlag !== undefined && !named && flagDefault ? [...rest, options.targetFlag, flagDefault] : rest,
    known,
    configured,
  };
}
