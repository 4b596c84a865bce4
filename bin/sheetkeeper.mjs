#!/usr/bin/env node
// Runs the TypeScript CLI through tsx in this same process, so signals reach it directly.
import { register } from 'tsx/esm/api';
import { fileURLToPath } from 'node:url';
import path from 'node:path';

register();
const here = path.dirname(fileURLToPath(import.meta.url));
await import(path.join(here, '..', 'harness', 'cli.ts'));
