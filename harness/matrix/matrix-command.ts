import path from 'node:path';
import { versionMatrixRequest } from '../../shared/schemas/version-matrix-request';
import { findEntry } from '../adapters/find-entry';
import { BadInput } from '../command-support/bad-input';
import { commandTargets } from '../command-support/command-targets';
import { readFlags } from '../command-support/read-flags';
import { writeOutput } from '../command-support/write-output';
import { PACKAGE_ROOT } from '../package-root';
import { loadSuites } from '../runner/plan/load-suites';
import { libraryVersions } from './library-versions';
import { versionMatrix } from './version-matrix';
import { versionMatrixTable } from './version-matrix-table';

const SUITES = path.join(PACKAGE_ROOT, 'suites');

/**
 * `sheetkeeper matrix --suite FILE|ID[,…] --library complex.js [--entry NAME[,…]] [--format table|json] [--out FILE]`:
 * the suites over every installed version of the library, and every configured one whose name has
 * the same library part (a working copy `complex.js@2.4.3+local`, an `--npm` version; command-targets.ts),
 * at each entry named (each suite's own by default). Exits 0 when no value changed between
 * versions, 1 when some did, 2 for bad input (a suite that does not load, a library with fewer
 * than two installed versions).
 */
export async function matrixCommand(argv: readonly string[]): Promise<number> {
  const { rest, known } = await commandTargets(argv);
  const request = readFlags(rest, ['suite', 'library', 'entry', 'format', 'out'], versionMatrixRequest);
  const loaded = loadSuites(request.suite, SUITES);
  if (!loaded.ok) throw new BadInput(loaded.issues.map((i) => `${i.suite}: ${i.field} ${i.rule}`).join('; '));
  const targets = libraryVersions(request.library, known);
  if (targets.length < 2) {
    throw new BadInput(
      `--library: "${request.library}" has ${targets.length} installed version(s); a matrix needs two or more (names as \`sheetkeeper targets\` lists them, without "@version")`,
    );
  }
  for (const name of request.entry ?? []) {
    const lacking = targets.map((t) => findEntry(t, name)).find((e) => e instanceof Error);
    if (lacking) throw new BadInput(`--entry: ${lacking.message}`);
  }
  const matrix = await versionMatrix(request.library, loaded.suites, targets, request.entry);
  writeOutput(request.format === 'json' ? JSON.stringify(matrix, null, 2) : versionMatrixTable(matrix), request.out);
  return matrix.suites.some((s) => s.changes.length > 0) ? 1 : 0;
}
