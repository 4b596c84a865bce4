import { mkdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { commandTargets } from '../../../harness/command-support/command-targets';
import { findTarget } from '../../../harness/command-support/find-target';
import { resolveTargets } from '../../../harness/runner/plan/resolve-targets';
import { tempFolder } from '../support/temp-folder';

const ROOT = path.join(__dirname, '..', '..', '..');
const COMPLEX_JS_2_3_0 = path.join(ROOT, 'node_modules', 'complex.js-2.3.0');
const MATHJS_14 = path.join(ROOT, 'node_modules', 'mathjs-14.9.1');
const at = tempFolder('sheetkeeper-command-targets');
const cwd = () => {
  const dir = at('cwd');
  mkdirSync(dir, { recursive: true });
  return dir;
};

describe('commandTargets', () => {
  it('lists configured targets after the installed ones, marked with where they were named', async () => {
    const { known, configured, rest } = await commandTargets(['--format', 'table', '--local', COMPLEX_JS_2_3_0], {
      cwd: cwd(),
    });
    expect(rest).toEqual(['--format', 'table']);
    expect(configured.map((t) => [t.name, t.from])).toEqual([
      ['complex.js@2.3.0+local', `--local ${COMPLEX_JS_2_3_0}`],
    ]);
    expect(known.at(-1)!.name).toBe('complex.js@2.3.0+local');
    expect(known.some((t) => t.name === 'complex.js@2.4.3' && t.from === undefined)).toBe(true);
  });

  it('names the one flag source as --target when none is given, its default variant for mathjs', async () => {
    expect(
      (await commandTargets(['--suite', 's', '--local', MATHJS_14], { targetFlag: '--target', cwd: cwd() })).rest,
    ).toEqual(['--suite', 's', '--target', 'mathjs@14.9.1+local/complex']);
    // Not when a target is named, nor when two sources are given, nor for a command without --target.
    expect(
      (await commandTargets(['--target=cmath', '--local', MATHJS_14], { targetFlag: '--target', cwd: cwd() })).rest,
    ).toEqual(['--target=cmath']);
    expect(
      (
        await commandTargets(['--local', MATHJS_14, '--local', COMPLEX_JS_2_3_0], {
          targetFlag: '--target',
          cwd: cwd(),
        })
      ).rest,
    ).toEqual([]);
    expect((await commandTargets(['--local', MATHJS_14], { cwd: cwd() })).rest).toEqual([]);
  });

  it('refuses two targets of one name, naming both places, and a source that does not resolve', async () => {
    await expect(
      commandTargets(['--local', COMPLEX_JS_2_3_0, '--local', `${COMPLEX_JS_2_3_0}/`], { cwd: cwd() }),
    ).rejects.toThrow(
      `--local ${COMPLEX_JS_2_3_0}/: the target name "complex.js@2.3.0+local" is already named by --local ${COMPLEX_JS_2_3_0}; give this source a "name"`,
    );
    // The cmath adapter by another command line describes itself by the installed cmath target's name.
    await expect(
      commandTargets(['--program', '/usr/bin/python3 -B harness/adapters/python/cmath_adapter.py'], { cwd: ROOT }),
    ).rejects.toThrow(
      /^--program \/usr\/bin\/python3 -B harness\/adapters\/python\/cmath_adapter\.py: the target name "cmath@[\d.]+" is already an installed target; give this source a "name" \(in a project file: a flag cannot carry one\)$/,
    );
    // By the installed target's own command line it is that target, and adds nothing.
    const same = await commandTargets(['--program', '/usr/bin/python3 harness/adapters/python/cmath_adapter.py'], {
      cwd: ROOT,
    });
    expect(same.configured).toEqual([]);
    await expect(commandTargets(['--local', 'nowhere'], { cwd: cwd() })).rejects.toThrow(
      /^--local nowhere: .*nowhere does not exist/,
    );
  });

  it('reads a project file whose bad field is named, with the file', async () => {
    const dir = at('bad-project');
    mkdirSync(dir);
    writeFileSync(
      path.join(dir, 'sheetkeeper.config.json'),
      JSON.stringify({
        targets: [
          { kind: 'local', path: COMPLEX_JS_2_3_0 },
          { kind: 'npm', package: 'mathjs', version: '15' },
        ],
      }),
    );
    await expect(commandTargets([], { cwd: dir })).rejects.toThrow(
      /sheetkeeper\.config\.json: targets\[1\]\.version: must be an exact version/,
    );
  });

  it('lets --target and findTarget name configured targets, and lists both kinds for an unknown name', async () => {
    const { known } = await commandTargets(['--local', MATHJS_14], { cwd: cwd() });
    const resolved = resolveTargets(['mathjs@14.9.1+local', 'complex.js'], known);
    expect(
      resolved.ok && resolved.targets.map((t) => [t.name, 'module' in t.worker! ? 'module' : 'discovered']),
    ).toEqual([
      ['mathjs@14.9.1+local/complex', 'module'],
      ['complex.js@2.4.3', 'discovered'],
    ]);
    const unknown = resolveTargets(['numpy@2'], known);
    expect(!unknown.ok && unknown.message).toMatch(
      /^unknown target "numpy@2"; installed: .*complex\.js@2\.4\.3.*; configured: mathjs@14\.9\.1\+local\/complex \(--local .*mathjs-14\.9\.1\)/,
    );
    expect(findTarget('mathjs@14.9.1+local/number', known).settings.entry).toBe('number');
    expect(() => findTarget('numpy@2', known)).toThrow(
      /^no installed or configured target "numpy@2"; installed: .*; configured: /,
    );
  });
});
