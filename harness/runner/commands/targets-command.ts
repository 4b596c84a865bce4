import type { TargetEntry } from '../../../shared/target-entry';
import { probeEntryPoints } from '../../adapters/entry-point-probes';
import { listTargets } from '../../adapters/list-targets';
import { BadInput } from '../../command-support/bad-input';
import { commandTargets, type CommandTargets } from '../../command-support/command-targets';
import { summarizeEntryPoints } from '../../adapters/summarize-entry-points';

const cannotCarry = (c: TargetEntry['carries']): string => {
  const missing = [
    ...(c.imaginaryPart ? [] : ['an imaginary part']),
    ...(c.imaginaryZeroSign || !c.imaginaryPart ? [] : ['the sign of a zero imaginary part']),
    ...(c.realZeroSign ? [] : ['the sign of a zero real part']),
  ];
  return missing.length ? `; cannot carry ${missing.join(' or ')}` : '';
};

/**
 * `sheetkeeper targets` (docs/suite-format.md): the installed targets, then the configured ones
 * (project file and source flags, docs/target-sources.md; each with `from`, where it was named),
 * with versions, settings and entries, loading no library (a program source is started once to describe itself). JSON by default (as list-targets.ts prints it); `--format table` for a person,
 * with one line per entry under its target: name, how the value is built, what it cannot carry.
 * `--ways` reports instead, per target and way of building a value (the entries and the other
 * ways people write, such as mixed real/complex arithmetic), whether ±0 parts arrive intact.
 */
export async function targetsCommand(argv: string[]): Promise<number> {
  let known: CommandTargets;
  try {
    known = await commandTargets(argv);
  } catch (e) {
    if (!(e instanceof BadInput)) throw e;
    process.stderr.write(`sheetkeeper targets: ${e.message}\n`);
    return 2;
  }
  const ways = known.rest.includes('--ways');
  const rest = known.rest.filter((a) => a !== '--ways');
  const format =
    rest[0] === '--format' && rest.length === 2
      ? rest[1]
      : rest[0]?.startsWith('--format=') && rest.length === 1
        ? rest[0].slice('--format='.length)
        : rest.length === 0
          ? 'json'
          : null;
  if (format !== 'json' && format !== 'table') {
    process.stderr.write(
      'usage: sheetkeeper targets [--format json|table] [--ways] [--config FILE] [--npm PACKAGE@VERSION] [--local PATH] [--program "COMMAND ARGS"] [--target-cache DIR]\n',
    );
    return 2;
  }
  if (ways) {
    // Every way each library takes a value (entries and the others people write), built with
    // ±0 parts and read back before any function runs: this loads the libraries.
    const summary = summarizeEntryPoints(await probeEntryPoints(known.known));
    process.stdout.write(
      format === 'json'
        ? `${JSON.stringify(summary, null, 2)}\n`
        : `${summary.map((w) => `${w.target}  ${w.way}: ${w.intact ? 'keeps every zero sign' : `loses ${w.lost.join('; ')}`}`).join('\n')}\n`,
    );
    return 0;
  }
  const targets = listTargets(known.known);
  if (format === 'json') {
    process.stdout.write(`${JSON.stringify(targets, null, 2)}\n`);
    return 0;
  }
  const width = Math.max(...targets.map((t) => t.name.length), 4);
  const lines = targets.flatMap((t) => [
    `${t.name.padEnd(width)}  ${t.library.padEnd(16)} ${t.version.padEnd(10)} ${Object.entries(t.settings)
      .map(([k, v]) => `${k}=${v}`)
      .join(' ')}`,
    ...(t.from !== undefined ? [`${''.padEnd(width)}    from ${t.from}`] : []),
    ...(t.convention !== undefined ? [`${''.padEnd(width)}    states the ${t.convention} convention on its cuts`] : []),
    ...(t.entries ?? []).map(
      (e) =>
        `${''.padEnd(width)}    entry ${e.name.padEnd(8)} ${e.call}${e.default ? ' (default)' : ''}${cannotCarry(e.carries)}`,
    ),
  ]);
  process.stdout.write(
    `${'name'.padEnd(width)}  ${'library'.padEnd(16)} ${'version'.padEnd(10)} settings\n${lines.join('\n')}\n`,
  );
  return 0;
}
