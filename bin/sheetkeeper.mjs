#!/usr/bin/env node
// Runs the TypeScript CLI through tsx in this same process, so signals reach it directly.
// The package is CommonJS, so the CLI is loaded through tsx's require hook: on Node 20.20
// tsx's ESM `register()` path fails with ERR_REQUIRE_CYCLE_MODULE as soon as a .ts module
// has an export.
import { register } from 'tsx/cjs/api';
import { createRequire } from 'node:module';
import { fileURLToPath } from 'node:url';
import path from 'node:path';

register();
const here = path.dirname(fileURLToPath(import.meta.url));
createRequire(import.meta.url)(path.join(here, '..', 'harness', 'cli.ts'));
