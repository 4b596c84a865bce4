import { execFileSync } from 'node:child_process';
import { readFileSync, statSync } from 'node:fs';
import path from 'node:path';

/**
 * `npm run types:routes`, run by `npm run typecheck` before tsc: writes Expo Router's typed-routes
 * declarations (`.expo/types/router.d.ts`, from the route files in app/) without a dev server.
 * Expo generates them when the dev server starts and keeps them out of Git (`.expo/` is ignored);
 * `expo customize tsconfig.json` runs the same generation alone (Expo's typed-routes guide names
 * it for setting a project up; @expo/cli's typed-routes code notes it runs without Metro or a
 * server), and leaves a tsconfig.json that already has Expo's includes as it is. Without the file,
 * tsc would still pass with every href a plain string, so this fails loudly when it is missing.
 * About 5 s on the 2-core machine, most of it loading the CLI.
 */
const ROOT = path.join(__dirname, '..');
const DECLARATIONS = path.join(ROOT, '.expo', 'types', 'router.d.ts');

execFileSync(process.execPath, [require.resolve('expo/bin/cli', { paths: [ROOT] }), 'customize', 'tsconfig.json'], {
  cwd: ROOT,
  stdio: ['ignore', 'ignore', 'inherit'],
  env: { ...process.env, CI: '1' },
});
const written = statSync(DECLARATIONS, { throwIfNoEntry: false });
if (!written || !readFileSync(DECLARATIONS, 'utf8').includes('`/sign-in`')) {
  console.error(`[sheetkeeper] Expo Router wrote no route types to ${path.relative(ROOT, DECLARATIONS)}`);
  process.exit(1);
}
