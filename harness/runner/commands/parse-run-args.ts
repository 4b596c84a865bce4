/** What `sheetkeeper run` was asked (docs/suite-format.md), or why the arguments are bad input. */
export interface RunArgs {
  suites: string[];
  targets: string[];
  format: 'table' | 'json' | 'junit' | 'summary';
  out: string | null;
  seed: number | null;
  workers: number | 'auto';
  sliceTimeLimitMs: number | null;
  cacheDir: string | null | undefined;
  maxFindings: number | null;
  progress: boolean;
}

const VALUE_FLAGS = new Set([
  '--suite',
  '--target',
  '--format',
  '--out',
  '--seed',
  '--workers',
  '--slice-time-limit',
  // The flag's name before slices and shards got separate words; CI scripts written then keep working.
  '--shard-time-limit',
  '--cache',
  '--max-findings',
]);

/**
 * Reads `run --suite FILE|ID --target NAME@VERSION --format table|json|junit|summary --out FILE --seed N`
 * plus `--workers N|auto`, `--slice-time-limit MS`, `--cache DIR`, `--no-cache`, `--max-findings N`
 * and `--progress`. `--suite` and `--target` may repeat (or take comma-separated lists).
 */
export function parseRunArgs(argv: string[]): RunArgs | { error: string } {
  const args: RunArgs = {
    suites: [],
    targets: [],
    format: 'table',
    out: null,
    seed: null,
    workers: 'auto',
    sliceTimeLimitMs: null,
    cacheDir: undefined,
    maxFindings: null,
    progress: false,
  };
  for (let i = 0; i < argv.length; i++) {
    const raw = argv[i] as string;
    const eq = raw.indexOf('=');
    const flag = raw.startsWith('--') && eq > 0 ? raw.slice(0, eq) : raw;
    let value: string | undefined;
    if (VALUE_FLAGS.has(flag)) {
      value = eq > 0 && raw.startsWith('--') ? raw.slice(eq + 1) : argv[++i];
      if (value === undefined || value === '') return { error: `${flag} needs a value` };
    }
    const whole = (what: string, min: number): number | { error: string } => {
      const n = Number(value);
      return Number.isInteger(n) && n >= min
        ? n
        : { error: `${flag} must be a whole number of at least ${min}, got "${value}"` };
    };
    switch (flag) {
      case '--suite':
        args.suites.push(...(value as string).split(',').filter(Boolean));
        break;
      case '--target':
        args.targets.push(...(value as string).split(',').filter(Boolean));
        break;
      case '--format':
        if (value !== 'table' && value !== 'json' && value !== 'junit' && value !== 'summary')
          return { error: `--format must be table, json, junit or summary, got "${value}"` };
        args.format = value;
        break;
      case '--out':
        args.out = value as string;
        break;
      case '--seed': {
        const n = whole('seed', -(2 ** 31));
        if (typeof n !== 'number') return n;
        args.seed = n;
        break;
      }
      case '--workers': {
        if (value === 'auto') break;
        const n = whole('workers', 0);
        if (typeof n !== 'number') return n;
        args.workers = n;
        break;
      }
      case '--shard-time-limit':
      case '--slice-time-limit': {
        const n = whole('slice-time-limit', 1);
        if (typeof n !== 'number') return n;
        args.sliceTimeLimitMs = n;
        break;
      }
      case '--cache':
        args.cacheDir = value as string;
        break;
      case '--no-cache':
        args.cacheDir = null;
        break;
      case '--max-findings': {
        const n = whole('max-findings', 0);
        if (typeof n !== 'number') return n;
        args.maxFindings = n;
        break;
      }
      case '--progress':
        args.progress = true;
        break;
      default:
        return { error: `unknown argument "${raw}"` };
    }
  }
  if (args.suites.length === 0) return { error: 'run needs --suite FILE|ID (or a folder of suites)' };
  if (args.targets.length === 0) return { error: 'run needs --target NAME@VERSION (see `sheetkeeper targets`)' };
  return args;
}
