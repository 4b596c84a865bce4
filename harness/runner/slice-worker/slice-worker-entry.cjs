// A slice worker thread. Compiled (the CLI package, docs/cli-package.md), slice-worker.js sits beside
// this file and is required as it is; from source there is none, and tsx's require hook (as
// bin/sheetkeeper.mjs uses) loads the TypeScript. tsx is no dependency of the package, so it is
// required only on that branch.
let compiled = null;
try {
  compiled = require.resolve('./slice-worker.js');
} catch {
  // Running from source.
}
if (compiled) {
  require(compiled);
} else {
  require('tsx/cjs/api').register();
  require('./slice-worker.ts');
}
