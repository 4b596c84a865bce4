import { mkdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { readTargetSources } from '../../../harness/command-support/read-target-sources';
import { tempFolder } from '../support/temp-folder';

const at = tempFolder('sheetkeeper-flags');
const saved = { ...process.env };
afterEach(() => {
  process.env = { ...saved };
});

describe('readTargetSources', () => {
  it('takes the source flags out of the arguments, in order, leaving the command’s own', () => {
    const cwd = at('plain');
    mkdirSync(cwd);
    const read = readTargetSources(
      [
        '--suite',
        'sqrt-principal-sz',
        '--npm',
        'complex.js@2.5.0,mathjs@15.1.0',
        '--local=../work,copy',
        '--program',
        `python3 'my adapter.py' --fast`,
        '--format',
        'json',
        '--target-cache',
        'cache',
      ],
      cwd,
    );
    expect(read.rest).toEqual(['--suite', 'sqrt-principal-sz', '--format', 'json']);
    expect(read.sources.map((s) => [s.source, s.from, s.byFlag, s.baseDir])).toEqual([
      [{ kind: 'npm', package: 'complex.js', version: '2.5.0' }, '--npm complex.js@2.5.0', true, cwd],
      [{ kind: 'npm', package: 'mathjs', version: '15.1.0' }, '--npm mathjs@15.1.0', true, cwd],
      // A path may hold a comma, so --local is never split.
      [{ kind: 'local', path: '../work,copy' }, '--local ../work,copy', true, cwd],
      [
        { kind: 'program', command: ['python3', 'my adapter.py', '--fast'] },
        `--program python3 'my adapter.py' --fast`,
        true,
        cwd,
      ],
    ]);
    expect(read.cacheDir).toBe(path.join(cwd, 'cache'));
  });

  it('names the flag, the field and the rule of a bad source', () => {
    const cwd = at('plain');
    expect(() => readTargetSources(['--npm', 'complex.js@^2.4.0'], cwd)).toThrow(
      '--npm complex.js@^2.4.0: version: must be an exact version such as 2.4.3 (no ranges or tags)',
    );
    expect(() => readTargetSources(['--npm', 'complex.js'], cwd)).toThrow(/^--npm complex\.js: version: /);
    expect(() => readTargetSources(['--npm', 'Complex.JS@1.0.0'], cwd)).toThrow(/package: must be an npm package name/);
    expect(() => readTargetSources(['--local', 'a\u0000b'], cwd)).toThrow(
      /^--local a\u0000b: path: must not contain the NUL/,
    );
    expect(() => readTargetSources(['--program'], cwd)).toThrow('--program needs a value');
    expect(() => readTargetSources(['--config', 'a.json', '--config=b.json'], cwd)).toThrow(
      '--config may be given once',
    );
    const many = Array.from({ length: 65 }, (_, i) => `complex.js@2.0.${i}`).join(',');
    expect(() => readTargetSources(['--npm', many], cwd)).toThrow(
      '65 target sources given; a command takes at most 64 (project file and flags together)',
    );
  });

  it('reads ./sheetkeeper.config.json when present and no --config is given, its targets before the flags’', () => {
    const cwd = at('project');
    mkdirSync(cwd);
    writeFileSync(
      path.join(cwd, 'sheetkeeper.config.json'),
      JSON.stringify({ targets: [{ kind: 'local', path: 'lib' }], cacheDir: 'from-file' }),
    );
    const read = readTargetSources(['--npm', 'complex.js@2.5.0'], cwd);
    expect(read.sources.map((s) => [s.from, s.byFlag])).toEqual([
      ['sheetkeeper.config.json targets[0]', false],
      ['--npm complex.js@2.5.0', true],
    ]);
    // The file's cacheDir beats the environment; --target-cache beats both.
    process.env.SHEETKEEPER_CACHE_DIR = at('from-env');
    expect(read.cacheDir).toBe(path.join(cwd, 'from-file'));
    expect(readTargetSources(['--target-cache', '/tmp/x'], cwd).cacheDir).toBe('/tmp/x');
  });

  it('caches under SHEETKEEPER_CACHE_DIR, else ~/.cache/sheetkeeper, when neither a flag nor a file says', () => {
    const cwd = at('plain');
    process.env.SHEETKEEPER_CACHE_DIR = '/srv/cache';
    expect(readTargetSources([], cwd).cacheDir).toBe('/srv/cache');
    delete process.env.SHEETKEEPER_CACHE_DIR;
    expect(readTargetSources([], cwd).cacheDir).toMatch(/\/\.cache\/sheetkeeper$/);
  });
});
