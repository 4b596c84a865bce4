// A pool thread for the tests: tsx's require hook, then the TypeScript body.
require('tsx/cjs/api').register();
require('./busy-worker.ts');
