import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';

/**
 * The name and version an installed package (or npm alias) declares, read from
 * `<root>/node_modules/<alias>/package.json` with fs: complex.js ≥ 2.2 has an
 * `exports` map without `./package.json`, so `require('complex.js/package.json')`
 * throws ERR_PACKAGE_PATH_NOT_EXPORTED. Null when it is not installed.
 */
export function installedVersion(root: string, alias: string): { name: string; version: string } | null {
  const file = path.join(root, 'node_modules', alias, 'package.json');
  if (!existsSync(file)) return null;
  const json = JSON.parse(readFileSync(file, 'utf8')) as { name?: unknown; version?: unknown };
  if (typeof json.name !== 'string' || typeof json.version !== 'string') return null;
  return { name: json.name, version: json.version };
}
