import { spawnSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { BadInput } from '../../../harness/command-support/bad-input';
import { cutmapCommand } from '../../../harness/cutmap/cutmap-command';
import { tempFolder } from '../support/temp-folder';

const file = tempFolder('cutmap');

describe('cutmapCommand', () => {
  it("writes an SVG of complex.js 2.4.3's sqrt and exits 0, its cut being where it belongs", async () => {
    const out = file('sqrt.svg');
    expect(await cutmapCommand(['--target', 'complex.js@2.4.3', '--fn', 'sqrt', '--format', 'svg', '--out', out])).toBe(
      0,
    );
    expect(readFileSync(out, 'utf8')).toContain('matches the expected cuts');
  });

  it("writes JSON for complex.js 2.4.3's acot over a smaller box and grid and exits 1", async () => {
    const out = file('acot.json');
    expect(
      await cutmapCommand([
        '--target',
        'complex.js@2.4.3',
        '--fn',
        'acot',
        '--box',
        '-2,-2,2,2',
        '--grid',
        '41x41',
        '--out',
        out,
      ]),
    ).toBe(1);
    const map = JSON.parse(readFileSync(out, 'utf8'));
    expect([map.columns, map.rows, map.verdict]).toEqual([41, 41, 'differs']);
  });

  it('refuses a malformed box, grid or format, an unknown function and a missing operation as bad input', async () => {
    const base = ['--target', 'complex.js@2.4.3', '--fn', 'sqrt'];
    await expect(cutmapCommand([...base, '--box', '4,4,-4,-4'])).rejects.toThrow(/--box: needs re0 < re1/);
    await expect(cutmapCommand([...base, '--grid', '81'])).rejects.toThrow(/--grid/);
    await expect(cutmapCommand([...base, '--format', 'png'])).rejects.toThrow(/--format/);
    await expect(cutmapCommand(['--target', 'complex.js@2.4.3', '--fn', 'sin'])).rejects.toThrow(BadInput);
    await expect(cutmapCommand(['--target', 'complex.js@2.4.3', '--fn', 'cbrt'])).rejects.toThrow(/has no cbrt/);
  });

  it('exits 2 through the sheetkeeper command for bad input', () => {
    const run = spawnSync(
      process.execPath,
      [
        path.join(__dirname, '..', '..', '..', 'bin', 'sheetkeeper.mjs'),
        ...['cutmap', '--target', 'complex.js@2.4.3', '--fn', 'sqrt', '--box', '4,4,-4,-4'],
      ],
      { encoding: 'utf8', timeout: 60_000 },
    );
    expect(run.status).toBe(2);
    expect(run.stderr).toContain('--box: needs re0 < re1');
  });
});
