import { writeFileSync } from 'node:fs';
import path from 'node:path';
import { readConfigFile } from '../../../harness/command-support/read-config-file';
import { tempFolder } from '../support/temp-folder';

const at = tempFolder('sheetkeeper-config');
/** Writes a project file with the given text and returns its path. */
function config(text: string, name = 'sheetkeeper.config.json'): string {
  const file = at(name);
  writeFileSync(file, text);
  return file;
}
const targets = (...list: unknown[]) => JSON.stringify({ targets: list });
const message = (file: string): string => {
  try {
    readConfigFile(file);
  } catch (e) {
    return (e as Error).message;
  }
  throw new Error('read without complaint');
};

describe('readConfigFile', () => {
  it('reads each target with where it was named, relative paths and cacheDir from the file’s folder', () => {
    const file = config(
      JSON.stringify({
        $schema: './sheetkeeper.config.schema.json',
        targets: [
          { kind: 'npm', package: 'complex.js', version: '2.4.3' },
          { kind: 'local', path: '../complex.js', name: 'working-copy' },
          { kind: 'program', command: ['python3', 'adapter.py'], cwd: 'adapters', timeLimitMs: 5000 },
        ],
        cacheDir: '.cache/targets',
      }),
    );
    const read = readConfigFile(file);
    expect(read.cacheDir).toBe(path.join(path.dirname(file), '.cache', 'targets'));
    expect(
      read.sources.map((s) => [s.source.kind, s.from.replace(/^.*sheetkeeper/, 'sheetkeeper'), s.baseDir]),
    ).toEqual([
      ['npm', 'sheetkeeper.config.json targets[0]', path.dirname(file)],
      ['local', 'sheetkeeper.config.json targets[1]', path.dirname(file)],
      ['program', 'sheetkeeper.config.json targets[2]', path.dirname(file)],
    ]);
  });

  it('names the field and the rule of a version range, an unknown kind and an unknown field', () => {
    const file = config(
      targets(
        { kind: 'npm', package: 'complex.js', version: '2.4.3' },
        { kind: 'npm', package: 'complex.js', version: '^2.4.0' },
        { kind: 'git', url: 'x' },
        { kind: 'local', path: 'x', colour: 'red' },
      ),
    );
    const text = message(file);
    expect(text).toMatch(/sheetkeeper\.config\.json: targets\[1\]\.version: must be an exact version such as 2\.4\.3/);
    expect(text).toMatch(/targets\[2\]\.kind: /);
    expect(text).toMatch(/targets\[3\]: .*colour/);
  });

  it('names the field holding a NUL character or a lone surrogate', () => {
    // JSON text can carry both: "\u0000" and a "\ud800" with no low half after it.
    expect(message(config(targets({ kind: 'local', path: 'a\u0000b' }), 'nul.json'))).toMatch(
      /nul\.json: targets\[0\]\.path: must not contain the NUL character/,
    );
    expect(message(config(targets({ kind: 'program', command: ['python3', 'x\ud800.py'] }), 'lone.json'))).toMatch(
      /lone\.json: targets\[0\]\.command\[1\]: .*unpaired UTF-16 surrogate/,
    );
    expect(message(config(JSON.stringify({ targets: [], cacheDir: '\ud800' }), 'cache.json'))).toMatch(
      /cache\.json: cacheDir: .*unpaired UTF-16 surrogate/,
    );
  });

  it('refuses a 10 MB file by its size without parsing it, and a file that is not JSON or not an object', () => {
    const big = config(`{"targets": [], "pad": "${'x'.repeat(10 * 1024 * 1024)}"}`, 'big.json');
    expect(message(big)).toMatch(/big\.json: is 10485\d\d\d bytes; a project file may be at most 1048576 bytes/);
    expect(message(config('{"targets": [', 'broken.json'))).toMatch(/broken\.json: not JSON: /);
    expect(message(config('[]', 'array.json'))).toMatch(/array\.json: \(file\): /);
    expect(message(config('{}', 'empty.json'))).toMatch(/empty\.json: targets: /);
    expect(message(at('missing.json'))).toMatch(/--config: .*missing\.json does not exist/);
  });
});
