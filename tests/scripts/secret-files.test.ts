import { execFileSync } from 'node:child_process';
import { chmodSync, existsSync, mkdtempSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { PROJECT_ROOT } from '../../server/config';

const SCRIPT = path.join(PROJECT_ROOT, 'scripts', 'secret-files.sh');
const mode = (file: string) => (statSync(file).mode & 0o777).toString(8);

/** Runs `body` in bash after sourcing scripts/secret-files.sh, with a umask that would make files world-readable. */
function bash(body: string, dir: string): void {
  execFileSync('bash', ['-c', `set -euo pipefail; umask 022; source "${SCRIPT}"; ${body}`], {
    env: { ...process.env, DIR: dir },
    timeout: 10_000,
  });
}

let dir: string;
beforeEach(() => {
  dir = mkdtempSync(path.join(tmpdir(), 'sheetkeeper-secrets-'));
});
afterEach(() => {
  rmSync(dir, { recursive: true, force: true });
});

test('write_secret creates a file readable by its owner only, and narrows one that existed wider', () => {
  bash('printf s3cret | write_secret "$DIR/pg-password"', dir);
  expect(mode(path.join(dir, 'pg-password'))).toBe('600');
  expect(readFileSync(path.join(dir, 'pg-password'), 'utf8')).toBe('s3cret');

  writeFileSync(path.join(dir, 'pg-url'), 'old');
  chmodSync(path.join(dir, 'pg-url'), 0o644);
  bash('printf new | write_secret "$DIR/pg-url"', dir);
  expect(mode(path.join(dir, 'pg-url'))).toBe('600');
  expect(readFileSync(path.join(dir, 'pg-url'), 'utf8')).toBe('new');
});

test('protect_secrets narrows the secret files an older lib.sh left world-readable, and the folder, but nothing else', () => {
  const secrets = ['pg-password', 'pg-admin-url', 'pg-app-password', 'pg-url', 'session-secret'];
  for (const name of [...secrets, 'pg-port']) {
    writeFileSync(path.join(dir, name), 'x');
    chmodSync(path.join(dir, name), 0o644);
  }
  chmodSync(dir, 0o755);
  bash('protect_secrets "$DIR" "$DIR/missing"', dir);
  expect(Object.fromEntries(secrets.map((name) => [name, mode(path.join(dir, name))]))).toEqual(
    Object.fromEntries(secrets.map((name) => [name, '600'])),
  );
  expect(mode(path.join(dir, 'pg-port'))).toBe('644');
  expect(mode(dir)).toBe('700');
});

test("this checkout's secret files, as npm start and npm test left them, are readable by their owner only", () => {
  const data = path.join(PROJECT_ROOT, '.data');
  const present = ['pg-password', 'pg-admin-url', 'pg-app-password', 'pg-url', 'session-secret']
    .map((name) => path.join(data, name))
    .filter((file) => existsSync(file));
  expect(present.length).toBeGreaterThan(0);
  expect(present.map((file) => `${path.basename(file)} ${mode(file)}`)).toEqual(
    present.map((file) => `${path.basename(file)} 600`),
  );
});
