import { formatDouble } from '../reference/numbers/format-double';
import { parseDouble } from '../reference/numbers/parse-double';
import { complexJsEntryWays } from './complex-js-entry-ways';
import type { ComplexPair } from './complex-pair';
import { installedTargets } from './installed-targets';
import type { EntryPointFinding } from './entry-point-finding';
import { mathjsEntryWays } from './mathjs-entry-ways';
import { PROBE_INPUTS } from './probe-inputs';
import { probeWays } from './probe-ways';
import type { StdioTarget } from './stdio-target';
import type { TargetDescriptor } from './target-descriptor';

/**
 * For each library, builds the same ±0 inputs every way it allows and reports, per
 * way and input, whether the zero signs arrived intact before any function ran.
 * complex.js is probed at every installed version; mathjs once per version (its
 * entry point and `predictable` settings do not change how numbers are built);
 * a stdio target through the protocol's optional `entry-points` operation.
 * JavaScript's Math has no complex type and is not probed.
 */
export async function probeEntryPoints(
  descriptors: TargetDescriptor[] = installedTargets(),
  inputs: readonly ComplexPair[] = PROBE_INPUTS,
): Promise<EntryPointFinding[]> {
  const findings: EntryPointFinding[] = [];
  for (const d of descriptors) {
    if (d.library === 'complex.js') {
      // Required only here, when probing is asked for (lazy like the adapters).
      // eslint-disable-next-line @typescript-eslint/no-require-imports -- a lazy load of a package chosen at run time
      const mod = require(String(d.settings.package)) as { default?: unknown };
      findings.push(
        ...probeWays(
          d.name,
          complexJsEntryWays((mod.default ?? mod) as Parameters<typeof complexJsEntryWays>[0]),
          inputs,
        ),
      );
    } else if (d.library === 'mathjs' && d.settings.entry === 'complex' && d.settings.predictable === false) {
      // eslint-disable-next-line @typescript-eslint/no-require-imports -- a lazy load of a package chosen at run time
      const mod = require(String(d.settings.package)) as {
        create(all: unknown, config: unknown): unknown;
        all: unknown;
      };
      const math = mod.create(mod.all, {}) as Parameters<typeof mathjsEntryWays>[0];
      findings.push(...probeWays(`mathjs@${d.version}`, mathjsEntryWays(math), inputs));
    } else if (d.settings.protocol === 'stdio') {
      findings.push(...(await probeStdio(d.open() as StdioTarget, inputs)));
    }
  }
  return findings;
}

async function probeStdio(target: StdioTarget, inputs: readonly ComplexPair[]): Promise<EntryPointFinding[]> {
  const wire = inputs.map(([re, im]): [string, string] => [formatDouble(re), formatDouble(im)]);
  try {
    const answer = await target.request('entry-points', wire);
    const results = 'reply' in answer ? answer.reply.results : undefined;
    if (!Array.isArray(results) || results.length !== inputs.length) {
      const why = 'error' in answer ? answer.error : String(answer.reply.error ?? 'no results');
      return wire.map((input) => ({
        target: target.name,
        way: 'entry-points',
        input,
        arrived: null,
        intact: false,
        error: why,
      }));
    }
    return results.flatMap((byWay: unknown, k) =>
      Object.entries(byWay as Record<string, unknown>).map(([way, got]): EntryPointFinding => {
        const input = wire[k] as [string, string];
        const z = inputs[k] as ComplexPair;
        if (!Array.isArray(got))
          return {
            target: target.name,
            way,
            input,
            arrived: null,
            intact: false,
            error: String((got as { error?: unknown }).error),
          };
        const [re, im] = [parseDouble(String(got[0])), parseDouble(String(got[1]))];
        return {
          target: target.name,
          way,
          input,
          arrived: [formatDouble(re), formatDouble(im)],
          intact: Object.is(re, z[0]) && Object.is(im, z[1]),
        };
      }),
    );
  } finally {
    await target.close();
  }
}
