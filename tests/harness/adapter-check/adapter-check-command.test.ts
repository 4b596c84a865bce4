import { spawnSync } from 'node:child_process';
import { readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { adapterCheckCommand } from '../../../harness/adapter-check/adapter-check-command';
import { ADAPTER_CHECKS } from '../../../harness/adapter-check/adapter-checks';
import { discoverTargets } from '../../../harness/adapters/discover-targets';
import { BadInput } from '../../../harness/command-support/bad-input';
import { tempFolder } from '../support/temp-folder';

const ROOT = path.join(__dirname, '..', '..', '..');
const BIN = path.join(ROOT, 'bin', 'sheetkeeper.mjs');
const BROKEN = `/usr/bin/python3 ${path.join(ROOT, 'tests', 'fixtures', 'adapter-check', 'broken_adapter.py')}`;
const file = tempFolder('adapter-check');

function cmathName(): string {
  const cmath = discoverTargets().find((d) => d.library === 'cmath');
  if (!cmath) throw new Error('Debian python3 at /usr/bin/python3 runs the cmath target');
  return cmath.name;
}

describe('adapterCheckCommand', () => {
  it('checks an installed stdio target named with --target, under the time limit given, and exits 0 when every check passes', async () => {
    const out = file('cmath.json');
    const argv = ['--target', cmathName(), '--time-limit', '2000', '--format', 'json', '--out', out];
    expect(await adapterCheckCommand(argv)).toBe(0);
    const report = JSON.parse(readFileSync(out, 'utf8'));
    expect(report).toMatchObject({
      library: 'cmath',
      timeLimitMs: 2000,
      passed: Object.keys(ADAPTER_CHECKS).length,
      failed: 0,
    });
  });

  it('writes a table naming each failure with why it matters and how to fix it, and exits 1', async () => {
    const out = file('broken.txt');
    expect(await adapterCheckCommand(['--program', `${BROKEN} --wrong-id`, '--time-limit', '2000', '--out', out])).toBe(
      1,
    );
    const text = readFileSync(out, 'utf8');
    expect(text).toContain('time limit 2000 ms per request');
    expect(text).toMatch(/protocol {2}ids-echoed {12}FAIL {4}answered id 2 while 1 was pending \(describe\)/);
    expect(text).toContain(`why and how to fix: ${ADAPTER_CHECKS['ids-echoed'].advice}`);
    expect(text).toMatch(/13 checks: 12 passed, 1 failed, 0 not checked\n$/);
  });

  it("checks a program the project file names, by its --target name, from the file's folder", async () => {
    const config = file('sheetkeeper.config.json');
    const fixtures = path.join(ROOT, 'tests', 'fixtures');
    writeFileSync(
      config,
      JSON.stringify({
        targets: [
          {
            kind: 'program',
            name: 'mine',
            command: ['/usr/bin/python3', 'adapter-check/broken_adapter.py', '--swap-results'],
            // Relative to the project file's folder.
            cwd: path.relative(path.dirname(config), fixtures),
          },
        ],
      }),
    );
    const out = file('mine.json');
    const argv = ['--config', config, '--target', 'mine', '--time-limit', '1000', '--format', 'json', '--out', out];
    expect(await adapterCheckCommand(argv)).toBe(1);
    const report = JSON.parse(readFileSync(out, 'utf8'));
    expect(report).toMatchObject({ library: 'broken', program: expect.stringContaining('--swap-results') });
    expect(report.checks.find((c: { name: string }) => c.name === 'batch-order').status).toBe('fail');
  });

  it('refuses a JavaScript target, both or neither of --program and --target, and a time limit out of range', async () => {
    await expect(adapterCheckCommand(['--target', 'complex.js@2.4.3'])).rejects.toThrow(
      new BadInput('adapter-check checks stdio programs; complex.js@2.4.3 runs in process'),
    );
    const one = '--program: give exactly one of --program "COMMAND ARGS" and --target NAME';
    await expect(adapterCheckCommand([])).rejects.toThrow(new BadInput(one));
    await expect(adapterCheckCommand(['--program', 'x', '--target', 'y'])).rejects.toThrow(new BadInput(one));
    await expect(adapterCheckCommand(['--target', 'nothing@1'])).rejects.toThrow(/^no installed target "nothing@1"/);
    await expect(adapterCheckCommand(['--program', 'x', '--time-limit', '99'])).rejects.toThrow(/^--time-limit: /);
    await expect(adapterCheckCommand(['--program', 'x', '--time-limit', '1e3'])).rejects.toThrow(
      new BadInput('--time-limit: must be a whole number of milliseconds'),
    );
  });

  it('is a command of the CLI, listed in its usage, exiting 2 for a target that runs in process', () => {
    const run = spawnSync(process.execPath, [BIN, 'adapter-check', '--target', 'complex.js@2.4.3'], {
      encoding: 'utf8',
      timeout: 60_000,
    });
    expect(run.status).toBe(2);
    expect(run.stderr).toBe('sheetkeeper: adapter-check checks stdio programs; complex.js@2.4.3 runs in process\n');
    const usage = spawnSync(process.execPath, [BIN], { encoding: 'utf8', timeout: 60_000 });
    expect(usage.stderr).toMatch(/^ {2}adapter-check {2}check a stdio adapter against the protocol: --program/m);
  }, 30_000);
});
