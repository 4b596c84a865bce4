import { spawnSync } from 'node:child_process';
import path from 'node:path';

const BIN = path.join(__dirname, '..', '..', 'bin', 'sheetkeeper.mjs');
/** Each test starts Node with tsx (and, for continue, mathjs: ~1.1 s); a loaded machine can take several times that. */
const SLOW = 30_000;

function cli(args: string[], input = '') {
  return spawnSync(process.execPath, [BIN, ...args], { input, encoding: 'utf8', timeout: 60_000 });
}

describe('sheetkeeper CLI', () => {
  it(
    'answers reference requests one line each, in order, and a bad line with an error without stopping',
    () => {
      const lines = [
        '{"fn": "sqrt", "z": {"re": "-4", "im": "-0"}, "convention": "signed-zero"}',
        'not json',
        '{"fn": "sin", "z": {"re": "1", "im": "0"}}',
        '{"fn": "pow", "z": {"re": "-8", "im": "0"}, "w": "1/3"}',
      ];
      const run = cli(['reference'], lines.join('\n') + '\n');
      expect(run.status).toBe(0);
      const answers = run.stdout
        .trim()
        .split('\n')
        .map((l) => JSON.parse(l));
      expect(answers).toHaveLength(4);
      expect(answers[0]).toEqual({ value: { re: '0', im: '-2' }, double: { re: '0', im: '-2' } });
      expect(answers[1].error).toMatch(/^not JSON/);
      expect(answers[2]).toEqual({ error: 'unknown function "sin"' });
      expect(answers[3].double).toEqual({ re: '1', im: '1.7320508075688772' });
    },
    SLOW,
  );

  it(
    'answers continue requests with values and the monodromy of a closed path',
    () => {
      const request = {
        g: 'z',
        nu: '1/2',
        z0: { re: '1', im: '0' },
        f0: { re: '1', im: '0' },
        path: { kind: 'circle', center: { re: '0', im: '0' }, radius: '1' },
        at: ['1/2'],
      };
      const run = cli(['continue'], JSON.stringify(request) + '\n');
      const answer = JSON.parse(run.stdout);
      expect(answer.values[0].f).toEqual({ re: '0', im: '1' });
      expect(answer.monodromy).toEqual({ re: '-1', im: '0' });
    },
    SLOW,
  );

  it(
    'prints the usage on stderr and exits 2 for an unknown subcommand',
    () => {
      const run = cli(['frobnicate']);
      expect(run.status).toBe(2);
      expect(run.stderr).toContain('usage: sheetkeeper <command>');
    },
    SLOW,
  );
});
