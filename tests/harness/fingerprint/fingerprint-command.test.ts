import { spawnSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { discoverTargets } from '../../../harness/adapters/discover-targets';
import { BadInput } from '../../../harness/command-support/bad-input';
import { fingerprintCommand } from '../../../harness/fingerprint/fingerprint-command';
import { tempFolder } from '../support/temp-folder';

const BIN = path.join(__dirname, '..', '..', '..', 'bin', 'sheetkeeper.mjs');
const file = tempFolder('fingerprint');

describe('fingerprintCommand', () => {
  it('writes JSON to --out and exits 1 for complex.js 2.4.3, whose sqrt and log disagree on (-inf, 0]', async () => {
    const out = file('cjs.json');
    expect(
      await fingerprintCommand(['--target', 'complex.js@2.4.3', '--fn', 'sqrt,log', '--format', 'json', '--out', out]),
    ).toBe(1);
    const fp = JSON.parse(readFileSync(out, 'utf8'));
    expect(fp.cuts.map((c: { function: string; behaviour: string }) => `${c.function}: ${c.behaviour}`)).toEqual([
      'sqrt: inconsistent',
      'log: inconsistent',
    ]);
  });

  it("writes a table that states what was checked and exits 0 for cmath's sqrt and pow(z, 1/2)", async () => {
    const out = file('cmath.txt');
    expect(await fingerprintCommand(['--target', findCmath(), '--fn', 'sqrt,pow(z, 1/2)', '--out', out])).toBe(0);
    const text = readFileSync(out, 'utf8');
    expect(text).toContain('not a certification');
    expect(text).toMatch(/pow\(z, 1\/2\)\s+\(-inf, 0\]\s+signed-zero/);
  }, 20_000);

  it('fingerprints several targets named with commas into one JSON array', async () => {
    const out = file('two.json');
    expect(
      await fingerprintCommand([
        '--target',
        `complex.js@2.4.3,${findCmath()}`,
        '--fn',
        'sqrt',
        '--format',
        'json',
        '--out',
        out,
      ]),
    ).toBe(0);
    const fps = JSON.parse(readFileSync(out, 'utf8'));
    // complex.js's sqrt alone is counter-clockwise (no other function on its cut is asked for here); cmath's is signed-zero.
    expect(fps.map((fp: { target: string; cuts: { behaviour: string }[] }) => fp.cuts[0]!.behaviour)).toEqual([
      'counter-clockwise',
      'signed-zero',
    ]);
  }, 20_000);

  it('refuses an unknown function, format or flag as bad input', async () => {
    await expect(fingerprintCommand(['--target', 'complex.js@2.4.3', '--fn', 'sin'])).rejects.toThrow(BadInput);
    await expect(fingerprintCommand(['--target', 'complex.js@2.4.3', '--format', 'svg'])).rejects.toThrow(
      /--format: must be json or table/,
    );
    await expect(fingerprintCommand(['--target', 'complex.js@2.4.3', '--colour', 'red'])).rejects.toThrow(BadInput);
  });

  it('exits 2 through the sheetkeeper command for a target that is not installed', () => {
    const run = spawnSync(process.execPath, [BIN, 'fingerprint', '--target', 'complex.js@0.0.1'], {
      encoding: 'utf8',
      timeout: 60_000,
    });
    expect(run.status).toBe(2);
    expect(run.stderr).toContain('no installed target "complex.js@0.0.1"');
  });
});

function findCmath(): string {
  const cmath = discoverTargets().find((d) => d.library === 'cmath');
  if (!cmath) throw new Error('Debian python3 at /usr/bin/python3 runs the cmath target');
  return cmath.name;
}
