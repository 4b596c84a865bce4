import type { TargetEntry } from '../../../shared/target-entry';
import { listTargets } from '../../adapters/list-targets';

const cannotCarry = (c: TargetEntry['carries']): string => {
  const missing = [
    ...(c.imaginaryPart ? [] : ['an imaginary part']),
    ...(c.imaginaryZeroSign || !c.imaginaryPart ? [] : ['the sign of a zero imaginary part']),
    ...(c.realZeroSign ? [] : ['the sign of a zero real part']),
  ];
  return missing.length ? `; cannot carry ${missing.join(' or ')}` : '';
};

/**
 * `sheetkeeper targets` (docs/suite-format.md): the installed targets, versions, settings and entries,
 * loading no library. JSON by default (as list-targets.ts prints it); `--format table` for a person,
 * with one line per entry under its target: name, how the value is built, what it cannot carry.
 */
export async function targetsCommand(argv: string[]): Promise<number> {
  const format =
    argv[0] === '--format'
      ? argv[1]
      : argv[0]?.startsWith('--format=')
        ? argv[0].slice('--format='.length)
        : argv.length === 0
          ? 'json'
          : null;
  if (format !== 'json' && format !== 'table') {
    process.stderr.write('usage: sheetkeeper targets [--format json|table]\n');
    return 2;
  }
  const targets = listTargets();
  if (format === 'json') {
    process.stdout.write(`${JSON.stringify(targets, null, 2)}\n`);
    return 0;
  }
  const width = Math.max(...targets.map((t) => t.name.length), 4);
  const lines = targets.flatMap((t) => [
    `${t.name.padEnd(width)}  ${t.library.padEnd(16)} ${t.version.padEnd(10)} ${Object.entries(t.settings)
      .map(([k, v]) => `${k}=${v}`)
      .join(' ')}`,
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
