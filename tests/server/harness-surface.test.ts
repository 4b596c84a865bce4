import { spawnSync } from 'node:child_process';
import path from 'node:path';

const ROOT = path.join(__dirname, '..', '..');

/** Each probe linted, with the project's config, as if it were the file named: one ESLint process for all (~8 s to start). */
const PROBES: [filePath: string, code: string][] = [
  ['server/runs/probe.ts', "import { mapCuts } from '../../harness/cutmap/map-cuts';\nexport const probe = mapCuts;\n"],
  ['server/runs/probe.ts', "import { mapCuts } from '../../harness';\nexport const probe = mapCuts;\n"],
  ['client/probe.ts', "import { buildPath } from '../harness';\nexport const probe = buildPath;\n"],
  ['client/probe.ts', "export const probe = () => import('../harness/suites/suite-tools');\n"],
  ['client/probe.ts', "import { loadSuiteTools } from '../harness/web';\nexport const probe = loadSuiteTools;\n"],
];

// ESLint loads its config with import(), which jest's module sandbox does not run: lint in a child process.
const LINT = `
const { ESLint } = require('eslint');
const probes = JSON.parse(require('node:fs').readFileSync(0, 'utf8'));
(async () => {
  const eslint = new ESLint();
  const out = [];
  for (const [filePath, code] of probes) {
    const [report] = await eslint.lintText(code, { filePath });
    out.push(report.messages.filter((m) => m.ruleId === 'import/no-restricted-paths').map((m) => m.message));
  }
  process.stdout.write(JSON.stringify(out));
})();
`;

describe('the harness surface rule', () => {
  let errors: string[][];
  beforeAll(() => {
    const run = spawnSync(process.execPath, ['-e', LINT], {
      cwd: ROOT,
      input: JSON.stringify(PROBES),
      encoding: 'utf8',
    });
    errors = JSON.parse(run.stdout) as string[][];
  }, 120_000);

  it('rejects a server import of a harness internal', () => {
    expect(errors[0]).toHaveLength(1);
    expect(errors[0]?.[0]).toContain('harness-surface: import the harness through harness/index.ts');
  });

  it('accepts a server import through harness/index.ts', () => {
    expect(errors[1]).toEqual([]);
  });

  it('rejects harness/index.ts and lazy internal imports in the web app, and accepts harness/web.ts', () => {
    expect(errors[2]).toHaveLength(1);
    expect(errors[2]?.[0]).toContain('the web app imports harness/web.ts');
    expect(errors[3]).toHaveLength(1);
    expect(errors[4]).toEqual([]);
  });
});
