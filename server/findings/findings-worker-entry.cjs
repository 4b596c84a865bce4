// The findings thread: tsx's require hook (as the harness's slice workers use), then the TypeScript worker.
require('tsx/cjs/api').register();
require('./findings-worker.ts');
