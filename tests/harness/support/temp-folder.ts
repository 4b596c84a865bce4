import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';

/** A fresh folder under the system's temporary folder for the tests of one file, removed after them; call at the top of a file. */
export function tempFolder(prefix: string): (name: string) => string {
  let dir = '';
  beforeAll(() => {
    dir = mkdtempSync(path.join(os.tmpdir(), `${prefix}-`));
  });
  afterAll(() => rmSync(dir, { recursive: true, force: true }));
  return (name) => path.join(dir, name);
}
