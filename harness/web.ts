/**
 * The harness as the web app uses it: the only harness module app/, components/ and client/
 * import (the `harness-surface` rule in eslint.config.js holds that). Kept small on purpose:
 * harness/index.ts would pull mathjs and node-only modules into the bundle, so the suite tools
 * come through loadSuiteTools, a dynamic import in a chunk of their own.
 */
export { formatHexDouble } from './checks/format-hex-double';
export { loadSuiteTools } from './suites/load-suite-tools';
export type { SuiteTools } from './suites/suite-tools';
