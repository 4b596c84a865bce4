import { spawnSync } from 'node:child_process';
import path from 'node:path';
import { discoverTargets } from '../../../../harness/adapters/discover-targets';
import type { Target } from '../../../../harness/adapters/target';
import { parseSubject } from '../../../../harness/expressions/parse-subject';
import { parseDouble } from '../../../../harness/reference/numbers/parse-double';
import { evaluateProgram } from '../../../../harness/runner/evaluation/evaluate-program';
import { reproducer } from '../../../../harness/runner/evaluation/reproducer';
import { subjectProgram } from '../../../../harness/runner/evaluation/subject-program';

const ROOT = path.join(__dirname, '..', '..', '..', '..');
const POINTS: [number, number][] = [
  [-0.8, -0],
  [-3, 0],
  [0.30000000000000004, 0.7],
];
const SUBJECTS = ['sqrt(z - 1) * sqrt(z + 1)', 'log(-i * z) * (0.5 + i)', 'pow(z, 1/3)'];

/** The two parts a reproducer printed, as doubles with their zero signs. */
function printed(library: string, stdout: string): [number, number] {
  if (library === 'cmath') {
    const [, re, im] = stdout.trim().split(/\s+/);
    return [parseDouble(re!), parseDouble(im!)];
  }
  const numbers = stdout.match(/-?(Infinity|NaN|\d[\d.e+-]*)/g)!.map(Number);
  return [numbers[0]!, numbers[1]!];
}

describe('reproducers', () => {
  const targets = ['complex.js@2.4.3', 'mathjs@15.2.0/complex', 'mathjs@15.2.0/number', 'cmath@3.11.2'];
  let opened: Target[] = [];
  afterAll(async () => {
    await Promise.all(opened.map((t) => t.close()));
  });

  it.each(targets)(
    '%s: pasted as printed, computes exactly the value the harness got, zero signs included',
    async (name) => {
      const descriptor = discoverTargets().find((t) => t.name === name)!;
      const target = descriptor.open();
      opened.push(target);
      for (const subject of SUBJECTS) {
        const program = subjectProgram(parseSubject(subject));
        const got = await evaluateProgram(
          program,
          target,
          Float64Array.from(POINTS.map((p) => p[0])),
          Float64Array.from(POINTS.map((p) => p[1])),
        );
        const codes = POINTS.map((z) => reproducer(program, descriptor, z, subject));
        const outputs =
          descriptor.library === 'cmath'
            ? codes.map((code) => {
                const run = spawnSync('/usr/bin/python3', ['-c', code], { encoding: 'utf8' });
                expect({ subject, stderr: run.stderr }).toEqual({ subject, stderr: '' });
                return run.stdout;
              })
            : (() => {
                // Each JavaScript reproducer is pasted whole into a block of its own in one script:
                // its names stay its own, and mathjs's `create(all)` (0.9 s a process) is paid once
                // per subject instead of once per point (this file took 19 s that way).
                const script = codes.map((code) => `{\n${code}\n}`).join('\n');
                const run = spawnSync(process.execPath, ['-e', script], { encoding: 'utf8', cwd: ROOT });
                expect({ subject, stderr: run.stderr }).toEqual({ subject, stderr: '' });
                const lines = run.stdout.trim().split('\n');
                expect(lines).toHaveLength(POINTS.length);
                return lines;
              })();
        POINTS.forEach((z, i) => {
          const [re, im] = printed(descriptor.library, outputs[i]!);
          expect({ subject, z, re: Object.is(re, got.re[i]), im: Object.is(im, got.im[i]) }).toEqual({
            subject,
            z,
            re: true,
            im: true,
          });
        });
      }
    },
    60_000,
  );

  it.each([
    ['complex.js@2.4.1', 'complex'],
    ['complex.js@2.4.3', 'string'],
    ['mathjs@15.2.0/complex', 'parser'],
  ])(
    '%s through the %s entry: builds the input the way the harness did, so a dropped −0 is dropped in the reproducer too',
    async (name, entry) => {
      const descriptor = discoverTargets().find((t) => t.name === name)!;
      const target = descriptor.open();
      opened.push(target);
      const program = subjectProgram(parseSubject('sqrt(z)'));
      const z: [number, number] = [-4, -0];
      const got = await evaluateProgram(
        program,
        target,
        Float64Array.of(z[0]),
        Float64Array.of(z[1]),
        undefined,
        entry,
      );
      const code = reproducer(program, descriptor, z, 'sqrt(z)', entry);
      expect(code).toContain(`through the ${entry} entry`);
      const run = spawnSync(process.execPath, ['-e', code], { encoding: 'utf8', cwd: ROOT });
      expect(run.stderr).toBe('');
      const [re, im] = printed(descriptor.library, run.stdout);
      expect([Object.is(re, got.re[0]), Object.is(im, got.im[0])]).toEqual([true, true]);
    },
    60_000,
  );
});
