import { spawnSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { matrixCommand } from '../../../harness/matrix/matrix-command';
import { tempFolder } from '../support/temp-folder';

const file = tempFolder('matrix');

describe('matrixCommand', () => {
  it('writes a table for a suite id over every complex.js and exits 1, since atan changed in 2.4.1', async () => {
    const out = file('atan.txt');
    expect(await matrixCommand(['--suite', 'atan-principal-sz', '--library', 'complex.js', '--out', out])).toBe(1);
    const text = readFileSync(out, 'utf8');
    expect(text).toContain('first changed in 2.4.1');
    expect(text).toContain('not the same library');
  }, 30_000);

  it('exits 0 with JSON when no value changed (cbrt: no complex.js version has it, so every point is skipped alike)', async () => {
    const out = file('cbrt.json');
    expect(
      await matrixCommand([
        '--suite',
        'cbrt-principal-sz',
        '--library',
        'complex.js',
        '--format',
        'json',
        '--out',
        out,
      ]),
    ).toBe(0);
    expect(JSON.parse(readFileSync(out, 'utf8')).suites[0].changes).toEqual([]);
  });

  it('refuses a library with one installed version, an unknown suite and a missing flag as bad input', async () => {
    await expect(matrixCommand(['--suite', 'sqrt-principal-sz', '--library', 'js-math'])).rejects.toThrow(
      /1 installed version/,
    );
    await expect(matrixCommand(['--suite', 'no-such-suite', '--library', 'complex.js'])).rejects.toThrow(
      /no-such-suite/,
    );
    await expect(matrixCommand(['--library', 'complex.js'])).rejects.toThrow(/--suite/);
  });

  it('exits 2 through the sheetkeeper command for bad input', () => {
    const run = spawnSync(
      process.execPath,
      [
        path.join(__dirname, '..', '..', '..', 'bin', 'sheetkeeper.mjs'),
        ...['matrix', '--suite', 'sqrt-principal-sz', '--library', 'no-such-library'],
      ],
      { encoding: 'utf8', timeout: 60_000 },
    );
    expect(run.status).toBe(2);
    expect(run.stderr).toContain('"no-such-library" has 0 installed version(s)');
  });
});
