import { spawn } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { existsSync } from 'node:fs';
import { mkdir, rename, rm } from 'node:fs/promises';
import path from 'node:path';

/**
 * Past this the registry is not answering. Measured on 5 December 2026 (the shared 2-core machine):
 * mathjs 15.1.0 with its 9 dependencies from the npm registry, `sheetkeeper targets --npm
 * mathjs@15.1.0` 5.2 s cold and 2.5 s from the cache (the CLI's own start-up), so the install ~3 s;
 * five minutes leaves room for a slow link without letting a dead one hang a CI job for good.
 */
const INSTALL_TIME_LIMIT_MS = 300_000;
/** How much of npm's error output a message keeps: its first lines say what went wrong. */
const MESSAGE_LINES = 3;
const MESSAGE_CHARS = 400;

/** Installs under way in this process, by final folder, so two sources naming one version share one npm. */
const underWay = new Map<string, Promise<void>>();

/** npm's own error lines, without the log-file hints and shortened to what fits in one message. */
function shorten(stderr: string): string {
  const lines = stderr
    .split('\n')
    .map((l) => l.replace(/^npm (error|ERR!)\s*/, '').trim())
    .filter((l) => l !== '' && !/complete log of this run|A complete log|\.npm\/_logs\//i.test(l))
    // npm prefixes its ECONNRESET advice with the word "network"; the advice is the useful part.
    .map((l) => l.replace(/^network\s+/, ''));
  const text = lines.slice(0, MESSAGE_LINES).join('; ');
  return text.length > MESSAGE_CHARS ? `${text.slice(0, MESSAGE_CHARS)}…` : text || 'no message';
}

function runNpm(args: string[]): Promise<void> {
  return new Promise((resolve, reject) => {
    // process.env explicitly: npm_config_* set by the caller (a registry, npm's own cache) must reach npm.
    const child = spawn('npm', args, { env: { ...process.env }, stdio: ['ignore', 'ignore', 'pipe'] });
    let stderr = '';
    child.stderr.setEncoding('utf8');
    child.stderr.on('data', (chunk: string) => {
      if (stderr.length < 65_536) stderr += chunk;
    });
    const timer = setTimeout(() => {
      stderr = `no answer within ${INSTALL_TIME_LIMIT_MS / 1000} s\n${stderr}`;
      child.kill('SIGKILL');
    }, INSTALL_TIME_LIMIT_MS);
    child.on('error', (e) => {
      clearTimeout(timer);
      reject(new Error(`npm did not start: ${e.message}`));
    });
    child.on('close', (code) => {
      clearTimeout(timer);
      if (code === 0) resolve();
      else reject(new Error(shorten(stderr)));
    });
  });
}

async function install(what: string, folder: string): Promise<void> {
  if (existsSync(folder)) return;
  await mkdir(path.dirname(folder), { recursive: true });
  // Beside the final folder, so the rename is one atomic step on one file system; never reused.
  const temporary = `${folder}.partial-${process.pid}-${randomBytes(6).toString('hex')}`;
  await mkdir(temporary);
  try {
    await runNpm([
      'install',
      '--prefix',
      temporary,
      '--no-save',
      '--no-package-lock',
      '--ignore-scripts',
      '--no-audit',
      '--no-fund',
      '--loglevel=error',
      what,
    ]);
  } catch (e) {
    await rm(temporary, { recursive: true, force: true });
    throw new Error(`npm install ${what} failed: ${e instanceof Error ? e.message : String(e)}`);
  }
  try {
    await rename(temporary, folder);
  } catch (e) {
    await rm(temporary, { recursive: true, force: true });
    // Another installer (another process) renamed its complete copy into place first: use it.
    if (existsSync(folder)) return;
    throw e;
  }
}

/**
 * Installs `what` (`package@version`, or a packed tarball's absolute path) with npm into `folder`
 * (the package lands in `folder/node_modules/<name>`, its dependencies beside it), unless `folder`
 * already exists. Nothing is ever half-installed: npm installs into a temporary folder beside the
 * final one, which is renamed into place only when npm succeeded, so `folder` existing means a
 * complete install; of two installers on one machine, the second to finish finds the first's
 * folder and throws its own away. A failed install removes its temporary folder and rejects with
 * npm's own message, shortened. Scripts never run (`--ignore-scripts`).
 */
export function installIntoCache(what: string, folder: string): Promise<void> {
  let running = underWay.get(folder);
  if (!running) {
    running = install(what, folder).finally(() => underWay.delete(folder));
    underWay.set(folder, running);
  }
  return running;
}
