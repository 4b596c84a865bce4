import { execFile } from 'node:child_process';

/** A package.json is a few kilobytes; a bigger one is not what `npm pack` writes. */
const MANIFEST_MAX_BYTES = 1_048_576;

/**
 * The `name` and `version` of a packed npm tarball (`npm pack` puts the package under `package/`),
 * read with tar without unpacking anything else, so a tarball of a package the harness has no
 * adapter for is refused before npm installs it. Rejects naming the file when it is no such tarball.
 */
export function tarballManifest(file: string): Promise<{ name: string; version: string }> {
  return new Promise((resolve, reject) => {
    execFile(
      'tar',
      ['-xzOf', file, 'package/package.json'],
      { maxBuffer: MANIFEST_MAX_BYTES, encoding: 'utf8' },
      (error, stdout) => {
        if (error) {
          reject(new Error(`${file} is not a packed npm package (no package/package.json inside a .tgz)`));
          return;
        }
        try {
          const { name, version } = JSON.parse(stdout) as { name?: unknown; version?: unknown };
          if (typeof name !== 'string' || typeof version !== 'string') throw new Error('no "name" and "version"');
          resolve({ name, version });
        } catch (e) {
          reject(new Error(`${file}: package/package.json: ${e instanceof Error ? e.message : String(e)}`));
        }
      },
    );
  });
}
