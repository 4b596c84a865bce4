import { listTargets } from '../../adapters/list-targets';

/**
 * `sheetkeeper targets` (docs/suite-format.md): the installed targets, versions and settings, loading
 * no library. JSON by default (as list-targets.ts prints it); `--format table` for a person.
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
  const lines = targets.map(
    (t) =>
      `${t.name.padEnd(width)}  ${t.library.padEnd(16)} ${t.version.padEnd(10)} ${Object.entries(t.settings)
        .map(([k, v]) => `${k}=${v}`)
        .join(' ')}`,
  );
  process.stdout.write(
    `${'name'.padEnd(width)}  ${'library'.padEnd(16)} ${'version'.padEnd(10)} settings\n${lines.join('\n')}\n`,
  );
  return 0;
}
