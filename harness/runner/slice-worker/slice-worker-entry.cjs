// A slice worker thread: tsx's require hook (as bin/sheetkeeper.mjs uses), then the TypeScript worker.
require('tsx/cjs/api').register();
require('./slice-worker.ts');
