// A reference-table thread: tsx's require hook (as the findings threads use), then the TypeScript worker.
require('tsx/cjs/api').register();
require('./reference-table-worker.ts');
